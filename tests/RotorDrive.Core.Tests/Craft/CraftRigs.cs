using RotorDrive.Core.Craft;
using RotorDrive.Core.Drive;
using RotorDrive.Core.Loads;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Tests.Craft;

// Thin-sheet strip force law (J. R. Reitz, J. Appl. Phys. 41, 2067, 1970: lift ~ s^2/(1+s^2), drag ~ s/(1+s^2),
// s = v/w) with one spatial wavenumber k, whose field decays as e^(-k g) so both forces scale as e^(-2 k (g - g0))
// (R. F. Post & D. D. Ryutov, IEEE Trans. Appl. Supercond. 10, 2000). Plate temperature and magnet temperature are
// ignored except that a warmer plate (lower conductivity) raises the characteristic speed as 1 + alpha (T - 20).
internal sealed class SingleWavenumberLoad(double forceScaleN, double radiusM, double characteristicSpeedRadPerS, double wavenumberPerM, double referenceGapM) : IRotorLoad
{
    public double WavenumberPerM => wavenumberPerM;

    public LoadPoint Evaluate(double speedRadPerS, double gapM, double plateTempC, double magnetTempC)
    {
        double w = characteristicSpeedRadPerS * (1 + 0.0039 * (plateTempC - 20.0));
        double s = speedRadPerS / w;
        double decay = Math.Exp(-2 * wavenumberPerM * (gapM - referenceGapM));
        double lift = forceScaleN * decay * s * s / (1 + s * s);
        double eddy = forceScaleN * decay * radiusM * s / (1 + s * s);
        return new LoadPoint(lift, eddy, 0, 0, eddy * speedRadPerS);
    }
}

internal static class CraftRigs
{
    public const double Gap = 0.008;
    public const double Wavenumber = 40;

    public static Motor Motor(double kvRpmPerV = 100, double maxCurrentA = 80)
        => new("m-test", Units.RpmToRadPerS(kvRpmPerV), 0.05, 1.5, 10, maxCurrentA, 4000, 14, 0.4, null, null, null);

    public static SpeedController Controller { get; } = new("c-test", 80, 120, 10, 6, 14, 0.002, 0.05, 240_000, 0.1, false);

    public static PackBank Pack { get; } = new(
        new BatteryPack("p-test", "flat", 12, 1, 20, 20, 40, 0.002, 2.0), 1, new CellCurve("flat", [0.0, 1.0], [3.7, 3.7]));

    public static RotorDesign Rotor(double maxRpm = 9000, double? retainerM = null, double outerM = 0.12)
        => new("r-test", 32, 4, 0.08, outerM, 0.02, 1.3, -0.0012, 7500, 1.5, 0.02, Units.RpmToRadPerS(maxRpm), 0, 0, retainerM, retainerM is null ? null : 3e8);

    public static SingleWavenumberLoad Load() => new(80, 0.1, 150, Wavenumber, Gap);

    // n stations on a circle of the given radius, spins alternating (station 0 clockwise), first station on +x.
    public static Rig Circle(int n, double radiusM = 0.3, double cgXM = 0, double cgYM = 0, double payloadKg = 5, double emptyKg = 10, RotorDesign? rotor = null)
    {
        var stations = new List<Station>();
        for (int i = 0; i < n; i++)
        {
            double a = 2 * Math.PI * i / n;
            stations.Add(new Station(radiusM * Math.Cos(a), radiusM * Math.Sin(a), i % 2 == 0 ? SpinDirection.Clockwise : SpinDirection.CounterClockwise,
                rotor ?? Rotor(), Motor(), Controller));
        }
        return Make(stations, cgXM, cgYM, payloadKg, emptyKg);
    }

    // Four stations at (+-a, +-b), diagonal pairs spinning the same way.
    public static Rig Rectangle(double a, double b, double cgXM, double cgYM, double payloadKg = 5)
        => Make(
        [
            new Station(a, b, SpinDirection.Clockwise, Rotor(), Motor(), Controller),
            new Station(-a, b, SpinDirection.CounterClockwise, Rotor(), Motor(), Controller),
            new Station(-a, -b, SpinDirection.Clockwise, Rotor(), Motor(), Controller),
            new Station(a, -b, SpinDirection.CounterClockwise, Rotor(), Motor(), Controller),
        ], cgXM, cgYM, payloadKg, 10);

    public static Rig Make(IReadOnlyList<Station> stations, double cgXM, double cgYM, double payloadKg, double emptyKg)
        => new("test", new Plate(new PlateMaterial("cu", 58e6, 0.00393, 8890, 385), 0.003), 20, 20,
            new CraftBody(emptyKg, payloadKg, cgXM, cgYM, 2.0, 0.1), Gap, 0.005, stations, Pack,
            new RigLimits(1.0, 80, 3.0, 0.8, 0.95, 5), 2, 10);

    public static RigModel Model(Rig rig, RigModelOptions? options = null)
        => RigModel.Build(rig, rig.Stations.Select(_ => (IRotorLoad)Load()).ToArray(), options);

    // The rig seen in a mirror at x = 0: x -> -x, spins reversed, station order kept.
    public static Rig Mirrored(Rig rig)
        => rig with
        {
            Body = rig.Body with { CgXM = -rig.Body.CgXM },
            Stations = rig.Stations.Select(s => s with { XM = -s.XM, Spin = s.Spin.Reversed() }).ToArray(),
        };
}
