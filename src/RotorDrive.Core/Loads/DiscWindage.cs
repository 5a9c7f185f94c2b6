namespace RotorDrive.Core.Loads;

/// <summary>Aerodynamic drag torque of a disc spinning in still air.</summary>
/// <remarks>
/// <para>Torque = 0.5 C_M rho omega^2 R^5 with Re = omega R^2 / nu and moment coefficient C_M = 3.87 Re^(-1/2) for a
/// laminar boundary layer (von Karman 1921, Cochran's exact solution) and C_M = 0.146 Re^(-1/5) for a turbulent one
/// (von Karman 1921) (H. Schlichting, Boundary-Layer Theory, chapters on the rotating disc). In Schlichting these
/// coefficients are for a disc wetted on both sides: 0.5 C_M rho omega^2 R^5 is the moment of both faces together.</para>
/// <para>Faces: a levitation rotor has one face free and one face a gap's width above the plate. We apply the
/// free-disc, both-faces formula to the whole rotor; the face over the plate sits in a rotor-stator gap that is open at
/// the rim, whose moment coefficient is of the same order as a free face (common practice, no source), and windage is
/// small next to the eddy drag at hover speeds. The rim is not counted.</para>
/// <para>Transition: the two correlations cross at Re_x = (3.87/0.146)^(10/3), about 5.6e4. We blend them with a
/// logistic weight in ln Re centred there, C_M = C_lam + w (C_turb - C_lam), w = 1 / (1 + (Re_x/Re)^4) (a logistic of
/// width 1/4 in ln Re). Both coefficients are equal at Re_x, so the blend is smooth, never jumps, and is within 0.1 % of
/// the larger correlation below Re_x/5 and above 5 Re_x. Choosing the larger one is conservative: a
/// smooth disc may stay laminar up to Re of about 3e5 (Schlichting), where the laminar value is lower.</para>
/// </remarks>
public static class DiscWindage
{
    private const double LaminarConstant = 3.87;
    private const double TurbulentConstant = 0.146;

    /// <summary>Reynolds number where the laminar and turbulent correlations are equal, (3.87/0.146)^(10/3).</summary>
    public static readonly double CrossoverReynolds = Math.Pow(LaminarConstant / TurbulentConstant, 10.0 / 3.0);

    /// <summary>Laminar moment coefficient of a disc wetted on both sides, 3.87 Re^(-1/2) (Schlichting; von Karman 1921).</summary>
    /// <param name="reynolds">Re = omega R^2 / nu, greater than 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">Re is not a finite positive number.</exception>
    public static double LaminarMomentCoefficient(double reynolds)
        => LaminarConstant / Math.Sqrt(Preconditions.Positive(reynolds, nameof(reynolds)));

    /// <summary>Turbulent moment coefficient of a disc wetted on both sides, 0.146 Re^(-1/5) (Schlichting; von Karman 1921).</summary>
    /// <param name="reynolds">Re = omega R^2 / nu, greater than 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">Re is not a finite positive number.</exception>
    public static double TurbulentMomentCoefficient(double reynolds)
        => TurbulentConstant * Math.Pow(Preconditions.Positive(reynolds, nameof(reynolds)), -0.2);

    /// <summary>Blended moment coefficient (both faces): laminar and turbulent joined smoothly at their crossing.</summary>
    /// <param name="reynolds">Re = omega R^2 / nu, greater than 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">Re is not a finite positive number.</exception>
    public static double MomentCoefficient(double reynolds)
    {
        Preconditions.Positive(reynolds, nameof(reynolds));
        return Blend(reynolds);
    }

    /// <summary>Windage torque of a disc of radius R at a signed speed, N m, with the sign of the speed.</summary>
    /// <param name="speedRadPerS">Shaft speed, rad/s (signed).</param>
    /// <param name="radiusM">Disc radius R, m, greater than 0.</param>
    /// <param name="air">Air properties.</param>
    /// <exception cref="ArgumentOutOfRangeException">An argument is NaN, infinite or out of range.</exception>
    /// <exception cref="ArgumentNullException">The air properties are null.</exception>
    public static double TorqueNm(double speedRadPerS, double radiusM, AirProperties air)
    {
        Preconditions.Finite(speedRadPerS, nameof(speedRadPerS));
        Preconditions.Positive(radiusM, nameof(radiusM));
        Preconditions.NotNull(air, nameof(air));
        return TorqueUnchecked(speedRadPerS, radiusM, air.DensityKgM3, air.KinematicViscosityM2PerS);
    }

    internal static double TorqueUnchecked(double speedRadPerS, double radiusM, double densityKgM3, double viscosityM2PerS)
    {
        double omega = Math.Abs(speedRadPerS);
        if (omega == 0)
        {
            return 0.0;
        }
        double r2 = radiusM * radiusM;
        double reynolds = omega * r2 / viscosityM2PerS;
        double torque = 0.5 * Blend(reynolds) * densityKgM3 * omega * omega * r2 * r2 * radiusM;
        return speedRadPerS < 0 ? -torque : torque;
    }

    private static double Blend(double reynolds)
    {
        double laminar = LaminarConstant / Math.Sqrt(reynolds);
        double turbulent = TurbulentConstant * Math.Pow(reynolds, -0.2);
        double ratio = CrossoverReynolds / reynolds;
        double r2 = ratio * ratio;
        double weight = 1.0 / (1.0 + r2 * r2);
        return laminar + weight * (turbulent - laminar);
    }
}
