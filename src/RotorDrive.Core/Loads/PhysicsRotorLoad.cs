using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Loads;

/// <summary>The rotor load computed directly from the physics: eddy lift and drag from the three-dimensional model (or the
/// two-dimensional strip model on request), disc windage and bearing drag.</summary>
/// <remarks>
/// <para>Eddy part: <see cref="RotorEddyModel"/> (../DESIGN.md §4.1-4.3) at the plate's conductivity at the given plate
/// temperature (<see cref="PlateMaterial.ConductivityAt"/>, §4.4), scaled by (Br(T)/Br20)^2 for the magnet temperature.
/// Windage: <see cref="DiscWindage"/> at the rotor's outer radius plus its retaining ring. Bearing: <see cref="BearingDrag"/>
/// from the rotor row. Eddy power is the plate loss, equal to eddy torque times speed.</para>
/// <para>Accurate but slow compared with a table lookup (microseconds per call); analyses use
/// the table (<c>TabulatedRotorLoad</c>). Immutable and thread-safe; evaluation allocates nothing.</para>
/// </remarks>
public sealed class PhysicsRotorLoad : IRotorLoad
{
    private readonly RotorEddyModel _eddy;
    private readonly double _windageRadiusM;
    private readonly double _airDensity;
    private readonly double _airViscosity;
    private readonly double _conductivityFactor;
    private readonly double _forceFactor;
    private readonly double _bearingDragNm;
    private readonly double _bearingDampingNmPerRadPerS;

    /// <summary>Builds the direct model for a rotor over a plate.</summary>
    /// <param name="rotor">The rotor design.</param>
    /// <param name="plate">The plate.</param>
    /// <param name="options">Model settings, or null for <see cref="LoadModelOptions.Default"/>.</param>
    /// <exception cref="ArgumentNullException">The rotor or plate is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A rotor, plate or option value is out of range.</exception>
    public PhysicsRotorLoad(RotorDesign rotor, Plate plate, LoadModelOptions? options = null)
    {
        Preconditions.NotNull(rotor, nameof(rotor));
        Preconditions.NotNull(plate, nameof(plate));
        Preconditions.NotNull(plate.Material, "plate material");
        options ??= LoadModelOptions.Default;
        Preconditions.NotNull(options.Air, "air properties");
        Preconditions.Positive(options.Air.DensityKgM3, "air density");
        Preconditions.Positive(options.Air.KinematicViscosityM2PerS, "air kinematic viscosity");
        Preconditions.Positive(plate.Material.ConductivitySPerM, "plate conductivity at 20 C");
        Preconditions.Finite(plate.Material.TempCoeffPerK, "plate temperature coefficient");
        Preconditions.NonNegative(rotor.BearingDragNm, "rotor bearing drag");
        Preconditions.NonNegative(rotor.BearingDampingNmPerRadPerS, "rotor bearing damping");
        Preconditions.Finite(rotor.RemanenceTempCoeffPerK, "rotor remanence temperature coefficient");
        var calibration = options.Calibration ?? LoadCalibration.Identity;
        calibration.Validate();
        Rotor = rotor;
        Plate = plate;
        Options = options;
        Preconditions.NonNegative(plate.BackIronM, "plate back iron thickness");
        _conductivityFactor = calibration.ConductivityFactor;
        // Pressures go as the square of the source field (../DESIGN.md §4.2), so a field factor f scales forces by f^2.
        _forceFactor = calibration.FieldFactor * calibration.FieldFactor;
        _bearingDragNm = calibration.BearingDragNm ?? rotor.BearingDragNm;
        _bearingDampingNmPerRadPerS = calibration.BearingDampingNmPerRadPerS ?? rotor.BearingDampingNmPerRadPerS;
        _eddy = options.Model == LoadModelKind.TwoDimensional
            ? RotorEddyModel.TwoDimensional(rotor, plate, options.EndEffectCorrection, options.RadialPoints)
            : RotorEddyModel.ThreeDimensional(rotor, plate, options.Harmonics, options.ReferenceGapM, options.SeriesTolerance);
        _windageRadiusM = rotor.OuterRadiusM + Math.Max(0.0, rotor.RetainerThicknessM ?? 0.0);
        _airDensity = options.Air.DensityKgM3;
        _airViscosity = options.Air.KinematicViscosityM2PerS;
    }

    /// <summary>The rotor design.</summary>
    public RotorDesign Rotor { get; }

    /// <summary>The plate.</summary>
    public Plate Plate { get; }

    /// <summary>The model settings.</summary>
    public LoadModelOptions Options { get; }

    /// <summary>The calibration applied (<see cref="LoadCalibration.Identity"/> when the options carry none).</summary>
    public LoadCalibration Calibration => Options.Calibration ?? LoadCalibration.Identity;

    /// <summary>The eddy-current quadrature this load uses.</summary>
    public RotorEddyModel Eddy => _eddy;

    /// <summary>Radius used for the windage torque: outer magnet radius plus retaining ring, m.</summary>
    public double WindageRadiusM => _windageRadiusM;

    /// <summary>Evaluates lift, eddy torque, windage, bearing drag and eddy power at a speed, gap and temperatures.</summary>
    /// <param name="speedRadPerS">Shaft speed, rad/s (signed; negative is the reversed spin: torques flip, lift stays).</param>
    /// <param name="gapM">Air gap between magnet face and plate, m, at least 0.</param>
    /// <param name="plateTempC">Plate temperature, C (the plate's conductivity must stay positive).</param>
    /// <param name="magnetTempC">Magnet temperature, C (the remanence must stay at least 0).</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or out of range.</exception>
    public LoadPoint Evaluate(double speedRadPerS, double gapM, double plateTempC, double magnetTempC)
    {
        Preconditions.Finite(speedRadPerS, nameof(speedRadPerS));
        Preconditions.NonNegative(gapM, nameof(gapM));
        double sigma = ConductivityAt(plateTempC);
        double scale = ForceScale(magnetTempC);
        EddyForces eddy = _eddy.Evaluate(sigma, speedRadPerS, gapM);
        double windage = DiscWindage.TorqueUnchecked(speedRadPerS, _windageRadiusM, _airDensity, _airViscosity);
        double bearing = BearingDrag.TorqueUnchecked(speedRadPerS, _bearingDragNm, _bearingDampingNmPerRadPerS);
        return new LoadPoint(scale * eddy.LiftN, scale * eddy.TorqueNm, windage, bearing, scale * eddy.PowerW);
    }

    /// <summary>The conductivity the rotor sees at a plate temperature: the material's, times the calibration's factor, S/m.</summary>
    internal double ConductivityAt(double plateTempC) => PlateConductivity(Plate.Material, plateTempC) * _conductivityFactor;

    /// <summary>Scale of the eddy forces at a magnet temperature: (Br(T)/Br20)^2 times the calibration's field factor squared.</summary>
    internal double ForceScale(double magnetTempC) => RemanenceScale(Rotor, magnetTempC) * _forceFactor;

    /// <summary>Eddy lift and torque at 20 C remanence (no calibration factor) for a product sigma*omega (S rad / (m s), at least 0) and a gap.</summary>
    internal (double LiftN, double TorqueNm) EddyAtSigmaOmega(double sigmaOmega, double gapM)
    {
        EddyForces f = _eddy.Evaluate(sigmaOmega, 1.0, gapM);
        return (f.LiftN, f.TorqueNm);
    }

    /// <summary>Windage plus bearing torque at a signed speed, N m.</summary>
    internal (double WindageNm, double BearingNm) MechanicalTorques(double speedRadPerS)
        => (DiscWindage.TorqueUnchecked(speedRadPerS, _windageRadiusM, _airDensity, _airViscosity),
            BearingDrag.TorqueUnchecked(speedRadPerS, _bearingDragNm, _bearingDampingNmPerRadPerS));

    /// <summary>Plate conductivity at a temperature, checked to be positive.</summary>
    internal static double PlateConductivity(PlateMaterial material, double plateTempC)
    {
        Preconditions.Finite(plateTempC, nameof(plateTempC));
        double sigma = material.ConductivityAt(plateTempC);
        if (!(sigma > 0) || !double.IsFinite(sigma))
        {
            throw new ArgumentOutOfRangeException(nameof(plateTempC), plateTempC, $"plate temperature {plateTempC} C gives a non-positive conductivity for material '{material.Id}'.");
        }
        return sigma;
    }

    /// <summary>(Br(T)/Br20)^2, checked to be finite and the remanence non-negative.</summary>
    internal static double RemanenceScale(RotorDesign rotor, double magnetTempC)
    {
        Preconditions.Finite(magnetTempC, nameof(magnetTempC));
        double ratio = 1 + rotor.RemanenceTempCoeffPerK * (magnetTempC - 20.0);
        if (ratio < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(magnetTempC), magnetTempC, $"magnet temperature {magnetTempC} C gives a negative remanence for rotor '{rotor.Id}'.");
        }
        return ratio * ratio;
    }
}
