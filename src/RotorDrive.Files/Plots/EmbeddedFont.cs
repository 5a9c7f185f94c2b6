using System.Reflection;
using ScottPlot;
using SkiaSharp;

namespace RotorDrive.Files.Plots;

// The font every plot is drawn with, read from this assembly: a machine without fonts (a CI runner, a server) would
// otherwise save plots with no text at all, and plots look the same on every machine.
internal sealed class EmbeddedFont : IFontResolver
{
    /// <summary>The family name plots ask for.</summary>
    public const string Family = "DejaVu Sans";

    private static readonly Lock Gate = new();
    private static bool _registered;
    private readonly SKTypeface _typeface;

    private EmbeddedFont(SKTypeface typeface) => _typeface = typeface;

    /// <summary>Registers the font with ScottPlot once per process (ScottPlot's font list is global).</summary>
    public static void EnsureRegistered()
    {
        lock (Gate)
        {
            if (_registered)
            {
                return;
            }
            using Stream stream = Assembly.GetExecutingAssembly().GetManifestResourceStream("RotorDrive.Files.Plots.DejaVuSans.ttf")
                ?? throw new InvalidOperationException("The plot font is missing from RotorDrive.Files (build problem).");
            var typeface = SKTypeface.FromStream(stream)
                ?? throw new InvalidOperationException("The plot font embedded in RotorDrive.Files could not be read.");
            Fonts.FontResolvers.Insert(0, new EmbeddedFont(typeface));
            _registered = true;
        }
    }

    public SKTypeface? CreateTypeface(string fontName, FontWeight weight, FontSlant slant, FontSpacing spacing) => Match(fontName);

    public SKTypeface? CreateTypeface(string fontName, bool bold, bool italic) => Match(fontName);

    private SKTypeface? Match(string fontName) => string.Equals(fontName, Family, StringComparison.OrdinalIgnoreCase) ? _typeface : null;
}
