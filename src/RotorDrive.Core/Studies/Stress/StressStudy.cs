using RotorDrive.Core.Numerics;

namespace RotorDrive.Core.Studies.Stress;

/// <summary>Monte Carlo tolerance stress test: draws every sample's parts from its own stream, evaluates the samples in
/// parallel and aggregates failure rates, percentiles, drivers and the worst sample.</summary>
/// <remarks>
/// <para>Reproducibility: sample k's parts come from <see cref="SampleStreams.ForSample"/>(seed, k) alone
/// (<see cref="StressSampler"/>), each result is stored at its index, and every aggregate is computed afterwards in index
/// order, so the result is identical for any thread count, and <see cref="RunSample"/> reproduces sample k exactly.</para>
/// <para>Statistics: failure probabilities with E. B. Wilson's score interval (J. Am. Stat. Assoc. 22, 1927;
/// <see cref="WilsonInterval"/>); percentiles by Hyndman and Fan's definition 7 (<see cref="Percentiles"/>); drivers by
/// Spearman's rank correlation (<see cref="RankCorrelation"/>), which measures monotone association without assuming a
/// linear response, the usual screening measure of Monte Carlo sensitivity analysis (J. C. Helton and F. J. Davis,
/// "Latin hypercube sampling and the propagation of uncertainty in analyses of complex systems", Reliab. Eng. Syst. Saf.
/// 81, 2003).</para>
/// <para>Cancellation stops the workers after the samples they are on; the samples finished so far are aggregated and
/// the result is marked partial.</para>
/// </remarks>
public static class StressStudy
{
    /// <summary>Keys of the figures in <see cref="StressResult.Percentiles"/>, in order.</summary>
    public static IReadOnlyList<string> FigureKeys { get; } =
        ["hover_speed_rpm", "hover_current_a", "hover_pack_voltage_v", "liftoff_time_s", "yaw_residual_nm"];

    /// <summary>One sample's value of a reported figure (what <see cref="StressResult.Percentiles"/> summarises), in the
    /// unit its key names; null when the sample has none (no trim found, no lift-off).</summary>
    /// <param name="outcome">The sample's outcome.</param>
    /// <param name="key">One of <see cref="FigureKeys"/>.</param>
    /// <exception cref="ArgumentNullException">The outcome is null.</exception>
    /// <exception cref="ArgumentException">The key is not one of <see cref="FigureKeys"/>.</exception>
    public static double? FigureValue(StressOutcome outcome, string key)
    {
        Preconditions.NotNull(outcome, nameof(outcome));
        return key switch
        {
            "hover_speed_rpm" => outcome.HoverSpeedRpm,
            "hover_current_a" => outcome.HoverCurrentA,
            "hover_pack_voltage_v" => outcome.HoverPackVoltageV,
            "liftoff_time_s" => outcome.LiftoffTimeS,
            "yaw_residual_nm" => outcome.YawResidualNm,
            _ => throw new ArgumentException($"'{key}' is not a stress figure; use one of {string.Join(", ", FigureKeys)}.", nameof(key)),
        };
    }

    /// <summary>Runs a study.</summary>
    /// <param name="model">The rig model and its evaluators.</param>
    /// <param name="tolerances">The spreads.</param>
    /// <param name="options">Samples, seed, threads; null for <see cref="StressStudyOptions.Default"/>.</param>
    /// <param name="progress">Receives the number of samples finished so far (from worker threads), or null.</param>
    /// <param name="cancellationToken">Stops the run; the samples finished so far are reported as partial.</param>
    /// <exception cref="ArgumentNullException">The model or tolerances are null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">Fewer than one sample or thread.</exception>
    /// <exception cref="ArgumentException">The rig lacks a drivetrain part (see <see cref="StressSampler.Draw"/>).</exception>
    public static StressResult Run(
        IStressModel model,
        StressTolerances tolerances,
        StressStudyOptions? options = null,
        IProgress<int>? progress = null,
        CancellationToken cancellationToken = default)
    {
        Preconditions.NotNull(model, nameof(model));
        Preconditions.NotNull(tolerances, nameof(tolerances));
        var o = options ?? StressStudyOptions.Default;
        int n = Preconditions.AtLeast(o.Samples, 1, nameof(o.Samples));
        if (o.Threads is { } t)
        {
            Preconditions.AtLeast(t, 1, nameof(o.Threads));
        }
        var rig = model.Rig;
        StressSampler.RequireParts(rig);

        var samples = new StressSample?[n];
        int finished = 0;
        var parallel = new ParallelOptions { MaxDegreeOfParallelism = o.Threads ?? -1, CancellationToken = cancellationToken };
        try
        {
            Parallel.For(0, n, parallel, () => model.CreateEvaluator(), (k, state, evaluator) =>
            {
                if (cancellationToken.IsCancellationRequested)
                {
                    state.Stop();
                    return evaluator;
                }
                var parts = StressSampler.Draw(rig, tolerances, o.Seed, k);
                samples[k] = new StressSample(k, parts, evaluator.Evaluate(parts, recordTrace: false));
                progress?.Report(Interlocked.Increment(ref finished));
                return evaluator;
            }, _ => { });
        }
        catch (OperationCanceledException)
        {
            // Cancelled: what finished is reported as partial.
        }
        var done = samples.Where(s => s is not null).Select(s => s!).ToArray();
        bool drivers = o.DriversWhenStopped || done.Length == n;
        return Aggregate(done, n, o.Seed, StressInput.Varied(tolerances, rig.Stations.Count), drivers);
    }

    /// <summary>The result with its drivers computed, when they were left pending (<see cref="StressResult.DriversPending"/>);
    /// otherwise the result itself. The drivers are those <see cref="Aggregate"/> would have given.</summary>
    /// <param name="result">A result.</param>
    /// <exception cref="ArgumentNullException">The result is null.</exception>
    public static StressResult CompleteDrivers(StressResult result)
    {
        Preconditions.NotNull(result, nameof(result));
        return result.DriversPending
            ? result with { Drivers = OrderedDrivers(result.SampleResults, result.Inputs), DriversPending = false }
            : result;
    }

    /// <summary>Evaluates one sample exactly as <see cref="Run"/> does, with its spin-up trace.</summary>
    /// <param name="model">The rig model.</param>
    /// <param name="tolerances">The spreads.</param>
    /// <param name="seed">The study's seed.</param>
    /// <param name="sampleIndex">The sample index, 0 or more.</param>
    /// <exception cref="ArgumentNullException">The model or tolerances are null.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The index is negative.</exception>
    public static StressSample RunSample(IStressModel model, StressTolerances tolerances, int seed, int sampleIndex)
    {
        Preconditions.NotNull(model, nameof(model));
        var parts = StressSampler.Draw(model.Rig, tolerances, seed, Preconditions.AtLeast(sampleIndex, 0, nameof(sampleIndex)));
        return new StressSample(sampleIndex, parts, model.CreateEvaluator().Evaluate(parts, recordTrace: true));
    }

    /// <summary>Aggregates evaluated samples (in index order) into a result.</summary>
    /// <param name="samples">The evaluated samples, in index order.</param>
    /// <param name="requested">Samples asked for.</param>
    /// <param name="seed">The study's seed.</param>
    /// <param name="inputs">The varied inputs.</param>
    /// <param name="drivers">False to leave the drivers pending (<see cref="CompleteDrivers"/>).</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public static StressResult Aggregate(IReadOnlyList<StressSample> samples, int requested, int seed, IReadOnlyList<StressInput> inputs,
        bool drivers = true)
    {
        Preconditions.NotNull(samples, nameof(samples));
        Preconditions.NotNull(inputs, nameof(inputs));
        int n = samples.Count;
        if (n == 0)
        {
            return new StressResult(0, requested, seed, requested > 0, null, [], FigureKeys.Select(k => new StressFigure(k, null, 0)).ToArray(),
                [], null, inputs, samples);
        }

        // One pass over the samples for the failure counts and the figures' values.
        var all = StressCriteria.All;
        int failedAny = 0;
        var failed = new int[all.Count];
        var figureValues = new double?[FigureKeys.Count][];
        for (int f = 0; f < figureValues.Length; f++)
        {
            figureValues[f] = new double?[n];
        }
        for (int k = 0; k < n; k++)
        {
            var outcome = samples[k].Outcome;
            bool any = false;
            for (int c = 0; c < all.Count; c++)
            {
                if (!outcome.Passed(all[c]))
                {
                    failed[c]++;
                    any = true;
                }
            }
            failedAny += any ? 1 : 0;
            for (int f = 0; f < figureValues.Length; f++)
            {
                figureValues[f][k] = FigureValue(outcome, FigureKeys[f]);
            }
        }
        var overall = WilsonInterval.Compute(failedAny, n);
        var criteria = all.Select((c, i) => new StressCriterionRate(c, WilsonInterval.Compute(failed[i], n))).ToArray();
        var figures = FigureKeys.Select((k, f) => Figure(k, figureValues[f])).ToArray();

        var ordered = drivers ? OrderedDrivers(samples, inputs) : [];

        int? worst = null;
        double worstMargin = double.PositiveInfinity;
        foreach (var s in samples)
        {
            double m = s.Outcome.MinimumMarginFraction;
            if (m < worstMargin)
            {
                worstMargin = m;
                worst = s.Index;
            }
        }
        return new StressResult(n, requested, seed, n < requested, overall, criteria, figures, ordered, worst, inputs, samples)
        {
            DriversPending = !drivers,
        };
    }

    // The drivers, largest |rho| first (ties by input name, then criterion).
    private static StressDriver[] OrderedDrivers(IReadOnlyList<StressSample> samples, IReadOnlyList<StressInput> inputs)
        => Drivers(samples, inputs)
            .OrderByDescending(d => Math.Abs(d.Rho))
            .ThenBy(d => d.Input, StringComparer.Ordinal)
            .ThenBy(d => d.Criterion)
            .ToArray();

    // Spearman's rho of every varied input against every criterion's margin, over the samples where that margin was
    // assessed. Built for speed (45,000 samples took 2.6 s when every pair ranked its own two series; the
    // AggregateFortyFiveThousand benchmark): the samples are read once, in order, into one array per input and per
    // criterion; each input is sorted once over all samples, in parallel, and the ranks of the samples where a criterion
    // was assessed follow from that order without sorting again. Criteria run in parallel too and are joined in criterion
    // order, so the result does not depend on threads.
    private static List<StressDriver> Drivers(IReadOnlyList<StressSample> samples, IReadOnlyList<StressInput> inputs)
    {
        int n = samples.Count;
        var criteria = StressCriteria.All;
        var values = new double[inputs.Count][];
        for (int i = 0; i < values.Length; i++)
        {
            values[i] = new double[n];
        }
        var place = new int[criteria.Count][];
        var margins = new List<double>[criteria.Count];
        for (int c = 0; c < criteria.Count; c++)
        {
            place[c] = new int[n];
            margins[c] = new List<double>(n);
        }
        for (int k = 0; k < n; k++)
        {
            var sample = samples[k];
            for (int i = 0; i < values.Length; i++)
            {
                values[i][k] = inputs[i].ValueIn(sample.Parts);
            }
            var sampleMargins = sample.Outcome.Margins;
            for (int c = 0; c < criteria.Count; c++)
            {
                place[c][k] = -1;
                if (sampleMargins[(int)criteria[c]] is { } m)
                {
                    place[c][k] = margins[c].Count;
                    margins[c].Add(m);
                }
            }
        }

        var orders = new RankCorrelation.Ranking[inputs.Count];
        var allRanks = new double[inputs.Count][];
        Parallel.For(0, inputs.Count, i =>
        {
            orders[i] = RankCorrelation.SortOrder(values[i]);
            allRanks[i] = orders[i].MidRanks(null, n);
        });
        var perCriterion = new List<StressDriver>[criteria.Count];
        Parallel.For(0, criteria.Count, c =>
        {
            var marginRanks = RankCorrelation.MidRanks(margins[c]);
            var found = new List<StressDriver>();
            for (int i = 0; i < inputs.Count; i++)
            {
                var inputRanks = margins[c].Count == n ? allRanks[i] : orders[i].MidRanks(place[c], margins[c].Count);
                if (RankCorrelation.OfRanks(inputRanks, marginRanks) is { } rho)
                {
                    found.Add(new StressDriver(inputs[i].Name, criteria[c], rho));
                }
            }
            perCriterion[c] = found;
        });
        return perCriterion.SelectMany(d => d).ToList();
    }

    private static StressFigure Figure(string key, IEnumerable<double?> values)
    {
        var all = values.ToArray();
        var present = all.Where(v => v is not null && double.IsFinite(v.Value)).Select(v => v!.Value).ToArray();
        return new StressFigure(key, present.Length == 0 ? null : Percentiles.Summarize(present), all.Length - present.Length);
    }
}
