using System.Security.Cryptography;
using System.Text;

namespace RotorDrive.Files;

/// <summary>Content hashes that tie a calibration to the data and the catalog row it was made from.</summary>
public static class Hashes
{
    /// <summary>SHA-256 (FIPS 180-4) of a text's UTF-8 bytes, lower-case hex.</summary>
    /// <param name="text">The text.</param>
    public static string Sha256(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text)));
    }
}
