using FsCheck;
using FsCheck.Fluent;
using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Tests.Loads;

/// <summary>Rotors and plates for the load tests (invented, physically plausible), and generators of valid ones.</summary>
internal static class TestRigs
{
    /// <summary>Representative rotor: 24 segments, M = 4, radii 70-120 mm, 4 mm NdFeB of 1.3 T, rated 6000 rpm.</summary>
    public static RotorDesign Rotor { get; } = new(
        "rep-120", 24, 4, 0.07, 0.12, 0.004, 1.3, -0.0012, 7500, 2.0, 0.0193, Units.RpmToRadPerS(6000), 0.01, 1e-5, 0.003, 2e8);

    /// <summary>6061-T6 aluminium, about 43 % IACS = 25 MS/m (handbook value, rounded), alpha about 0.0039 /K.</summary>
    public static PlateMaterial Aluminium6061 { get; } = new("al6061", 25e6, 0.0039, 2700, 896);

    /// <summary>Annealed copper, 58.0 MS/m, alpha 0.00393 /K (IEC 60028).</summary>
    public static PlateMaterial Copper { get; } = new("cu", 58e6, 0.00393, 8890, 385);

    /// <summary>6 mm of 6061 aluminium.</summary>
    public static Plate AluminiumPlate { get; } = new(Aluminium6061, 0.006);

    /// <summary>A rotor design generator: 8-48 segments with M = 4 or 8, radii 30-200 mm, magnets 2-15 mm, 0.9-1.45 T.</summary>
    public static Gen<RotorDesign> Rotors =>
        from m in Gen.Elements(4, 8)
        from p in Gen.Choose(2, 12)
        from outerMm in Gen.Choose(40, 200)
        from widthPercent in Gen.Choose(15, 70)
        from thicknessMm10 in Gen.Choose(20, 150)
        from br100 in Gen.Choose(90, 145)
        from maxRpm in Gen.Choose(1000, 12000)
        select new RotorDesign(
            $"gen-{p * m}-{outerMm}", p * m, m, outerMm * (1 - widthPercent / 100.0) / 1000.0, outerMm / 1000.0,
            thicknessMm10 / 10000.0, br100 / 100.0, -0.0012, 7500, 1.0, 0.01, Units.RpmToRadPerS(maxRpm), 0.0, 0.0, null, null);

    /// <summary>A plate generator: aluminium or copper, 0.5-25 mm thick.</summary>
    public static Gen<Plate> Plates =>
        from cu in Gen.Elements(false, true)
        from thicknessMm10 in Gen.Choose(5, 250)
        select new Plate(cu ? Copper : Aluminium6061, thicknessMm10 / 10000.0);
}
