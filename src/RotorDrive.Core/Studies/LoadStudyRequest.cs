using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Studies;

/// <summary>What a rotor-load study runs: one rotor design over the rig's plate, over a list of speeds at one gap and
/// plate temperature.</summary>
/// <param name="Rotor">The rotor design (a station's or any from the catalog).</param>
/// <param name="GapM">Air gap, m (&gt; 0), or null for the rig's design gap.</param>
/// <param name="PlateTempC">Plate temperature, C, or null for the rig's plate temperature.</param>
/// <param name="SpeedsRadPerS">Speeds, rad/s (&gt;= 0, ascending), or null for <paramref name="Steps"/> steps from 0 to
/// the rotor's rated speed.</param>
/// <param name="Steps">Steps of the default speed list (&gt;= 1); default 25.</param>
/// <param name="Model">Load model, or null for the rig's (<c>load_model</c>).</param>
/// <param name="EndCorrection">With the 2-D model: whether the Russell-Norsworthy finite-width correction applies;
/// default true.</param>
public sealed record LoadStudyRequest(
    RotorDesign Rotor,
    double? GapM = null,
    double? PlateTempC = null,
    IReadOnlyList<double>? SpeedsRadPerS = null,
    int Steps = 25,
    LoadModelKind? Model = null,
    bool EndCorrection = true);
