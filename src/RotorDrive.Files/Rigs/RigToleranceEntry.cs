namespace RotorDrive.Files.Rigs;

/// <summary>One quantity's tolerance in the rig file: exactly one of four keys, each a spread around the nominal value.</summary>
/// <remarks>"normal_sd_pct": normal, standard deviation in % of nominal; "normal_sd": normal, standard deviation in the
/// unit the quantity's key names; "uniform_pct": [low, high] in % of nominal; "uniform": [low, high] in the key's unit.
/// The resolver reports an entry with none or more than one of them.</remarks>
public sealed class RigToleranceEntry
{
    /// <summary>"normal_sd_pct": standard deviation of a normal spread, % of nominal.</summary>
    public double? NormalSdPct { get; set; }

    /// <summary>"normal_sd": standard deviation of a normal spread, in the unit of the quantity's key.</summary>
    public double? NormalSd { get; set; }

    /// <summary>"uniform_pct": [low, high] deviation of a uniform spread, % of nominal.</summary>
    public double[]? UniformPct { get; set; }

    /// <summary>"uniform": [low, high] deviation of a uniform spread, in the unit of the quantity's key.</summary>
    public double[]? Uniform { get; set; }

    /// <summary>A normal spread in percent of nominal.</summary>
    public static RigToleranceEntry NormalPercent(double sdPct) => new() { NormalSdPct = sdPct };

    /// <summary>A normal spread in the quantity's unit.</summary>
    public static RigToleranceEntry NormalAbsolute(double sd) => new() { NormalSd = sd };

    /// <summary>A uniform spread in percent of nominal.</summary>
    public static RigToleranceEntry UniformPercent(double low, double high) => new() { UniformPct = [low, high] };

    /// <summary>A uniform spread in the quantity's unit.</summary>
    public static RigToleranceEntry UniformAbsolute(double low, double high) => new() { Uniform = [low, high] };
}
