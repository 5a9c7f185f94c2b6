namespace RotorDrive.Core.Numerics;

// The Butcher tableau, the embedded error weights and the continuous extension.
// Coefficients: J. R. Dormand & P. J. Prince, "A family of embedded Runge-Kutta formulae", J. Comput. Appl. Math. 6,
// 19-26, 1980 (table 5.2, "RK5(4)7M"); error weights e = b5 - b4 and dense-output weights d as in the DOPRI5 code
// of Hairer, Norsett & Wanner, "Solving Ordinary Differential Equations I", 1993, II.5-II.6 (continuous extension of
// L. F. Shampine, Math. Comp. 46, 1986).
public sealed partial class DormandPrince45
{
    internal const double C2 = 1.0 / 5.0, C3 = 3.0 / 10.0, C4 = 4.0 / 5.0, C5 = 8.0 / 9.0;

    internal const double A21 = 1.0 / 5.0;
    internal const double A31 = 3.0 / 40.0, A32 = 9.0 / 40.0;
    internal const double A41 = 44.0 / 45.0, A42 = -56.0 / 15.0, A43 = 32.0 / 9.0;
    internal const double A51 = 19372.0 / 6561.0, A52 = -25360.0 / 2187.0, A53 = 64448.0 / 6561.0, A54 = -212.0 / 729.0;
    internal const double A61 = 9017.0 / 3168.0, A62 = -355.0 / 33.0, A63 = 46732.0 / 5247.0, A64 = 49.0 / 176.0,
        A65 = -5103.0 / 18656.0;

    // Fifth-order weights b (the seventh row of A: first same as last).
    internal const double B1 = 35.0 / 384.0, B3 = 500.0 / 1113.0, B4 = 125.0 / 192.0, B5 = -2187.0 / 6784.0, B6 = 11.0 / 84.0;

    // Fourth-order embedded weights b*, kept for the consistency test; the code uses E = b - b* directly.
    internal const double BStar1 = 5179.0 / 57600.0, BStar3 = 7571.0 / 16695.0, BStar4 = 393.0 / 640.0,
        BStar5 = -92097.0 / 339200.0, BStar6 = 187.0 / 2100.0, BStar7 = 1.0 / 40.0;

    internal const double E1 = 71.0 / 57600.0, E3 = -71.0 / 16695.0, E4 = 71.0 / 1920.0, E5 = -17253.0 / 339200.0,
        E6 = 22.0 / 525.0, E7 = -1.0 / 40.0;

    internal const double D1 = -12715105075.0 / 11282082432.0, D3 = 87487479700.0 / 32700410799.0,
        D4 = -10690763975.0 / 1880347072.0, D5 = 701980252875.0 / 199316789632.0,
        D6 = -1453857185.0 / 822651844.0, D7 = 69997945.0 / 29380423.0;

    /// <summary>One trial step of size h from (t, _y) with _k1 = f(t, _y): fills _k2.._k7 and the fifth-order
    /// solution _y1; _k7 = f(t + h, _y1) is the next step's first stage (FSAL).</summary>
    private void Stages<TSystem>(TSystem system, double t, double h) where TSystem : IOdeSystem
    {
        var y = _y.AsSpan();
        var ys = _yStage.AsSpan(0, y.Length);
        var k1 = _k1.AsSpan(0, y.Length);
        var k2 = _k2.AsSpan(0, y.Length);
        var k3 = _k3.AsSpan(0, y.Length);
        var k4 = _k4.AsSpan(0, y.Length);
        var k5 = _k5.AsSpan(0, y.Length);
        var k6 = _k6.AsSpan(0, y.Length);
        var y1 = _y1.AsSpan(0, y.Length);

        for (int i = 0; i < y.Length; i++)
        {
            ys[i] = y[i] + h * A21 * k1[i];
        }
        system.Derivatives(t + C2 * h, ys, k2);
        for (int i = 0; i < y.Length; i++)
        {
            ys[i] = y[i] + h * (A31 * k1[i] + A32 * k2[i]);
        }
        system.Derivatives(t + C3 * h, ys, k3);
        for (int i = 0; i < y.Length; i++)
        {
            ys[i] = y[i] + h * (A41 * k1[i] + A42 * k2[i] + A43 * k3[i]);
        }
        system.Derivatives(t + C4 * h, ys, k4);
        for (int i = 0; i < y.Length; i++)
        {
            ys[i] = y[i] + h * (A51 * k1[i] + A52 * k2[i] + A53 * k3[i] + A54 * k4[i]);
        }
        system.Derivatives(t + C5 * h, ys, k5);
        for (int i = 0; i < y.Length; i++)
        {
            ys[i] = y[i] + h * (A61 * k1[i] + A62 * k2[i] + A63 * k3[i] + A64 * k4[i] + A65 * k5[i]);
        }
        system.Derivatives(t + h, ys, k6);
        for (int i = 0; i < y.Length; i++)
        {
            y1[i] = y[i] + h * (B1 * k1[i] + B3 * k3[i] + B4 * k4[i] + B5 * k5[i] + B6 * k6[i]);
        }
        system.Derivatives(t + h, y1, _k7);
    }

    /// <summary>The scaled RMS norm of the local error estimate h (b - b*) k of the last trial step.</summary>
    private double ErrorNorm(double h, double rtol, double atol)
    {
        var y = _y.AsSpan();
        var y1 = _y1.AsSpan(0, y.Length);
        var k1 = _k1.AsSpan(0, y.Length);
        var k3 = _k3.AsSpan(0, y.Length);
        var k4 = _k4.AsSpan(0, y.Length);
        var k5 = _k5.AsSpan(0, y.Length);
        var k6 = _k6.AsSpan(0, y.Length);
        var k7 = _k7.AsSpan(0, y.Length);
        double sum = 0;
        for (int i = 0; i < y.Length; i++)
        {
            double e = h * (E1 * k1[i] + E3 * k3[i] + E4 * k4[i] + E5 * k5[i] + E6 * k6[i] + E7 * k7[i]);
            double sc = atol + rtol * Math.Max(Math.Abs(y[i]), Math.Abs(y1[i]));
            double r = e / sc;
            sum += r * r;
        }
        return Math.Sqrt(sum / y.Length);
    }

    /// <summary>Stores the coefficients of the continuous extension of the accepted step [t, t + h] (before the
    /// buffers are swapped): y(t + theta h) = r1 + theta (r2 + (1 - theta) (r3 + theta (r4 + (1 - theta) r5))).</summary>
    private void PrepareDense(double t, double h)
    {
        var y = _y.AsSpan();
        var y1 = _y1.AsSpan(0, y.Length);
        var k1 = _k1.AsSpan(0, y.Length);
        var k3 = _k3.AsSpan(0, y.Length);
        var k4 = _k4.AsSpan(0, y.Length);
        var k5 = _k5.AsSpan(0, y.Length);
        var k6 = _k6.AsSpan(0, y.Length);
        var k7 = _k7.AsSpan(0, y.Length);
        var r1 = _r1.AsSpan(0, y.Length);
        var r2 = _r2.AsSpan(0, y.Length);
        var r3 = _r3.AsSpan(0, y.Length);
        var r4 = _r4.AsSpan(0, y.Length);
        var r5 = _r5.AsSpan(0, y.Length);
        for (int i = 0; i < y.Length; i++)
        {
            double diff = y1[i] - y[i];
            double bspl = h * k1[i] - diff;
            r1[i] = y[i];
            r2[i] = diff;
            r3[i] = bspl;
            r4[i] = diff - h * k7[i] - bspl;
            r5[i] = h * (D1 * k1[i] + D3 * k3[i] + D4 * k4[i] + D5 * k5[i] + D6 * k6[i] + D7 * k7[i]);
        }
        _denseStart = t;
        _denseStep = h;
    }

    /// <summary>Evaluates the continuous extension of the last accepted step at time t into <paramref name="output"/>.</summary>
    private void Interpolate(double t, Span<double> output)
    {
        double theta = (t - _denseStart) / _denseStep;
        double theta1 = 1.0 - theta;
        var r1 = _r1.AsSpan(0, output.Length);
        var r2 = _r2.AsSpan(0, output.Length);
        var r3 = _r3.AsSpan(0, output.Length);
        var r4 = _r4.AsSpan(0, output.Length);
        var r5 = _r5.AsSpan(0, output.Length);
        for (int i = 0; i < output.Length; i++)
        {
            output[i] = r1[i] + theta * (r2[i] + theta1 * (r3[i] + theta * (r4[i] + theta1 * r5[i])));
        }
    }
}
