using RotorDrive.Core.Magnetics;

namespace RotorDrive.Core.Safety;

/// <summary>Rotor burst check: rim speed and hoop stress of the ring that retains the magnets, against its allowable.</summary>
/// <remarks>
/// <para>Model: a thin ring of radial thickness t around the magnet annulus (ri..ro, axial height h = magnet
/// thickness), its mean radius r_m = ro + t/2. Its hoop stress is the sum of
/// (1) its own rotation: sigma = rho_ring omega^2 r_m^2 (thin rotating ring; S. P. Timoshenko and J. N. Goodier,
/// "Theory of Elasticity", 3rd ed., 1970, rotating disc in the thin-ring limit; W. C. Young and R. G. Budynas, "Roark's
/// Formulas for Stress and Strain", 7th ed., 2002, ch. 16 rotating rings), and
/// (2) the magnets' centrifugal load, carried as an internal pressure p = F / (2 pi ro h), where
/// F = integral rho_m omega^2 r h 2 pi r dr = rho_m h omega^2 2 pi (ro^3 - ri^3) / 3 = m omega^2 r_cg is the sum of
/// the magnets' radial forces; a thin-walled cylinder under internal pressure has sigma = p ro / t (Roark, table 13.1,
/// thin-walled cylinder), so sigma = rho_m omega^2 (ro^3 - ri^3) / (3 t). Chapter and table numbers are from memory.</para>
/// <para>Assumptions, all conservative or stated: the magnets carry no hoop load themselves (segmented Halbach arrays
/// have joints, and sintered NdFeB is brittle with a tensile strength of only about 80 MPa, from memory of
/// manufacturers' datasheets); the hub carries none of the magnet load; the magnets fill the annulus; the ring is as
/// tall as the magnets and thin (t well below r_m); no interference fit, thermal or bending stress; the allowable comes
/// from the rotor row and already holds the designer's material factor. The tool estimates: a real rotor needs its
/// maker's rating and spin testing.</para>
/// </remarks>
public static class RotorSafety
{
    /// <summary>Hoop stress of a thin ring spinning freely: rho omega^2 r^2, Pa (Timoshenko &amp; Goodier; Roark).</summary>
    /// <param name="densityKgM3">Ring density, kg/m^3, &gt; 0.</param>
    /// <param name="radiusM">Mean ring radius, m, &gt; 0.</param>
    /// <param name="speedRadPerS">Speed, rad/s.</param>
    /// <exception cref="ArgumentOutOfRangeException">A value is out of range.</exception>
    public static double ThinRingHoopStressPa(double densityKgM3, double radiusM, double speedRadPerS)
    {
        Preconditions.Positive(densityKgM3, nameof(densityKgM3));
        Preconditions.Positive(radiusM, nameof(radiusM));
        Preconditions.Finite(speedRadPerS, nameof(speedRadPerS));
        double rimSpeed = speedRadPerS * radiusM;
        return densityKgM3 * rimSpeed * rimSpeed;
    }

    /// <summary>Assesses a rotor at its maximum rated speed.</summary>
    /// <param name="rotor">The rotor design.</param>
    /// <param name="options">Material assumptions; null for <see cref="RotorSafetyOptions.Default"/>.</param>
    /// <exception cref="ArgumentNullException"><paramref name="rotor"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A rotor dimension is out of range.</exception>
    public static RotorSafetyResult AtRatedSpeed(RotorDesign rotor, RotorSafetyOptions? options = null)
        => Assess(Preconditions.NotNull(rotor, nameof(rotor)), rotor.MaxSpeedRadPerS, options);

    /// <summary>Assesses a rotor at a speed: rim speed, ring hoop stress (own rotation plus magnet load), margin.</summary>
    /// <param name="rotor">The rotor design (radii, magnet thickness and density, retainer thickness and allowable).</param>
    /// <param name="speedRadPerS">Speed, rad/s, &gt; 0.</param>
    /// <param name="options">Material assumptions; null for <see cref="RotorSafetyOptions.Default"/>.</param>
    /// <returns>The result; stress and margin are null ("not assessed") when the rotor row lacks retainer data.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="rotor"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The speed or a rotor dimension is out of range.</exception>
    public static RotorSafetyResult Assess(RotorDesign rotor, double speedRadPerS, RotorSafetyOptions? options = null)
    {
        Preconditions.NotNull(rotor, nameof(rotor));
        Preconditions.Positive(speedRadPerS, nameof(speedRadPerS));
        var o = options ?? RotorSafetyOptions.Default;
        double ri = Preconditions.NonNegative(rotor.InnerRadiusM, nameof(rotor.InnerRadiusM));
        double ro = Preconditions.Positive(rotor.OuterRadiusM, nameof(rotor.OuterRadiusM));
        if (ro <= ri)
        {
            throw new ArgumentOutOfRangeException(nameof(rotor), $"rotor {rotor.Id}: outer radius {ro} m must exceed inner radius {ri} m.");
        }
        double h = Preconditions.Positive(rotor.MagnetThicknessM, nameof(rotor.MagnetThicknessM));
        double magnetDensity = rotor.MagnetDensityKgM3 is { } d ? Preconditions.Positive(d, nameof(rotor.MagnetDensityKgM3)) : o.DefaultMagnetDensityKgM3;
        double magnetMass = magnetDensity * Math.PI * (ro * ro - ri * ri) * h;
        double w2 = speedRadPerS * speedRadPerS;

        if (rotor.RetainerThicknessM is not { } t)
        {
            return new RotorSafetyResult(rotor.Id, speedRadPerS, rotor.MaxSpeedRadPerS, speedRadPerS * ro, magnetMass,
                RetainerAssessment.NoRetainerThickness, null, null, null, rotor.RetainerAllowablePa, null, null);
        }
        Preconditions.Positive(t, nameof(rotor.RetainerThicknessM));

        double own = ThinRingHoopStressPa(o.RetainerDensityKgM3, ro + t / 2, speedRadPerS);
        // sigma = p ro / t with p = F / (2 pi ro h), F = rho_m h omega^2 2 pi (ro^3 - ri^3) / 3 (Roark, thin-walled cylinder).
        double load = magnetDensity * w2 * (ro * ro * ro - ri * ri * ri) / (3 * t);
        double stress = own + load;
        double rim = speedRadPerS * (ro + t);

        if (rotor.RetainerAllowablePa is not { } allowable)
        {
            return new RotorSafetyResult(rotor.Id, speedRadPerS, rotor.MaxSpeedRadPerS, rim, magnetMass,
                RetainerAssessment.NoAllowableStress, stress, own, load, null, null, null);
        }
        Preconditions.Positive(allowable, nameof(rotor.RetainerAllowablePa));
        return new RotorSafetyResult(rotor.Id, speedRadPerS, rotor.MaxSpeedRadPerS, rim, magnetMass,
            RetainerAssessment.Assessed, stress, own, load, allowable, allowable / stress - 1,
            speedRadPerS * Math.Sqrt(allowable / stress));
    }
}
