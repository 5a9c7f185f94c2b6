using System.Globalization;

namespace RotorDrive.Tui.Text;

/// <summary>Orders text as people read it: runs of digits compare by their value, so <c>kv60</c> comes before
/// <c>kv100</c>; the rest compares without regard to case.</summary>
public sealed class NaturalOrder : IComparer<string>
{
    /// <summary>The one instance.</summary>
    public static NaturalOrder Instance { get; } = new();

    /// <inheritdoc/>
    public int Compare(string? x, string? y)
    {
        if (ReferenceEquals(x, y))
        {
            return 0;
        }
        if (x is null || y is null)
        {
            return x is null ? -1 : 1;
        }
        int i = 0, j = 0;
        while (i < x.Length && j < y.Length)
        {
            if (char.IsAsciiDigit(x[i]) && char.IsAsciiDigit(y[j]))
            {
                int si = i, sj = j;
                while (i < x.Length && char.IsAsciiDigit(x[i]))
                {
                    i++;
                }
                while (j < y.Length && char.IsAsciiDigit(y[j]))
                {
                    j++;
                }
                string a = x[si..i].TrimStart('0'), b = y[sj..j].TrimStart('0');
                int byValue = a.Length != b.Length ? a.Length.CompareTo(b.Length) : string.CompareOrdinal(a, b);
                if (byValue != 0)
                {
                    return byValue;
                }
                continue;
            }
            int c = char.ToLower(x[i], CultureInfo.InvariantCulture).CompareTo(char.ToLower(y[j], CultureInfo.InvariantCulture));
            if (c != 0)
            {
                return c;
            }
            i++;
            j++;
        }
        int rest = (x.Length - i).CompareTo(y.Length - j);
        return rest != 0 ? rest : string.CompareOrdinal(x, y);
    }
}
