using RotorDrive.Core.Magnetics;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Magnetics;

/// <summary>The load model against a published torque-speed curve of an axial eddy-current brake with full geometry.</summary>
/// <remarks>
/// Source: T. Lubin and A. Rezzoug, "3-D analytical model for axial-flux eddy-current couplings and brakes under
/// steady-state conditions", IEEE Trans. Magn. 51(10), 2015: a brake of 10 sector magnets (alternating poles) glued on a
/// steel yoke, facing a copper disc on a steel back plate. The torque-speed curve at a 3 mm gap is the paper's Fig. 11
/// (its 3-D analytical model, which the paper checks against 3-D finite elements and measurement), as tabulated every
/// 15 rpm in the public validation case Raiden-Numerics/mufem-release,
/// Electromagnetics/Lubin_2015_Axial_Flux_Eddy_Current_Brake/data/Torque_Vs_Slip_speed.csv; that case's case.py and
/// README give p = 5, Br = 1.25 T, copper 5.7e7 S/m 5 mm thick, a 3 mm gap and steel on both sides.
/// </remarks>
public class PublishedCouplingTests
{
    // Lubin & Rezzoug 2015, Fig. 11 via Torque_Vs_Slip_speed.csv: the largest tabulated torque, 27.764 N m at 975 rpm
    // (the neighbours are 27.764 at 960 and 27.759 at 990 rpm, so the peak speed is known to about +-10 rpm).
    private const double PeakTorqueNm = 27.764;
    private const double PeakSpeedRpm = 975;

    // Copper conductivity 5.7e7 S/m, plate thickness 5 mm, air gap 3 mm, Br 1.25 T, 10 magnets (p = 5): case.py and
    // README of the validation case above.
    private const double CopperSPerM = 5.7e7;
    private const double GapM = 0.003;

    // Magnets: inner radius 30 mm, outer radius 60 mm, thickness 10 mm, pole-arc to pole-pitch ratio 0.9 (Lubin &
    // Rezzoug 2015, Table I, from memory: the validation case holds them only in its mesh). Steel yoke behind the
    // magnets and steel behind the copper (case.py: both back irons, mu_r = 1000; here infinitely permeable).
    private static readonly RotorDesign Brake =
        new RotorDesign("lubin-2015", 10, 2, 0.030, 0.060, 0.010, 1.25, 0, null, 1.0, 0.01, 400, 0, 0, null, null)
        {
            Array = RotorArray.Alternating,
            MagnetArcFraction = 0.9,
            BackIronM = 0.010,
        };

    private static readonly Plate CopperOnSteel = new(new PlateMaterial("cu", CopperSPerM, 0.0039, 8900, 385), 0.005) { BackIronM = 0.010 };

    // The band at the mean radius is the paper's own construction (a Cartesian double Fourier series at the mean radius
    // with an artificial radial period): this checks the series, the alternating-pole source, and steel on both sides.
    [Fact]
    public void BandAtMeanRadius_MatchesThePublishedPeak_WithinTenPercent()
    {
        (double torque, double speed) = Peak(BandAtMeanRadiusTorqueNm);
        RelAssert.Close(PeakTorqueNm, torque, 0.10, "peak torque, band at mean radius");
        RelAssert.Close(PeakSpeedRpm, speed, 0.10, "peak speed, band at mean radius");
    }

    // The default three-dimensional model (the ring model the analyses use: cylindrical harmonics over a wide plate,
    // C. V. Dodd and W. E. Deeds, J. Appl. Phys. 39(6), 1968, with the rotating source's angular order) against the
    // published peak: within 10 % in torque and in speed (-2.0 % and -4.1 % when written: 27.2 N m at 935 rpm).
    [Fact]
    public void RingModel_MatchesThePublishedPeak_WithinTenPercent()
    {
        RotorEddyModel model = RotorEddyModel.ThreeDimensional(Brake, CopperOnSteel);
        (double torque, double speed) = Peak(rpm => model.Evaluate(CopperSPerM, rpm * Math.PI / 30, GapM).TorqueNm);
        RelAssert.Close(PeakTorqueNm, torque, 0.10, "peak torque, ring model");
        RelAssert.Close(PeakSpeedRpm, speed, 0.10, "peak speed, ring model");
    }

    // The strip model (kept for the radial shape of the plate loss) gives the peak torque within 10 % but the peak
    // speed about 11 % low (27.9 N m at 871 rpm when written): each strip is an independent band with its own pitch, so
    // each has its own eddy-current time constant (longer outside, where the pitch is wider) and the torque, weighted
    // towards the outer strips, peaks where they do. In the device an eddy-current loop runs radially across the whole
    // magnet width with one time constant, which the ring model keeps. The check pins the bias so a change shows.
    [Fact]
    public void StripModel_MatchesThePeakTorque_AndPutsThePeakSpeedLowByTheStripBias()
    {
        RotorEddyModel model = RotorEddyModel.ThreeDimensionalStrips(Brake, CopperOnSteel);
        (double torque, double speed) = Peak(rpm => model.Evaluate(CopperSPerM, rpm * Math.PI / 30, GapM).TorqueNm);
        RelAssert.Close(PeakTorqueNm, torque, 0.10, "peak torque, strip model");
        RelAssert.InRange(speed / PeakSpeedRpm - 1, -0.14, -0.07, "peak speed of the strip model relative to the published one");
    }

    // The mechanism behind the strip model's low peak speed: a band with the pitch and speed of the outer radius alone
    // peaks well below the published speed, one at the inner radius well above it (the published curve lies between).
    [Fact]
    public void BandsAtInnerAndOuterRadius_StraddleThePublishedPeakSpeed()
    {
        double inner = Peak(rpm => BandTorqueNm(Brake.InnerRadiusM, rpm)).SpeedRpm;
        double outer = Peak(rpm => BandTorqueNm(Brake.OuterRadiusM, rpm)).SpeedRpm;
        Assert.True(outer < 0.85 * PeakSpeedRpm, $"outer band peaks at {outer:F0} rpm");
        Assert.True(inner > 1.15 * PeakSpeedRpm, $"inner band peaks at {inner:F0} rpm");
    }

    private static double BandAtMeanRadiusTorqueNm(double rpm) => BandTorqueNm(0.5 * (Brake.InnerRadiusM + Brake.OuterRadiusM), rpm);

    // Torque of the whole annulus's area with the pressure of the band at radius r: sum over harmonics of the mean drag
    // pressure (FiniteWidthBand) times Br^2, area pi (r_o^2 - r_i^2) and arm r.
    private static double BandTorqueNm(double radiusM, double rpm)
    {
        double pressure = 0;
        foreach (SourceHarmonic h in ArraySource.Harmonics(Brake, 4))
        {
            double q = Math.Abs(h.Order) * Brake.PolePairs / radiusM;
            pressure += FiniteWidthBand.MeanPressure(h, q, Brake.ActiveWidthM, Brake.MagnetThicknessM, Brake.HasBackIron, GapM, CopperOnSteel,
                CopperSPerM, rpm * Math.PI / 30 * radiusM, null, 1e-7).DragPa;
        }
        double area = Math.PI * (Brake.OuterRadiusM * Brake.OuterRadiusM - Brake.InnerRadiusM * Brake.InnerRadiusM);
        return pressure * Brake.RemanenceT * Brake.RemanenceT * area * radiusM;
    }

    // Largest torque over 100..3000 rpm: a 20 rpm scan, then golden-section refinement around the best point.
    private static (double TorqueNm, double SpeedRpm) Peak(Func<double, double> torqueAt)
    {
        double best = 100;
        for (double rpm = 100; rpm <= 3000; rpm += 20)
        {
            if (torqueAt(rpm) > torqueAt(best))
            {
                best = rpm;
            }
        }
        double a = best - 20, b = best + 20;
        double ratio = (Math.Sqrt(5) - 1) / 2;
        while (b - a > 0.1)
        {
            double c = b - ratio * (b - a), d = a + ratio * (b - a);
            if (torqueAt(c) > torqueAt(d))
            {
                b = d;
            }
            else
            {
                a = c;
            }
        }
        double speed = 0.5 * (a + b);
        return (torqueAt(speed), speed);
    }
}
