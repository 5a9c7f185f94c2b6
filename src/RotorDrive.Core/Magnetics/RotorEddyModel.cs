using System.Numerics;
using MathNet.Numerics.Integration;

namespace RotorDrive.Core.Magnetics;

/// <summary>Eddy-current lift, drag torque and plate loss of a Halbach rotor over a plate, by radial quadrature of the 2-D
/// strip model.</summary>
/// <remarks>
/// <para>Each radius r of the magnet annulus is treated as a 2-D strip (../DESIGN.md §4.3): wavenumber k = p/r, source
/// field from <see cref="HalbachSource"/>, plate response from <see cref="PlateResponse"/> at electrical speed
/// we = p omega, pressures from <see cref="EddyPressure"/>. Lift = integral of P_L 2 pi r dr and torque = integral of
/// P_D r 2 pi r dr over [r_i, r_o] by Gauss-Legendre quadrature (MathNet.Numerics GaussLegendreRule; nodes and weights
/// computed once here). Plate loss = integral of P_D (omega r) 2 pi r dr, summed separately.</para>
/// <para>With the end correction on, the conductivity at each radius is multiplied by the Russell-Norsworthy factor
/// (<see cref="EndEffect"/>) for active width r_o - r_i and a wide plate. Because the conductivity and the speed enter
/// only through eps = mu0 sigma p omega / k^2, all results depend on them only through sigma times omega; the gap enters
/// only through the source amplitude, e^(-2 k g) in the pressures. Values are at the rotor's 20 C remanence; forces
/// scale with the square of the remanence.</para>
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

    /// <summary>Builds the quadrature for a rotor over a plate of a given thickness.</summary>
    /// <param name="rotor">The rotor design (its remanence at 20 C is used).</param>
    /// <param name="plateThicknessM">Plate thickness, m, greater than 0.</param>
    /// <param name="endEffectCorrection">Apply the Russell-Norsworthy factor to the conductivity (default true).</param>
    /// <param name="radialPoints">Gauss-Legendre points over the annulus, 2..256 (default 24).</param>
    /// <exception cref="ArgumentNullException">The rotor is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The geometry is invalid or a count is out of range.</exception>
    public RotorEddyModel(RotorDesign rotor, double plateThicknessM, bool endEffectCorrection = true, int radialPoints = 24)
    {
        Preconditions.NotNull(rotor, nameof(rotor));
        Preconditions.Positive(plateThicknessM, nameof(plateThicknessM));
        Preconditions.InRange(radialPoints, 2, 256, nameof(radialPoints));
        Preconditions.Positive(rotor.InnerRadiusM, "rotor inner radius");
        Preconditions.Positive(rotor.MagnetThicknessM, "rotor magnet thickness");
        Preconditions.NonNegative(rotor.RemanenceT, "rotor remanence");
        if (!(rotor.OuterRadiusM > rotor.InnerRadiusM) || !double.IsFinite(rotor.OuterRadiusM))
        {
            throw new ArgumentOutOfRangeException(nameof(rotor), rotor.OuterRadiusM, $"rotor outer radius must exceed the inner radius {rotor.InnerRadiusM} m; got {rotor.OuterRadiusM} m.");
        }
        Preconditions.AtLeast(rotor.SegmentsPerWavelength, 2, "rotor segments per wavelength");
        Preconditions.AtLeast(rotor.PolePairs, 1, "rotor pole pairs (segments / segments per wavelength)");

        Rotor = rotor;
        PlateThicknessM = plateThicknessM;
        EndEffectCorrection = endEffectCorrection;
        RadialPoints = radialPoints;

        var rule = new GaussLegendreRule(rotor.InnerRadiusM, rotor.OuterRadiusM, radialPoints);
        int p = rotor.PolePairs;
        double halfWidth = 0.5 * rotor.ActiveWidthM;
        _radiusM = new double[radialPoints];
        _wavenumberPerM = new double[radialPoints];
        _thicknessTimesWavenumber = new double[radialPoints];
        _epsPerSigmaOmega = new double[radialPoints];
        _liftWeightN = new double[radialPoints];
        _torqueWeightNm = new double[radialPoints];
        for (int j = 0; j < radialPoints; j++)
        {
            double r = rule.GetAbscissa(j);
            double k = p / r;
            double faceField = HalbachSource.FieldT(rotor.RemanenceT, rotor.SegmentsPerWavelength, rotor.MagnetThicknessM, k, 0.0);
            double endFactor = endEffectCorrection ? EndEffect.RussellNorsworthyFactor(k, halfWidth) : 1.0;
            double area = rule.GetWeight(j) * 2.0 * Math.PI * r;
            _radiusM[j] = r;
            _wavenumberPerM[j] = k;
            _thicknessTimesWavenumber[j] = k * plateThicknessM;
            _epsPerSigmaOmega[j] = Units.Mu0 * endFactor * p / (k * k);
            _liftWeightN[j] = area * faceField * faceField / Units.Mu0;
            _torqueWeightNm[j] = _liftWeightN[j] * r;
        }
    }

    /// <summary>The rotor design.</summary>
    public RotorDesign Rotor { get; }

    /// <summary>Plate thickness, m.</summary>
    public double PlateThicknessM { get; }

    /// <summary>Whether the Russell-Norsworthy end correction is applied.</summary>
    public bool EndEffectCorrection { get; }

    /// <summary>Number of Gauss-Legendre points over the annulus.</summary>
    public int RadialPoints { get; }

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
        double lift = 0, torque = 0, power = 0;
        for (int j = 0; j < _radiusM.Length; j++)
        {
            Complex r = PlateResponse.ReflectionUnchecked(_epsPerSigmaOmega[j] * sigmaOmega, _thicknessTimesWavenumber[j]);
            double source = Math.Exp(-2.0 * _wavenumberPerM[j] * gapM);
            lift -= _liftWeightN[j] * source * r.Real;
            torque -= _torqueWeightNm[j] * source * r.Imaginary;
            // Plate loss summed on its own: drag pressure times the local slip speed omega r, over the strip's area.
            power -= _liftWeightN[j] * source * r.Imaginary * (speedRadPerS * _radiusM[j]);
        }
        return new EddyForces(lift, torque, power);
    }

    /// <summary>Quadrature radii, m (for table builders).</summary>
    internal ReadOnlySpan<double> RadiusM => _radiusM;

    /// <summary>Wavenumbers k = p/r at the quadrature radii, 1/m.</summary>
    internal ReadOnlySpan<double> WavenumberPerM => _wavenumberPerM;

    /// <summary>k d at the quadrature radii.</summary>
    internal ReadOnlySpan<double> ThicknessTimesWavenumber => _thicknessTimesWavenumber;

    /// <summary>eps per unit sigma omega at the quadrature radii (end factor included).</summary>
    internal ReadOnlySpan<double> EpsPerSigmaOmega => _epsPerSigmaOmega;

    /// <summary>Quadrature weight times area times Bface^2/mu0 for lift, N, at the quadrature radii.</summary>
    internal ReadOnlySpan<double> LiftWeightN => _liftWeightN;

    /// <summary>Lift weight times radius for torque, N m.</summary>
    internal ReadOnlySpan<double> TorqueWeightNm => _torqueWeightNm;
}
