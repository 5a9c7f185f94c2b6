using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.OdeSolvers;
using RotorDrive.Core.Numerics;
using RotorDrive.Core.Simulation;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests.Numerics;

public class DormandPrince45Tests
{
    private static OdeResult Solve(TestProblem problem, DormandPrince45Options options, double[]? state = null, IOdeEvents? events = null, IOdeObserver? observer = null)
    {
        var y = state ?? (double[])problem.Initial.Clone();
        var solver = new DormandPrince45(y.Length, options);
        return solver.Integrate(problem.Derivatives, problem.StartS, y, problem.EndS, events, observer);
    }

    [Fact]
    public void Tableau_SatisfiesTheRowSumAndWeightConditions()
    {
        // Consistency conditions of an explicit Runge-Kutta method: c_i = sum_j a_ij, sum b = 1 for both weight sets,
        // and the error weights are their difference (Hairer, Norsett & Wanner 1993, II.1; Dormand & Prince 1980).
        RelAssert.Close(DormandPrince45.C2, DormandPrince45.A21, 1e-15);
        RelAssert.Close(DormandPrince45.C3, DormandPrince45.A31 + DormandPrince45.A32, 1e-15);
        RelAssert.Close(DormandPrince45.C4, DormandPrince45.A41 + DormandPrince45.A42 + DormandPrince45.A43, 1e-14);
        RelAssert.Close(DormandPrince45.C5, DormandPrince45.A51 + DormandPrince45.A52 + DormandPrince45.A53 + DormandPrince45.A54, 1e-14);
        RelAssert.Close(1.0, DormandPrince45.A61 + DormandPrince45.A62 + DormandPrince45.A63 + DormandPrince45.A64 + DormandPrince45.A65, 1e-14);
        RelAssert.Close(1.0, DormandPrince45.B1 + DormandPrince45.B3 + DormandPrince45.B4 + DormandPrince45.B5 + DormandPrince45.B6, 1e-15);
        RelAssert.Close(1.0, DormandPrince45.BStar1 + DormandPrince45.BStar3 + DormandPrince45.BStar4 + DormandPrince45.BStar5 + DormandPrince45.BStar6 + DormandPrince45.BStar7, 1e-15);
        RelAssert.Close(DormandPrince45.B1 - DormandPrince45.BStar1, DormandPrince45.E1, 1e-12);
        RelAssert.Close(DormandPrince45.B3 - DormandPrince45.BStar3, DormandPrince45.E3, 1e-12);
        RelAssert.Close(DormandPrince45.B4 - DormandPrince45.BStar4, DormandPrince45.E4, 1e-12);
        RelAssert.Close(DormandPrince45.B5 - DormandPrince45.BStar5, DormandPrince45.E5, 1e-12);
        RelAssert.Close(DormandPrince45.B6 - DormandPrince45.BStar6, DormandPrince45.E6, 1e-12);
        RelAssert.Close(-DormandPrince45.BStar7, DormandPrince45.E7, 1e-15);
    }

    [Theory]
    // Dormand & Prince 1980: the propagated (locally extrapolated) solution has order 5, so the global error at a fixed
    // end time falls as h^5. Each row names the coarsest division of the interval; three halvings follow, all in the
    // asymptotic range and above rounding error.
    [InlineData("exponential decay", 16, 5.0)]
    [InlineData("exp of sine", 16, 5.0)]
    [InlineData("logistic", 8, 5.0)]
    [InlineData("harmonic oscillator", 16, 5.0)]
    [InlineData("kepler orbit", 128, 5.0)]
    public void GlobalError_FallsAtTheMethodsOrder_WithFixedSteps(string problemName, int coarsestDivision, double order)
    {
        var problem = TestProblem.ByName(problemName);
        double length = problem.EndS - problem.StartS;
        double[] steps = [.. Enumerable.Range(0, 4).Select(k => length / (coarsestDivision << k))];
        ConvergenceOrder.Assert(order, steps, h =>
        {
            var result = Solve(problem, DormandPrince45Options.FixedStep(h));
            Assert.Equal(OdeStatus.Completed, result.Status);
            return problem.MaxError(result.TimeS, result.State.AsSpan());
        });
    }

    [Theory]
    // One step from the exact initial value: a method of order p has local error O(h^(p+1)), so the step's end point
    // (order 5) errs as h^6 and Shampine's continuous extension (order 4; Hairer et al. 1993, II.6) as h^5 inside the
    // step. Each row gives the fraction of the step where the error is measured and the coarsest step.
    [InlineData("exp of sine", 1.0, 0.4, 6.0)]
    [InlineData("logistic", 1.0, 0.4, 6.0)]
    [InlineData("exp of sine", 0.5, 0.4, 5.0)]
    [InlineData("harmonic oscillator", 0.5, 0.4, 5.0)]
    [InlineData("harmonic oscillator", 0.3, 0.4, 5.0)]
    public void LocalError_OfOneStep_FallsAtTheExpectedOrder(string problemName, double fractionOfStep, double coarsestStep, double order)
    {
        var problem = TestProblem.ByName(problemName);
        double[] steps = [coarsestStep, coarsestStep / 2, coarsestStep / 4, coarsestStep / 8];
        ConvergenceOrder.Assert(order, steps, h =>
        {
            var observer = new GridRecorder();
            var options = DormandPrince45Options.FixedStep(h) with { OutputIntervalS = h * fractionOfStep };
            var y = (double[])problem.Initial.Clone();
            new DormandPrince45(y.Length, options).Integrate(problem.Derivatives, 0, y, h, observer: observer);
            if (fractionOfStep >= 1.0)
            {
                return problem.MaxError(h, y);
            }
            var (t, state, _) = observer.Points.First(p => p.Kind == ObservationKind.Grid);
            return problem.MaxError(t, state);
        });
    }

    [Fact]
    public void ExponentialDecay_MatchesTheClosedForm_WithAdaptiveSteps()
    {
        // y' = -y, y(0) = 1 has y(t) = e^-t exactly.
        var problem = TestProblem.ByName("exponential decay");
        var result = Solve(problem, new DormandPrince45Options { RelativeTolerance = 1e-10, AbsoluteTolerance = 1e-14 });
        Assert.Equal(OdeStatus.Completed, result.Status);
        Assert.Equal(problem.EndS, result.TimeS);
        RelAssert.Close(Math.Exp(-2.0), result.State[0], 1e-9);
    }

    [Fact]
    public void HarmonicOscillator_KeepsItsEnergy_OverTenPeriods()
    {
        // x'' + x = 0 conserves E = (x^2 + v^2)/2 = 1/2 for x(0) = 1, v(0) = 0 (closed form x = cos t).
        var y = new[] { 1.0, 0.0 };
        var problem = TestProblem.ByName("harmonic oscillator");
        var solver = new DormandPrince45(2, new DormandPrince45Options { RelativeTolerance = 1e-10, AbsoluteTolerance = 1e-12 });
        var result = solver.Integrate(problem.Derivatives, 0, y, 20 * Math.PI);
        Assert.Equal(OdeStatus.Completed, result.Status);
        RelAssert.Close(0.5, 0.5 * (y[0] * y[0] + y[1] * y[1]), 1e-8, what: "energy");
        RelAssert.Close(1.0, y[0], 1e-8, what: "x after ten periods");
    }

    [Fact]
    public void VanDerPolOscillator_AgreesWithMathNetsClassicRungeKutta()
    {
        // Reference: MathNet.Numerics' fixed-step classic fourth-order Runge-Kutta (OdeSolvers.RungeKutta.FourthOrder)
        // with 40001 points on [0, 8] (h = 2e-4, global error near 1e-12 for this smooth problem).
        const double mu = 1.0;
        var reference = RungeKutta.FourthOrder(
            Vector<double>.Build.Dense([2.0, 0.0]), 0, 8, 40001,
            (t, v) => Vector<double>.Build.Dense([v[1], mu * (1 - v[0] * v[0]) * v[1] - v[0]]));
        var expected = reference[^1];

        var y = new[] { 2.0, 0.0 };
        var solver = new DormandPrince45(2, new DormandPrince45Options { RelativeTolerance = 1e-10, AbsoluteTolerance = 1e-12 });
        var result = solver.Integrate((t, s, d) =>
        {
            d[0] = s[1];
            d[1] = mu * (1 - s[0] * s[0]) * s[1] - s[0];
        }, 0, y, 8);

        Assert.Equal(OdeStatus.Completed, result.Status);
        RelAssert.Close(expected[0], y[0], 1e-8, 1e-9, "x(8)");
        RelAssert.Close(expected[1], y[1], 1e-8, 1e-9, "v(8)");
        Assert.True(result.Evaluations < 40001 * 4 / 20, $"adaptive steps should need far fewer evaluations; used {result.Evaluations}");
    }

    [Fact]
    public void GlobalError_IsProportionalToTheTolerance()
    {
        // Tolerance proportionality (Hairer et al. 1993, II.4; L. F. Shampine, "Numerical Solution of ODEs", 1994):
        // with local extrapolation the global error of an error-per-step controller scales about linearly with the
        // tolerance, so log(error) against log(tolerance) has a slope near 1.
        var problem = TestProblem.ByName("exp of sine");
        double[] tolerances = [1e-4, 1e-5, 1e-6, 1e-7, 1e-8, 1e-9, 1e-10];
        double slope = ConvergenceOrder.Observed(tolerances, tol =>
        {
            var result = Solve(problem, new DormandPrince45Options { RelativeTolerance = tol, AbsoluteTolerance = tol });
            return problem.MaxError(result.TimeS, result.State.AsSpan());
        });
        RelAssert.InRange(slope, 0.8, 1.25, "slope of log error against log tolerance");
    }

    [Fact]
    public void ZeroCrossing_IsLocatedToTheEventTolerance()
    {
        // x = cos t first falls through zero at t = pi/2 (closed form).
        var events = new ComponentEvents((0, EventDirection.Falling));
        var problem = TestProblem.ByName("harmonic oscillator");
        var result = Solve(problem, new DormandPrince45Options { RelativeTolerance = 1e-10, AbsoluteTolerance = 1e-12 }, events: events);
        Assert.Equal(OdeStatus.EventHit, result.Status);
        Assert.Equal(0, result.EventIndex);
        RelAssert.Close(Math.PI / 2, result.TimeS, 1e-9, what: "event time");
        Assert.True(result.State[0] <= 0 && result.State[0] > -1e-9, $"state just past the crossing, got {result.State[0]}");
        RelAssert.Close(-1.0, result.State[1], 1e-9, what: "v at the crossing");
    }

    [Fact]
    public void RisingEvent_IgnoresFallingCrossings()
    {
        // x = cos t falls through zero at pi/2 and rises through it at 3 pi/2 (closed form).
        var events = new ComponentEvents((0, EventDirection.Rising));
        var problem = TestProblem.ByName("harmonic oscillator");
        var result = Solve(problem, new DormandPrince45Options { RelativeTolerance = 1e-10, AbsoluteTolerance = 1e-12 }, events: events);
        Assert.Equal(OdeStatus.EventHit, result.Status);
        RelAssert.Close(1.5 * Math.PI, result.TimeS, 1e-9);
    }

    [Fact]
    public void BooleanEvent_WrittenAsPlusOrMinusOne_IsLocatedByBisection()
    {
        // The condition "x below 0.5" on x = cos t first holds at t = pi/3 (closed form).
        var events = new PredicateEvents((t, y) => y[0] < 0.5);
        var problem = TestProblem.ByName("harmonic oscillator");
        var result = Solve(problem, new DormandPrince45Options { RelativeTolerance = 1e-10, AbsoluteTolerance = 1e-12 }, events: events);
        Assert.Equal(OdeStatus.EventHit, result.Status);
        RelAssert.Close(Math.PI / 3, result.TimeS, 1e-9);
    }

    [Fact]
    public void BouncingBall_RestartedAtEachContact_MatchesTheClosedFormBounceTimes()
    {
        // A ball dropped from h0 lands at t1 = sqrt(2 h0 / g); a bounce with restitution e leaves at e times the impact
        // speed v1 = g t1, so the k-th flight lasts 2 e^k v1 / g (elementary kinematics). The contact is a discontinuity
        // handled the way landing-gear contact will be: stop at the event, change the state, restart.
        const double g = 9.80665, h0 = 1.0, e = 0.8;
        double t1 = Math.Sqrt(2 * h0 / g);
        double v1 = g * t1;
        var expected = new List<double> { t1 };
        for (int k = 1; k < 4; k++)
        {
            expected.Add(expected[^1] + 2 * Math.Pow(e, k) * v1 / g);
        }

        // Free fall is a quadratic, integrated exactly, so the error control would let one step span a whole flight
        // (up and down again) and miss the contact; bounding the step is how a caller rules that out.
        var solver = new DormandPrince45(2, new DormandPrince45Options { RelativeTolerance = 1e-10, AbsoluteTolerance = 1e-12, MaxStepS = 0.05 });
        var events = new ComponentEvents((0, EventDirection.Falling));
        var y = new[] { h0, 0.0 };
        double t = 0;
        var contacts = new List<double>();
        double? step = null;
        for (int bounce = 0; bounce < 4; bounce++)
        {
            var restart = new DormandPrince45(2, solver.Options with { InitialStepS = step });
            var result = restart.Integrate((_, s, d) =>
            {
                d[0] = s[1];
                d[1] = -g;
            }, t, y, 10, events);
            Assert.Equal(OdeStatus.EventHit, result.Status);
            contacts.Add(result.TimeS);
            t = result.TimeS;
            y[0] = 0;
            y[1] = -e * y[1];
            step = result.NextStepS;
        }

        for (int k = 0; k < expected.Count; k++)
        {
            RelAssert.Close(expected[k], contacts[k], 1e-8, what: $"contact {k + 1}");
        }
    }

    [Fact]
    public void Restart_FromAnEventState_DoesNotFireTheSameEventAgain()
    {
        // After the falling crossing of x = cos t at pi/2 the next falling crossing is at 5 pi/2 (closed form).
        var events = new ComponentEvents((0, EventDirection.Falling));
        var problem = TestProblem.ByName("harmonic oscillator");
        var solver = new DormandPrince45(2, new DormandPrince45Options { RelativeTolerance = 1e-10, AbsoluteTolerance = 1e-12 });
        var y = new[] { 1.0, 0.0 };
        var first = solver.Integrate(problem.Derivatives, 0, y, 10, events);
        var second = solver.Integrate(problem.Derivatives, first.TimeS, y, 10, events);
        Assert.Equal(OdeStatus.EventHit, second.Status);
        RelAssert.Close(2.5 * Math.PI, second.TimeS, 1e-9);
    }

    [Fact]
    public void GridObserver_ReceivesEveryMultipleOfTheInterval_WithDenseOutputAccuracy()
    {
        // y = e^(sin t) (closed form); grid points come from Shampine's continuous extension.
        var problem = TestProblem.ByName("exp of sine");
        var recorder = new GridRecorder();
        var result = Solve(problem, new DormandPrince45Options { RelativeTolerance = 1e-9, AbsoluteTolerance = 1e-12, OutputIntervalS = 0.25 }, observer: recorder);
        Assert.Equal(ObservationKind.Start, recorder.Points[0].Kind);
        Assert.Equal(ObservationKind.Stop, recorder.Points[^1].Kind);
        var grid = recorder.Points.Where(p => p.Kind == ObservationKind.Grid).ToList();
        Assert.Equal(Enumerable.Range(1, 11).Select(k => k * 0.25), grid.Select(p => p.Time));
        foreach (var (time, state, _) in grid)
        {
            RelAssert.Close(Math.Exp(Math.Sin(time)), state[0], 1e-7, what: $"y({time})");
        }
        Assert.Equal(3.0, result.TimeS);
    }

    [Fact]
    public void StepObserver_SeesStartEveryAcceptedStepAndStop()
    {
        var problem = TestProblem.ByName("tangent");
        var recorder = new GridRecorder();
        var result = Solve(problem, DormandPrince45Options.Default, observer: recorder);
        Assert.Equal(result.StepsAccepted + 1, recorder.Points.Count);
        Assert.Equal(result.StepsAccepted - 1, recorder.Points.Count(p => p.Kind == ObservationKind.Step));
        Assert.True(recorder.Points.Zip(recorder.Points.Skip(1)).All(p => p.Second.Time > p.First.Time), "times increase");
    }

    [Fact]
    public void BlowUp_StopsWithStepTooSmall_NearTheSingularity()
    {
        // y' = y^2, y(0) = 1 has y = 1 / (1 - t), which blows up at t = 1 (closed form).
        var solver = new DormandPrince45(1);
        var y = new[] { 1.0 };
        var result = solver.Integrate((t, s, d) => d[0] = s[0] * s[0], 0, y, 2);
        Assert.True(result.Status is OdeStatus.StepTooSmall or OdeStatus.NonFinite, $"status {result.Status}");
        RelAssert.Close(1.0, result.TimeS, 1e-3, what: "where it stopped");
        Assert.True(double.IsFinite(y[0]));
    }

    [Fact]
    public void NonFiniteDerivatives_StopWithNonFinite_AndKeepTheLastFiniteState()
    {
        var solver = new DormandPrince45(1);
        var y = new[] { 1.0 };
        var result = solver.Integrate((t, s, d) => d[0] = t < 0.5 ? -s[0] : double.NaN, 0, y, 1);
        Assert.Equal(OdeStatus.NonFinite, result.Status);
        Assert.True(result.TimeS <= 0.5);
        RelAssert.Close(Math.Exp(-result.TimeS), y[0], 1e-5, what: "y = e^-t up to the stop");

        var fixedSolver = new DormandPrince45(1, DormandPrince45Options.FixedStep(0.1));
        var z = new[] { 1.0 };
        Assert.Equal(OdeStatus.NonFinite, fixedSolver.Integrate((t, s, d) => d[0] = t < 0.5 ? -s[0] : double.NaN, 0, z, 1).Status);
        Assert.True(double.IsFinite(z[0]));
    }

    [Fact]
    public void StepBudget_StopsWithMaxStepsExceeded()
    {
        var solver = new DormandPrince45(2, new DormandPrince45Options { MaxSteps = 5, RelativeTolerance = 1e-10 });
        var y = new[] { 1.0, 0.0 };
        var result = solver.Integrate(TestProblem.ByName("harmonic oscillator").Derivatives, 0, y, 100);
        Assert.Equal(OdeStatus.MaxStepsExceeded, result.Status);
        Assert.Equal(5, result.StepsAccepted + result.StepsRejected);
        Assert.True(result.TimeS < 100);
    }

    [Fact]
    public void Evaluations_AreSixPerStepPlusTheStartingOnes()
    {
        // First same as last: seven stages, the last reused as the next step's first, so six new evaluations per
        // attempted step, plus f(t0) and one for the starting-step estimate (Hairer et al. 1993, II.4-II.5).
        var result = Solve(TestProblem.ByName("tangent"), DormandPrince45Options.Default);
        Assert.Equal(2 + 6 * (result.StepsAccepted + result.StepsRejected), result.Evaluations);
    }

    [Fact]
    public void StepLoop_AllocatesNothingPerStep()
    {
        var system = new Oscillator();
        var solver = new DormandPrince45(2, new DormandPrince45Options { RelativeTolerance = 1e-10, OutputIntervalS = 0.01 });
        var events = new ComponentEvents((0, EventDirection.Rising));
        var observer = new CountingObserver();
        var y = new double[2];

        long Measure(double endS)
        {
            y[0] = 0;
            y[1] = 1;
            long before = GC.GetAllocatedBytesForCurrentThread();
            var result = solver.Integrate(system, 0, y, endS, events, observer);
            long after = GC.GetAllocatedBytesForCurrentThread();
            Assert.Equal(OdeStatus.Completed, result.Status);
            return after - before;
        }

        Measure(1.0);
        long shortRun = Measure(0.5);
        long longRun = Measure(6.0);
        Assert.Equal(shortRun, longRun);
    }

    [Fact]
    public void BadArguments_AreRejected_WithTheRuleBroken()
    {
        var solver = new DormandPrince45(2);
        OdeDerivatives f = (t, s, d) => d.Clear();
        Assert.Throws<ArgumentException>(() => solver.Integrate(f, 0, new double[3], 1));
        Assert.Throws<ArgumentException>(() => solver.Integrate(f, 0, new[] { double.NaN, 0 }, 1));
        Assert.Throws<ArgumentException>(() => solver.Integrate(f, 1, new double[2], 0));
        Assert.Throws<ArgumentOutOfRangeException>(() => new DormandPrince45Options { RelativeTolerance = 0 });
        Assert.Throws<ArgumentOutOfRangeException>(() => new DormandPrince45Options { AbsoluteTolerance = double.NaN });
        Assert.Throws<ArgumentOutOfRangeException>(() => DormandPrince45Options.FixedStep(-1));
        Assert.Throws<ArgumentOutOfRangeException>(() => new DormandPrince45(0));
    }

    [FsCheck.Xunit.Property(MaxTest = 50)]
    public bool LinearDecayOrGrowth_MatchesTheExponential(byte rateCode, byte lengthCode)
    {
        // y' = lambda y has y = e^(lambda t) for any rate lambda (closed form); rates from -3 to 1, lengths 0.1 to 5.
        double lambda = -3 + 4 * rateCode / 255.0;
        double length = 0.1 + 4.9 * lengthCode / 255.0;
        var y = new[] { 1.0 };
        var result = new DormandPrince45(1, new DormandPrince45Options { RelativeTolerance = 1e-9, AbsoluteTolerance = 1e-12 })
            .Integrate((t, s, d) => d[0] = lambda * s[0], 0, y, length);
        double exact = Math.Exp(lambda * length);
        // Relative accuracy where the solution is large, the absolute tolerance (1e-12 per step) where it has decayed.
        return result.Status == OdeStatus.Completed && Math.Abs(y[0] - exact) <= 1e-7 * exact + 1e-10;
    }

    private readonly struct Oscillator : IOdeSystem
    {
        public void Derivatives(double timeS, ReadOnlySpan<double> state, Span<double> derivatives)
        {
            derivatives[0] = state[1];
            derivatives[1] = -state[0];
        }
    }

    private sealed class CountingObserver : IOdeObserver
    {
        public int Count { get; private set; }

        public void Observe(double timeS, ReadOnlySpan<double> state, ObservationKind kind) => Count++;
    }
}
