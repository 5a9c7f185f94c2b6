using RotorDrive.Core.Loads;
using RotorDrive.Core.Safety;

namespace RotorDrive.Core.Studies;

/// <summary>The outcome of a rotor-load study (<see cref="LoadStudy.Run"/>).</summary>
/// <param name="Request">What was run.</param>
/// <param name="Sweep">Lift, torques and plate loss at each speed, and the drag peak up to the top speed.</param>
/// <param name="Model">The load model used.</param>
/// <param name="StandstillPullN">With steel under the plate: the downward pull on the stopped rotor at the study's gap, N
/// (the negative of its lift at zero speed); null over a plate without steel.</param>
/// <param name="WeightShareN">The craft's weight shared equally over its stations, N: the lift each rotor must give.</param>
/// <param name="ShareReachedAtRpm">The lowest listed speed whose lift carries <paramref name="WeightShareN"/>, rpm, or null
/// when no listed speed does.</param>
/// <param name="AboveRatedSpeed">Whether speeds above the rotor's rated speed were listed.</param>
/// <param name="Cautions">The cautions for a magnet rotor over a plate (burst, magnets, hot plate).</param>
public sealed record LoadStudyResult(
    LoadStudyRequest Request,
    LoadSweepResult Sweep,
    LoadModelKind Model,
    double? StandstillPullN,
    double WeightShareN,
    double? ShareReachedAtRpm,
    bool AboveRatedSpeed,
    IReadOnlyList<Caution> Cautions)
{
    /// <summary>Whether the plate has steel under it (a stopped rotor is pulled down).</summary>
    public bool SteelUnderPlate => StandstillPullN is not null;
}
