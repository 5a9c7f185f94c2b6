using RotorDrive.Core.Numerics;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>The spread of one reported figure over a study's samples.</summary>
/// <param name="Key">Stable key with its unit, e.g. "hover_speed_rpm".</param>
/// <param name="Summary">Count, extremes, mean, P5, P50 and P95 over the samples that have the figure (for example only
/// those that found a trim), or null when none has it.</param>
/// <param name="LeftOut">Samples without the figure, left out of the summary (for the hover figures: samples whose trim
/// failed, which count as trim failures instead).</param>
public sealed record StressFigure(string Key, PercentileSummary? Summary, int LeftOut);
