using RotorDrive.Core.Loads;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>A station's rotor load under drawn plate thickness, plate conductivity and magnet remanence, read from the
/// shared load tables of the nominal rig (and, when the thickness varies, two more tables at plus and minus a thickness
/// step).</summary>
/// <remarks>
/// <para>Conductivity: the eddy forces depend on sigma and omega only through sigma omega (../DESIGN.md §4.3), so a drawn
/// conductivity at 20 C moves the table query along its sigma omega axis: sigma(T) = sigma20' / (1 + alpha (T - 20)).
/// Remanence: the layer model's pressures go as the square of the source field, which is proportional to Br, so lift
/// and eddy torque scale by (Br' / Br)^2 on top of the magnet temperature's (Br(T)/Br20)^2 (K. Halbach, Nucl. Instrum.
/// Methods 169, 1980). Thickness changes the plate's response itself: the eddy lift and torque are the three-point
/// Lagrange interpolation in thickness between the tables at d0 - h, d0 and d0 + h (M. Abramowitz and I. A. Stegun,
/// "Handbook of Mathematical Functions", 1964, 25.2.11; error of order h^3 times the third thickness derivative).
/// Windage and bearing drag do not depend on the plate and come from the nominal table.</para>
/// <para>Immutable and thread-safe; lookups allocate nothing.</para>
/// </remarks>
internal sealed class SpreadRotorLoad : IRotorLoad
{
    private readonly TabulatedRotorLoad _nominal;
    private readonly TabulatedRotorLoad? _thinner;
    private readonly TabulatedRotorLoad? _thicker;
    private readonly double _wThin;
    private readonly double _wNominal;
    private readonly double _wThick;
    private readonly double _conductivityRatio;
    private readonly double _remanenceScale;
    private readonly double? _bearingDragNm;
    private readonly double? _bearingDampingNmPerRadPerS;

    /// <param name="nominal">The table at the nominal thickness.</param>
    /// <param name="thinner">The table at d0 - h, or null when the thickness does not vary.</param>
    /// <param name="thicker">The table at d0 + h, or null when the thickness does not vary.</param>
    /// <param name="stepM">The thickness step h, m (ignored without the two extra tables).</param>
    /// <param name="thicknessM">The drawn thickness, m.</param>
    /// <param name="conductivity20SPerM">The drawn conductivity at 20 C, S/m.</param>
    /// <param name="remanenceT">The drawn remanence at 20 C, T.</param>
    /// <param name="calibration">The drawn bench calibration of the rotor, or null to keep the table's own: its factors
    /// replace the table's (conductivity factor along sigma omega, field factor squared on the forces), its bearing terms
    /// the table's.</param>
    public SpreadRotorLoad(TabulatedRotorLoad nominal, TabulatedRotorLoad? thinner, TabulatedRotorLoad? thicker, double stepM,
        double thicknessM, double conductivity20SPerM, double remanenceT, LoadCalibration? calibration = null)
    {
        _nominal = nominal;
        _thinner = thinner;
        _thicker = thicker;
        if (thinner is not null && thicker is not null)
        {
            // Three-point Lagrange weights at u = (d - d0) / h over the nodes -1, 0, +1 (Abramowitz & Stegun 25.2.11).
            double u = (thicknessM - nominal.Direct.Plate.ThicknessM) / stepM;
            _wThin = 0.5 * u * (u - 1);
            _wNominal = 1 - u * u;
            _wThick = 0.5 * u * (u + 1);
        }
        _conductivityRatio = conductivity20SPerM / nominal.Direct.Plate.Material.ConductivitySPerM;
        double ratio = remanenceT / nominal.Direct.Rotor.RemanenceT;
        _remanenceScale = ratio * ratio;
        if (calibration is not null)
        {
            var table = nominal.Direct.Calibration;
            _conductivityRatio *= calibration.ConductivityFactor / table.ConductivityFactor;
            double field = calibration.FieldFactor / table.FieldFactor;
            _remanenceScale *= field * field;
            _bearingDragNm = calibration.BearingDragNm;
            _bearingDampingNmPerRadPerS = calibration.BearingDampingNmPerRadPerS;
        }
    }

    /// <inheritdoc/>
    public LoadPoint Evaluate(double speedRadPerS, double gapM, double plateTempC, double magnetTempC)
    {
        Preconditions.Finite(speedRadPerS, nameof(speedRadPerS));
        Preconditions.NonNegative(gapM, nameof(gapM));
        var direct = _nominal.Direct;
        double sigma = direct.ConductivityAt(plateTempC) * _conductivityRatio;
        double scale = direct.ForceScale(magnetTempC) * _remanenceScale;
        double x = sigma * Math.Abs(speedRadPerS);
        (double lift, double torque) = _nominal.EddyAtSigmaOmega(x, gapM);
        if (_thinner is not null && _thicker is not null)
        {
            var (l0, q0) = _thinner.EddyAtSigmaOmega(x, gapM);
            var (l2, q2) = _thicker.EddyAtSigmaOmega(x, gapM);
            lift = _wThin * l0 + _wNominal * lift + _wThick * l2;
            torque = _wThin * q0 + _wNominal * torque + _wThick * q2;
        }
        lift *= scale;
        torque *= scale;
        if (speedRadPerS < 0)
        {
            torque = -torque;
        }
        (double windage, double bearing) = direct.MechanicalTorques(speedRadPerS);
        if (_bearingDragNm is not null || _bearingDampingNmPerRadPerS is not null)
        {
            bearing = BearingDrag.TorqueUnchecked(speedRadPerS, _bearingDragNm ?? direct.Calibration.BearingDragNm ?? direct.Rotor.BearingDragNm,
                _bearingDampingNmPerRadPerS ?? direct.Calibration.BearingDampingNmPerRadPerS ?? direct.Rotor.BearingDampingNmPerRadPerS);
        }
        return new LoadPoint(lift, torque, windage, bearing, torque * speedRadPerS);
    }
}
