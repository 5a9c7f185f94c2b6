using System.Runtime.CompilerServices;

namespace RotorDrive.Core.Studies.Ranking;

/// <summary>Ranking's specialised copy of the drive equations for a hover: every station draws the motor current its
/// torque needs, so each controller's bus current is a constant-power term and the pack bus is one quadratic. The same
/// equations <see cref="Drive.DriveBus"/> solves for motor-current commands (Drela's first-order motor, the averaged
/// controller, the Thevenin pack); a property test holds the two equal to 1e-9 over random inputs.</summary>
internal static class RankDriveEquations
{
    /// <summary>One station's motor side at a shaft torque and speed (M. Drela, "First-Order DC Electric Motor Model", MIT,
    /// 2007): current I = Kv Q / phi + I0, back-EMF E = phi omega / Kv; the controller's duty times the bus voltage is
    /// I R_loop + E with R_loop = R(T) + R_on.</summary>
    /// <param name="torqueNm">Shaft torque, N m.</param>
    /// <param name="speedRadPerS">Shaft speed, rad/s.</param>
    /// <param name="kvRadPerSPerV">Motor Kv, rad/s per V.</param>
    /// <param name="fluxFactor">Relative flux of the motor's magnets.</param>
    /// <param name="noLoadCurrentA">No-load current I0, A.</param>
    /// <param name="windingOhm">Winding resistance at its temperature, ohm.</param>
    /// <param name="onResistanceOhm">Controller on-resistance, ohm.</param>
    /// <param name="currentA">Motor current, A.</param>
    /// <param name="dutyTimesBusV">Duty times bus voltage (I R_loop + E), V.</param>
    /// <param name="motorPowerW">Motor input power (I R + E) I, W.</param>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Station(double torqueNm, double speedRadPerS, double kvRadPerSPerV, double fluxFactor, double noLoadCurrentA,
        double windingOhm, double onResistanceOhm, out double currentA, out double dutyTimesBusV, out double motorPowerW)
    {
        double current = torqueNm * kvRadPerSPerV / fluxFactor + noLoadCurrentA;
        double emf = fluxFactor * speedRadPerS / kvRadPerSPerV;
        currentA = current;
        dutyTimesBusV = current * (windingOhm + onResistanceOhm) + emf;
        motorPowerW = (current * windingOhm + emf) * current;
    }

    /// <summary>The bank of identical packs in parallel as ranking sees it: resistance R_pack / count, ohm.</summary>
    /// <param name="pack">One pack.</param>
    /// <param name="count">Packs in parallel.</param>
    public static double BankResistanceOhm(Drive.BatteryPack pack, int count) => pack.ResistanceOhm / count;

    /// <summary>The bank's open-circuit voltage: series cells times one cell's open-circuit voltage, V.</summary>
    /// <param name="cellsSeries">Series cell count.</param>
    /// <param name="cellOcvV">One cell's open-circuit voltage at the state of charge, V.</param>
    public static double OpenCircuitV(int cellsSeries, double cellOcvV) => cellsSeries * cellOcvV;

    /// <summary>The bus with every station drawing a fixed motor current (constant-power terms sum P = sum (I R_loop + E) I):
    /// V = Voc - R_bank (sum P / V + idle), the larger root; false when there is none or it is below Voc / 2 (past the
    /// pack's maximum-power point, where <see cref="Drive.DriveBus"/> reports a collapse).</summary>
    /// <param name="voc">Open-circuit voltage, V.</param>
    /// <param name="rb">Bank resistance, ohm.</param>
    /// <param name="idle">Sum of the controllers' idle currents, A.</param>
    /// <param name="sumP">Sum of the stations' constant-power terms, W.</param>
    /// <param name="v">Bus voltage, V.</param>
    /// <param name="ipack">Pack current, A.</param>
    public static bool Bus(double voc, double rb, double idle, double sumP, out double v, out double ipack)
    {
        if (rb == 0)
        {
            v = voc;
        }
        else
        {
            double a = voc - rb * idle;
            double disc = a * a - 4 * rb * sumP;
            if (!(disc >= 0))
            {
                v = 0;
                ipack = 0;
                return false;
            }
            v = 0.5 * (a + Math.Sqrt(disc));
        }
        ipack = sumP / v + idle;
        return v >= 0.5 * voc && v > 0;
    }
}
