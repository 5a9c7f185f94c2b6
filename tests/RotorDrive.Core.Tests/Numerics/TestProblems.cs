using RotorDrive.Core.Numerics;
using RotorDrive.Core.Simulation;

namespace RotorDrive.Core.Tests.Numerics;

/// <summary>Initial value problems with closed-form solutions, shared by the integrator tests.</summary>
internal sealed record TestProblem(string Name, double[] Initial, double StartS, double EndS, OdeDerivatives Derivatives, Func<double, double[]> Exact)
{
    public override string ToString() => Name;

    /// <summary>Largest absolute error of a state against the exact solution at time t.</summary>
    public double MaxError(double t, ReadOnlySpan<double> state)
    {
        var exact = Exact(t);
        double worst = 0;
        for (int i = 0; i < exact.Length; i++)
        {
            worst = Math.Max(worst, Math.Abs(state[i] - exact[i]));
        }
        return worst;
    }

    public static TestProblem ByName(string name) => All.Single(p => p.Name == name);

    public static IReadOnlyList<TestProblem> All { get; } =
    [
        // y' = -y, y(0) = 1: y = e^-t (linear, autonomous).
        new("exponential decay", [1.0], 0, 2,
            (t, y, d) => d[0] = -y[0],
            t => [Math.Exp(-t)]),

        // y' = 1 + y^2, y(0) = 0: y = tan t (nonlinear, autonomous).
        new("tangent", [0.0], 0, 1,
            (t, y, d) => d[0] = 1 + y[0] * y[0],
            t => [Math.Tan(t)]),

        // y' = cos(t) y, y(0) = 1: y = e^(sin t) (non-autonomous: exercises the stage times c_i).
        new("exp of sine", [1.0], 0, 3,
            (t, y, d) => d[0] = Math.Cos(t) * y[0],
            t => [Math.Exp(Math.Sin(t))]),

        // Logistic growth y' = y (1 - y), y(0) = 0.1: y = 1 / (1 + 9 e^-t) (nonlinear scalar; Verhulst 1838).
        new("logistic", [0.1], 0, 2,
            (t, y, d) => d[0] = y[0] * (1 - y[0]),
            t => [1 / (1 + 9 * Math.Exp(-t))]),

        // Kepler problem q'' = -q / |q|^3 with eccentricity 0.5: q(0) = (0.5, 0), q'(0) = (0, sqrt(3)); the orbit has
        // semi-major axis 1, so period 2 pi, and returns to its start at t = 2 pi (Kepler's third law; Hairer, Norsett
        // & Wanner 1993, I.2 and II.10). The closed form is only used at the period.
        new("kepler orbit", [0.5, 0.0, 0.0, Math.Sqrt(3.0)], 0, 2 * Math.PI,
            (t, y, d) =>
            {
                double r = Math.Sqrt(y[0] * y[0] + y[1] * y[1]);
                double r3 = r * r * r;
                d[0] = y[2];
                d[1] = y[3];
                d[2] = -y[0] / r3;
                d[3] = -y[1] / r3;
            },
            t => Math.Abs(t - 2 * Math.PI) < 1e-12
                ? [0.5, 0.0, 0.0, Math.Sqrt(3.0)]
                : throw new ArgumentOutOfRangeException(nameof(t), "the Kepler orbit's closed form is used only at its period")),

        // x'' = -x as a system, x(0) = 1, v(0) = 0: x = cos t, v = -sin t (harmonic oscillator).
        new("harmonic oscillator", [1.0, 0.0], 0, 2 * Math.PI,
            (t, y, d) =>
            {
                d[0] = y[1];
                d[1] = -y[0];
            },
            t => [Math.Cos(t), -Math.Sin(t)]),
    ];
}
