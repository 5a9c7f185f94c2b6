using System.Numerics;
using MathNet.Numerics.Integration;

namespace RotorDrive.Core.Magnetics;

/// <summary>Eddy-current lift, drag torque and plate loss of a magnet rotor over a plate: the three-dimensional model (radial
/// strips, each a finite-width band solved by a double Fourier series, with the array's harmonics) or the two-dimensional
/// strip model with the Russell-Norsworthy width factor.</summary>
/// <remarks>
/// <para>Both models are a sum over "modes": a wavenumber k that sets the gap decay e^(-2 k g) and the plate's response
/// R(eps, k d), a weight for lift and one for torque. Lift = -sum w_L e^(-2 k g) Re R and torque = -sum w_T e^(-2 k g) Im R,
/// with eps = mu0 sigma omega (|n| p) / k^2 (../DESIGN.md §4.2-4.3, 4.7). Because the conductivity and the speed enter
/// only through eps, all results depend on them only through sigma omega; forces scale with the remanence squared.</para>
/// <para>Three-dimensional model (../DESIGN.md §4.7; the default for analyses): the magnet annulus is cut into radial
/// strips at Gauss-Legendre radii r (MathNet GaussLegendreRule). At each radius the rotor is replaced by a straight band of
/// the magnets' full radial width w = r_o - r_i moving at omega r, with the circumferential wavenumber |n| p / r of each
/// harmonic n of the array (<see cref="ArraySource"/>), over a plate much wider than the rotor, and the band's mean
/// pressures come from <see cref="FiniteWidthBand"/> (double Fourier series with an artificial radial period, after
/// T. Lubin and A. Rezzoug, IEEE Trans. Magn. 51(10), 2015; each component the layer problem with k^2 = q^2 + k_y^2,
/// J. R. Reitz, J. Appl. Phys. 41, 1970). The pole pitch's growth with radius is represented by the strips; what the
/// band leaves out is the curvature of the magnets' edges within one strip (the pitch varies across the width by
/// r_o/r_i) and the radial variation of the pressure within the width, whose mean is what the strip integral uses. The
/// series is truncated where the neglected terms fall below a relative tolerance at a reference gap.</para>
/// <para>Two-dimensional model (the first generation): each radius is a 2-D strip with wavenumber p/r and the Halbach
/// fundamental; with the end correction on, the conductivity is multiplied by the Russell-Norsworthy factor
/// (<see cref="EndEffect"/>) for active width r_o - r_i.</para>
/// <para>Steel: under the plate it changes R (<see cref="PlateResponse.SteelBackedReflection"/>); behind the magnets it is an
/// image source and a reflector, the modes then carry e^(-2 k h) and the field on the plate is divided by
/// 1 - R e^(-2 k (g + h)).</para>
/// <para>Instances are immutable and thread-safe; evaluation allocates nothing.</para>
/// </remarks>
public sealed class RotorEddyModel
{
    private readonly double[] _radiusM;
    private readonly double[] _wavenumberPerM;
    private readonly double[] _thicknessTimesWavenumber;
    private readonly double[] _epsPerSigmaOmega;
    private readonly double[] _liftWeightN;
    private readonly double[] _torqueWeightNm;
    private readonly double[] _backIronDecay;

    /// <summary>Builds the two-dimensional strip quadrature for a Halbach rotor over a plate in air (the first-generation model).</summary>
    /// <param name="rotor">The rotor design (its remanence at 20 C is used).</param>
    /// <param name="plateThicknessM">Plate thickness, m, greater than 0.</param>
    /// <param name="endEffectCorrection">Apply the Russell-Norsworthy factor to the conductivity (default true).</param>
    /// <param name="radialPoints">Gauss-Legendre points over the annulus, 2..256 (default 24).</param>
    /// <exception cref="ArgumentNullException">The rotor is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The geometry is invalid or a count is out of range.</exception>
    public RotorEddyModel(RotorDesign rotor, double plateThicknessM, bool endEffectCorrection = true, int radialPoints = 24)
        : this(rotor, plateThicknessM, plateBackIron: false, Construction.TwoDimensionalStrips, endEffectCorrection, radialPoints, harmonics: 1, referenceGapM: 0, tolerance: 0)
    {
    }

    private RotorEddyModel(RotorDesign rotor, double plateThicknessM, bool plateBackIron, Construction construction, bool endEffectCorrection,
        int radialPoints, int harmonics, double referenceGapM, double tolerance)
    {
        Preconditions.NotNull(rotor, nameof(rotor));
        Preconditions.Positive(plateThicknessM, nameof(plateThicknessM));
        Preconditions.InRange(radialPoints, 2, 256, nameof(radialPoints));
        Preconditions.Positive(rotor.InnerRadiusM, "rotor inner radius");
        Preconditions.Positive(rotor.MagnetThicknessM, "rotor magnet thickness");
        Preconditions.NonNegative(rotor.RemanenceT, "rotor remanence");
        Preconditions.NonNegative(rotor.BackIronM, "rotor back iron thickness");
        if (!(rotor.OuterRadiusM > rotor.InnerRadiusM) || !double.IsFinite(rotor.OuterRadiusM))
        {
            throw new ArgumentOutOfRangeException(nameof(rotor), rotor.OuterRadiusM, $"rotor outer radius must exceed the inner radius {rotor.InnerRadiusM} m; got {rotor.OuterRadiusM} m.");
        }
        Preconditions.AtLeast(rotor.SegmentsPerWavelength, 2, "rotor segments per wavelength");
        Preconditions.AtLeast(rotor.PolePairs, 1, "rotor pole pairs (segments / segments per wavelength)");

        Rotor = rotor;
        PlateThicknessM = plateThicknessM;
        PlateBackIron = plateBackIron;
        IsThreeDimensional = construction != Construction.TwoDimensionalStrips;
        IsRingModel = construction == Construction.Rings;
        EndEffectCorrection = construction == Construction.TwoDimensionalStrips && endEffectCorrection;
        RadialPoints = construction == Construction.Rings ? 0 : radialPoints;
        Harmonics = harmonics;

        var modes = construction switch
        {
            Construction.Rings => RingModes(rotor, harmonics, referenceGapM, tolerance),
            Construction.ThreeDimensionalStrips => ThreeDimensionalModes(rotor, plateThicknessM, radialPoints, harmonics, referenceGapM, tolerance),
            _ => TwoDimensionalModes(rotor, plateThicknessM, endEffectCorrection, radialPoints),
        };
        int count = modes.Count;
        _radiusM = new double[count];
        _wavenumberPerM = new double[count];
        _thicknessTimesWavenumber = new double[count];
        _epsPerSigmaOmega = new double[count];
        _liftWeightN = new double[count];
        _torqueWeightNm = new double[count];
        _backIronDecay = new double[rotor.HasBackIron ? count : 0];
        for (int j = 0; j < count; j++)
        {
            Mode m = modes[j];
            _radiusM[j] = m.Radius;
            _wavenumberPerM[j] = m.K;
            _thicknessTimesWavenumber[j] = m.K * plateThicknessM;
            _epsPerSigmaOmega[j] = m.EpsPerSigmaOmega;
            _liftWeightN[j] = m.LiftWeight;
            _torqueWeightNm[j] = m.TorqueWeight;
            if (rotor.HasBackIron)
            {
                _backIronDecay[j] = Math.Exp(-2.0 * m.K * rotor.MagnetThicknessM);
            }
        }
    }

    /// <summary>The two-dimensional strip model (first generation) for any rotor over any plate.</summary>
    /// <param name="rotor">The rotor design.</param>
    /// <param name="plate">The plate (its thickness and steel backing; the conductivity is passed to Evaluate).</param>
    /// <param name="endEffectCorrection">Apply the Russell-Norsworthy factor.</param>
    /// <param name="radialPoints">Gauss-Legendre points over the annulus, 2..256.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The geometry is invalid or a count is out of range.</exception>
    public static RotorEddyModel TwoDimensional(RotorDesign rotor, Plate plate, bool endEffectCorrection = true, int radialPoints = 24)
    {
        Preconditions.NotNull(plate, nameof(plate));
        return new RotorEddyModel(rotor, plate.ThicknessM, plate.HasBackIron, Construction.TwoDimensionalStrips, endEffectCorrection, radialPoints, 1, 0, 0);
    }

    /// <summary>The three-dimensional model the analyses use: the ring model (cylindrical harmonics, <see cref="AnnularSpectrum"/>;
    /// ../DESIGN.md §4.7).</summary>
    /// <param name="rotor">The rotor design.</param>
    /// <param name="plate">The plate (its thickness and steel backing).</param>
    /// <param name="harmonics">Harmonics of the array kept, 1..64 (default 4: orders 1, -3, 5, -7 of a 4-segment Halbach array).</param>
    /// <param name="referenceGapM">Smallest gap at which the truncation tolerance is to hold, m, greater than 0 (default 2 mm);
    /// smaller gaps stay close but converge more slowly.</param>
    /// <param name="tolerance">Relative truncation tolerance of the spectrum, 1e-12..1e-2 (default 1e-6).</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The geometry is invalid or a setting is out of range.</exception>
    public static RotorEddyModel ThreeDimensional(RotorDesign rotor, Plate plate, int harmonics = 4, double referenceGapM = 0.002, double tolerance = 1e-6)
    {
        Preconditions.NotNull(plate, nameof(plate));
        Preconditions.InRange(harmonics, 1, 64, nameof(harmonics));
        Preconditions.Positive(referenceGapM, nameof(referenceGapM));
        Preconditions.InRange(tolerance, 1e-12, 1e-2, nameof(tolerance));
        return new RotorEddyModel(rotor, plate.ThicknessM, plate.HasBackIron, Construction.Rings, false, 2, harmonics, referenceGapM, tolerance);
    }

    /// <summary>The three-dimensional strip model: radial strips, each a straight band of the magnets' full width solved by
    /// a double Fourier series (<see cref="FiniteWidthBand"/>). It gives the radial distribution of the plate loss (each
    /// mode has a radius; <see cref="RadiusM"/>), which the ring model's modes do not carry; its totals put the drag peak
    /// low in speed when r_o/r_i is large (each strip has its own eddy-current time constant).</summary>
    /// <param name="rotor">The rotor design.</param>
    /// <param name="plate">The plate (its thickness and steel backing).</param>
    /// <param name="stripPoints">Gauss-Legendre radial strips, 2..256 (default 8).</param>
    /// <param name="harmonics">Harmonics of the array kept, 1..64 (default 4).</param>
    /// <param name="referenceGapM">Smallest gap at which the truncation tolerance is to hold, m, greater than 0 (default 2 mm).</param>
    /// <param name="tolerance">Relative truncation tolerance of the Fourier series, 1e-12..1e-2 (default 1e-6).</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The geometry is invalid or a setting is out of range.</exception>
    public static RotorEddyModel ThreeDimensionalStrips(RotorDesign rotor, Plate plate, int stripPoints = 8, int harmonics = 4, double referenceGapM = 0.002, double tolerance = 1e-6)
    {
        Preconditions.NotNull(plate, nameof(plate));
        Preconditions.InRange(harmonics, 1, 64, nameof(harmonics));
        Preconditions.Positive(referenceGapM, nameof(referenceGapM));
        Preconditions.InRange(tolerance, 1e-12, 1e-2, nameof(tolerance));
        return new RotorEddyModel(rotor, plate.ThicknessM, plate.HasBackIron, Construction.ThreeDimensionalStrips, false, stripPoints, harmonics, referenceGapM, tolerance);
    }

    /// <summary>The rotor design.</summary>
    public RotorDesign Rotor { get; }

    /// <summary>Plate thickness, m.</summary>
    public double PlateThicknessM { get; }

    /// <summary>Whether the plate lies on steel.</summary>
    public bool PlateBackIron { get; }

    /// <summary>Whether this is the three-dimensional model.</summary>
    public bool IsThreeDimensional { get; }

    /// <summary>Whether this is the ring model (cylindrical harmonics): its modes have no radius.</summary>
    public bool IsRingModel { get; }

    /// <summary>Whether the Russell-Norsworthy end correction is applied (two-dimensional model only).</summary>
    public bool EndEffectCorrection { get; }

    /// <summary>Number of Gauss-Legendre points (radial strips) over the annulus (0 for the ring model).</summary>
    public int RadialPoints { get; }

    /// <summary>Harmonics of the array kept (1 for the two-dimensional model).</summary>
    public int Harmonics { get; }

    /// <summary>Number of modes (wavenumbers) the model sums.</summary>
    public int ModeCount => _radiusM.Length;

    /// <summary>Eddy lift, torque and plate loss at a conductivity, a signed shaft speed and an air gap, at 20 C remanence.</summary>
    /// <param name="conductivitySPerM">Plate conductivity, S/m, at least 0.</param>
    /// <param name="speedRadPerS">Shaft speed, rad/s (signed: negative is the reversed spin).</param>
    /// <param name="gapM">Air gap between the magnet face and the plate, m, at least 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or out of range.</exception>
    public EddyForces Evaluate(double conductivitySPerM, double speedRadPerS, double gapM)
    {
        Preconditions.NonNegative(conductivitySPerM, nameof(conductivitySPerM));
        Preconditions.Finite(speedRadPerS, nameof(speedRadPerS));
        Preconditions.NonNegative(gapM, nameof(gapM));
        double sigmaOmega = conductivitySPerM * speedRadPerS;
        bool rotorIron = _backIronDecay.Length > 0;
        double lift = 0, torque = 0, power = 0;
        for (int j = 0; j < _radiusM.Length; j++)
        {
            Complex r = PlateResponse.ReflectionUnchecked(_epsPerSigmaOmega[j] * sigmaOmega, _thicknessTimesWavenumber[j], PlateBackIron);
            double source = Math.Exp(-2.0 * _wavenumberPerM[j] * gapM);
            if (rotorIron)
            {
                // Multiple reflections between plate and rotor steel: field on the plate divided by 1 - R e^(-2 k (g + h)).
                Complex d = 1.0 - r * (source * _backIronDecay[j]);
                source /= d.Real * d.Real + d.Imaginary * d.Imaginary;
            }
            lift -= _liftWeightN[j] * source * r.Real;
            double t = -_torqueWeightNm[j] * source * r.Imaginary;
            torque += t;
            // Plate loss summed on its own: drag pressure times the local slip speed omega r, over the strip's area.
            power += t * speedRadPerS;
        }
        return new EddyForces(lift, torque, power);
    }

    /// <summary>Mode radii, m (strip models; NaN for the ring model, whose modes span the whole plate).</summary>
    internal ReadOnlySpan<double> RadiusM => _radiusM;

    /// <summary>Mode wavenumbers k, 1/m (the gap decay is e^(-2 k g)).</summary>
    internal ReadOnlySpan<double> WavenumberPerM => _wavenumberPerM;

    /// <summary>k d of each mode.</summary>
    internal ReadOnlySpan<double> ThicknessTimesWavenumber => _thicknessTimesWavenumber;

    /// <summary>eps per unit sigma omega of each mode (end factor included in the two-dimensional model).</summary>
    internal ReadOnlySpan<double> EpsPerSigmaOmega => _epsPerSigmaOmega;

    /// <summary>Lift weight of each mode, N (area times B_face^2/mu0 times the series weight).</summary>
    internal ReadOnlySpan<double> LiftWeightN => _liftWeightN;

    /// <summary>Torque weight of each mode, N m (lift weight times radius times q/k).</summary>
    internal ReadOnlySpan<double> TorqueWeightNm => _torqueWeightNm;

    /// <summary>e^(-2 k h) of each mode when the rotor has a steel back disc, else empty.</summary>
    internal ReadOnlySpan<double> BackIronDecay => _backIronDecay;

    // Width of the groups of Fourier terms beyond k_y = 2 p / r, relative to k_y (see FiniteWidthBand.Terms).
    private const double Lumping = 0.2;

    private readonly record struct Mode(double Radius, double K, double EpsPerSigmaOmega, double LiftWeight, double TorqueWeight);

    private enum Construction
    {
        TwoDimensionalStrips,
        ThreeDimensionalStrips,
        Rings,
    }

    // Ring model: each cylindrical harmonic (order m, wavenumber kappa) is a mode with eps = mu0 m / kappa^2 per sigma
    // omega and torque weight m / kappa times its lift weight (AnnularSpectrum).
    private static List<Mode> RingModes(RotorDesign rotor, int harmonicCount, double referenceGapM, double tolerance)
    {
        SourceHarmonic[] harmonics = ArraySource.Harmonics(rotor, harmonicCount);
        var modes = new List<Mode>();
        foreach (AnnularSpectrum.RingMode r in AnnularSpectrum.Modes(rotor, harmonics, referenceGapM, tolerance))
        {
            double k = r.Wavenumber;
            modes.Add(new Mode(double.NaN, k, Units.Mu0 * r.Order / (k * k), r.LiftWeight, r.LiftWeight * r.Order / k));
        }
        return modes;
    }

    private static List<Mode> TwoDimensionalModes(RotorDesign rotor, double plateThicknessM, bool endEffectCorrection, int radialPoints)
    {
        var rule = new GaussLegendreRule(rotor.InnerRadiusM, rotor.OuterRadiusM, radialPoints);
        int p = rotor.PolePairs;
        double halfWidth = 0.5 * rotor.ActiveWidthM;
        SourceHarmonic fundamental = ArraySource.Harmonics(rotor, 1)[0];
        var modes = new List<Mode>(radialPoints);
        for (int j = 0; j < radialPoints; j++)
        {
            double r = rule.GetAbscissa(j);
            double k = p / (double)r;
            double faceField = rotor.RemanenceT * ArraySource.FaceField(fundamental, k, k, rotor.MagnetThicknessM, rotor.HasBackIron);
            double endFactor = endEffectCorrection ? EndEffect.RussellNorsworthyFactor(k, halfWidth) : 1.0;
            double area = rule.GetWeight(j) * 2.0 * Math.PI * r;
            double lift = area * faceField * faceField / Units.Mu0;
            modes.Add(new Mode(r, k, Units.Mu0 * endFactor * p / (k * k), lift, lift * r));
        }
        return modes;
    }

    private static List<Mode> ThreeDimensionalModes(RotorDesign rotor, double plateThicknessM, int stripPoints, int harmonicCount, double referenceGapM, double tolerance)
    {
        var rule = new GaussLegendreRule(rotor.InnerRadiusM, rotor.OuterRadiusM, stripPoints);
        int p = rotor.PolePairs;
        double width = rotor.ActiveWidthM;
        double br2 = rotor.RemanenceT * rotor.RemanenceT;
        SourceHarmonic[] harmonics = ArraySource.Harmonics(rotor, harmonicCount);
        var modes = new List<Mode>();
        for (int j = 0; j < stripPoints; j++)
        {
            double r = rule.GetAbscissa(j);
            double area = rule.GetWeight(j) * 2.0 * Math.PI * r;
            double fundamental = p / r;
            // One artificial period per strip, set by the fundamental (the slowest-decaying coupling between copies).
            double period = FiniteWidthBand.DefaultPeriodM(fundamental, width);
            // The truncation reference is the fundamental's two-dimensional value at the reference gap, so weak
            // harmonics are cut relative to what matters for the strip.
            double face1 = ArraySource.FaceField(harmonics[0], fundamental, fundamental, rotor.MagnetThicknessM, rotor.HasBackIron);
            double reference = face1 * face1 * Math.Exp(-2.0 * fundamental * referenceGapM);
            foreach (SourceHarmonic h in harmonics)
            {
                int order = Math.Abs(h.Order);
                double q = order * fundamental;
                foreach ((double ky, double weight) in FiniteWidthBand.Terms(h, q, width, period, rotor.MagnetThicknessM, rotor.HasBackIron, referenceGapM, tolerance * reference, Lumping, 2.0 * fundamental))
                {
                    double k = double.Hypot(q, ky);
                    double f = ArraySource.FaceField(h, q, k, rotor.MagnetThicknessM, rotor.HasBackIron);
                    double lift = area * br2 * weight * f * f / Units.Mu0;
                    // Skip terms that cannot matter at the reference gap (zeros of the sinc, weak harmonics).
                    if (lift * Math.Exp(-2.0 * k * referenceGapM) < 1e-3 * tolerance * area * br2 * reference / Units.Mu0)
                    {
                        continue;
                    }
                    modes.Add(new Mode(r, k, Units.Mu0 * order * p / (k * k), lift, lift * r * (q / k)));
                }
            }
        }
        return modes;
    }
}
