namespace RotorDrive.Core.Thermal;

/// <summary>How a plate loses heat from its faces: a convection coefficient for the top and the bottom face and the
/// emissivity of the top face.</summary>
/// <remarks>Radiation from the top face to surroundings at ambient is linearised about a reference temperature:
/// h_r = eps sigma_SB (T_s + T_a)(T_s^2 + T_a^2), kelvin (F. P. Incropera et al., "Fundamentals of Heat and Mass
/// Transfer", 6th ed., 2007, eq. 1.9). The bottom face's exchange with a floor or a support is in its convection
/// coefficient.</remarks>
/// <param name="TopConvectionWPerM2K">Convection coefficient of the top face (under the rotors), W/(m^2 K), &gt;= 0.</param>
/// <param name="BottomConvectionWPerM2K">Convection (or contact) coefficient of the bottom face, W/(m^2 K), &gt;= 0.</param>
/// <param name="Emissivity">Emissivity of the top face, 0..1 (0: no radiation).</param>
public sealed record PlateCooling(double TopConvectionWPerM2K, double BottomConvectionWPerM2K, double Emissivity = 0.0)
{
    /// <summary>The Stefan-Boltzmann constant, W/(m^2 K^4) (CODATA 2018, exact since the 2019 SI).</summary>
    public const double StefanBoltzmannWPerM2K4 = 5.670374419e-8;

    /// <summary>Both faces at one convection coefficient, no radiation.</summary>
    /// <param name="convectionWPerM2K">Convection coefficient of each face, W/(m^2 K).</param>
    public static PlateCooling BothFaces(double convectionWPerM2K) => new(convectionWPerM2K, convectionWPerM2K);

    /// <summary>Linearised radiation coefficient of the top face at a surface temperature, W/(m^2 K)
    /// (Incropera 2007, eq. 1.9).</summary>
    /// <param name="surfaceC">Surface temperature, C.</param>
    /// <param name="ambientC">Surroundings temperature, C.</param>
    public double RadiationWPerM2K(double surfaceC, double ambientC)
    {
        double ts = surfaceC + 273.15, ta = ambientC + 273.15;
        return Emissivity * StefanBoltzmannWPerM2K4 * (ts + ta) * (ts * ts + ta * ta);
    }

    /// <summary>Total face loss coefficient H = h_top + h_bottom + h_r, W/(m^2 K).</summary>
    /// <param name="surfaceC">Surface temperature the radiation is linearised at, C.</param>
    /// <param name="ambientC">Ambient temperature, C.</param>
    public double TotalWPerM2K(double surfaceC, double ambientC)
        => TopConvectionWPerM2K + BottomConvectionWPerM2K + RadiationWPerM2K(surfaceC, ambientC);
}
