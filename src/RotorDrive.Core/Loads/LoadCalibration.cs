namespace RotorDrive.Core.Loads;

/// <summary>Factors fitted to bench data that correct the load model of one rotor design over its plate.</summary>
/// <remarks>
/// <para>ConductivityFactor multiplies the plate conductivity the rotor sees: because the eddy forces depend on the
/// conductivity and the speed only through sigma omega (../DESIGN.md §4.3), it moves the drag peak along the speed axis
/// (peak speed divided by the factor) without changing its height. FieldFactor multiplies the source field: the layer
/// model's pressures go as the square of the field (../DESIGN.md §4.2), so lift and eddy torque scale with its square.
/// The bearing terms replace the rotor row's constant and viscous bearing drag when given. The factors act on the load
/// model's inputs, not inside its formulas, so any eddy model behind <see cref="PhysicsRotorLoad"/> takes them.</para>
/// <para>The identity (factors 1, no bearing override) leaves the model unchanged.</para>
/// </remarks>
/// <param name="ConductivityFactor">Multiplier of the plate conductivity seen by the rotor, greater than 0.</param>
/// <param name="FieldFactor">Multiplier of the source field, at least 0.</param>
/// <param name="BearingDragNm">Constant bearing drag torque, N m, or null to keep the rotor row's.</param>
/// <param name="BearingDampingNmPerRadPerS">Viscous bearing drag, N m per rad/s, or null to keep the rotor row's.</param>
public sealed record LoadCalibration(double ConductivityFactor, double FieldFactor, double? BearingDragNm, double? BearingDampingNmPerRadPerS)
{
    /// <summary>No correction: both factors 1 and the rotor row's bearing terms.</summary>
    public static LoadCalibration Identity { get; } = new(1.0, 1.0, null, null);

    /// <summary>Checks every member and throws on the first one out of range.</summary>
    /// <exception cref="ArgumentOutOfRangeException">A member is NaN, infinite or out of range.</exception>
    public void Validate()
    {
        Preconditions.Positive(ConductivityFactor, "calibration conductivity factor");
        Preconditions.NonNegative(FieldFactor, "calibration field factor");
        if (BearingDragNm is { } drag)
        {
            Preconditions.NonNegative(drag, "calibration bearing drag");
        }
        if (BearingDampingNmPerRadPerS is { } damping)
        {
            Preconditions.NonNegative(damping, "calibration bearing damping");
        }
    }
}
