namespace RotorDrive.Files.Plots;

/// <summary>The image formats a plot file can have; the file's extension chooses one.</summary>
public enum PlotFormat
{
    /// <summary>Scalable vector graphics (.svg): text and curves stay sharp; embeds in HTML.</summary>
    Svg,

    /// <summary>A raster image (.png).</summary>
    Png,
}
