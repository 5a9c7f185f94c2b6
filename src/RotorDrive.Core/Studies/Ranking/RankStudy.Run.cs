namespace RotorDrive.Core.Studies.Ranking;

public sealed partial class RankStudy
{
    // One accepted combination in the sweep: its flat index, its three criteria, score and tie-break key.
    private struct Accepted
    {
        public long Index;
        public long TieKey;
        public double RuntimeS;
        public double MassKg;
        public double Margin;
        public double Score;
        public bool Pareto;
    }

    /// <summary>Evaluates every combination and ranks the accepted ones.</summary>
    /// <remarks>Parallel over motors (one chunk each), results placed by index: the outcome does not depend on
    /// <see cref="RankOptions.MaxDegreeOfParallelism"/>. The progress callback is called from worker threads after each
    /// chunk, with a count that only grows; it must be thread-safe.</remarks>
    /// <param name="progress">Called after each motor's combinations, or null.</param>
    /// <param name="cancellationToken">Stops the sweep early (throws <see cref="OperationCanceledException"/>).</param>
    /// <returns>The ranking.</returns>
    public RankResult Run(Action<RankProgress>? progress = null, CancellationToken cancellationToken = default)
    {
        var parallel = new ParallelOptions
        {
            MaxDegreeOfParallelism = _options.MaxDegreeOfParallelism,
            CancellationToken = cancellationToken,
        };
        var accepted = Sweep(progress, parallel, out var rejectionCounts);
        var simulated = new Dictionary<long, RankSimulation>();
        var failed = new List<RankEvaluation>();
        accepted = Shortlist(accepted, parallel, simulated, failed);
        MarkPareto(accepted);
        rejectionCounts[(int)RankRejectionKind.SpinupSimulation] = new RankRejectionCount(RankRejectionKind.SpinupSimulation, failed.Count);
        return Assemble(accepted, simulated, failed, rejectionCounts);
    }

    // Every combination through the fast kernel, in parallel over motors: the accepted ones (in motor order) and the
    // count of each rejection kind.
    private Accepted[] Sweep(Action<RankProgress>? progress, ParallelOptions parallel, out RankRejectionCount[] rejectionCounts)
    {
        int motors = _catalog.Motors.Count, controllers = _catalog.Controllers.Count, packs = _catalog.Packs.Count;
        int kinds = RankRejectionKinds.All.Count;
        long total = CombinationCount;
        var lists = new Accepted[motors][];
        var counts = new long[motors * kinds];
        long done = 0;
        Parallel.For(
            0,
            motors,
            parallel,
            () => new RankWorker(_model.Stations.Count),
            (m, _, worker) =>
            {
                worker.Reset();
                var list = new List<Accepted>();
                // Visit the chunk in order of craft mass (the same order for every motor): the trim's warm start then
                // sits next to its answer. The order is fixed per chunk, so results do not depend on the threads.
                foreach (var (c, p, k) in _massOrder)
                {
                    var candidate = new RankCandidate(m, c, p, k);
                    EvaluateFast(candidate, worker, fresh: false);
                    var o = worker.Outcome;
                    if (o.Reasons == 0)
                    {
                        list.Add(new Accepted
                        {
                            Index = IndexOf(candidate),
                            TieKey = TieKey(candidate),
                            RuntimeS = o.RuntimeS,
                            MassKg = o.MassKg,
                            Margin = o.CurrentMargin,
                        });
                    }
                    else
                    {
                        for (int r = 0; r < kinds; r++)
                        {
                            if ((o.Reasons & (1u << r)) != 0)
                            {
                                counts[m * kinds + r]++;
                            }
                        }
                    }
                }
                lists[m] = list.ToArray();
                long now = Interlocked.Add(ref done, (long)controllers * packs * _maxPackCount);
                progress?.Invoke(new RankProgress(now, total));
                return worker;
            },
            _ => { });

        var accepted = new Accepted[lists.Sum(l => l.Length)];
        int at = 0;
        foreach (var list in lists)
        {
            list.CopyTo(accepted, at);
            at += list.Length;
        }
        rejectionCounts = new RankRejectionCount[kinds];
        for (int r = 0; r < kinds; r++)
        {
            long sum = 0;
            for (int m = 0; m < motors; m++)
            {
                sum += counts[m * kinds + r];
            }
            rejectionCounts[r] = new RankRejectionCount(RankRejectionKinds.All[r], sum);
        }
        return accepted;
    }

    // The shortlist: the best Top by the quick checks get the full checks (Simulate: the spin-up study and hover review
    // of the spinup and hover commands, and the endurance run). One that fails them is rejected with those reasons and
    // the ranking is redone without it (scores and Pareto set over the remaining), until the best Top have all been
    // simulated and pass: the next one enters deterministically. Returns the remaining accepted ones, sorted.
    private Accepted[] Shortlist(Accepted[] accepted, ParallelOptions parallel, Dictionary<long, RankSimulation> simulated, List<RankEvaluation> failed)
    {
        while (true)
        {
            Score(accepted);
            Array.Sort(accepted, Comparer());
            int shortlist = Math.Min(_options.Top, accepted.Length);
            var pending = new List<long>();
            for (int i = 0; i < shortlist; i++)
            {
                if (!simulated.ContainsKey(accepted[i].Index))
                {
                    pending.Add(accepted[i].Index);
                }
            }
            if (pending.Count == 0)
            {
                break;
            }
            var runs = new RankSimulation[pending.Count];
            Parallel.For(0, pending.Count, parallel, k => runs[k] = Simulate(CandidateAt(pending[k])));
            var dropped = new HashSet<long>();
            for (int k = 0; k < pending.Count; k++)
            {
                simulated[pending[k]] = runs[k];
                if (!runs[k].Passes)
                {
                    dropped.Add(pending[k]);
                }
            }
            if (dropped.Count > 0)
            {
                // Best first, as they stood in this ranking.
                foreach (var a in accepted.Where(a => dropped.Contains(a.Index)))
                {
                    var candidate = CandidateAt(a.Index);
                    failed.Add(WithSimulation(Evaluate(candidate), simulated[a.Index], reject: true));
                }
                accepted = accepted.Where(a => !dropped.Contains(a.Index)).ToArray();
            }
        }
        return accepted;
    }

    // The result: the order, scores, Pareto ranks, the simulated top entries and the rig's own drivetrain's place.
    private RankResult Assemble(Accepted[] accepted, Dictionary<long, RankSimulation> simulated, List<RankEvaluation> failed, RankRejectionCount[] rejectionCounts)
    {
        var ordered = new RankCandidate[accepted.Length];
        var scores = new double[accepted.Length];
        var paretoRanks = new List<int>();
        for (int i = 0; i < accepted.Length; i++)
        {
            ordered[i] = CandidateAt(accepted[i].Index);
            scores[i] = accepted[i].Score;
            if (accepted[i].Pareto)
            {
                paretoRanks.Add(i + 1);
            }
        }
        var top = new List<RankedEntry>();
        for (int i = 0; i < Math.Min(_options.Top, accepted.Length); i++)
        {
            var simulation = simulated[accepted[i].Index];
            top.Add(new RankedEntry(i + 1, WithSimulation(Evaluate(ordered[i]), simulation, reject: false), scores[i], accepted[i].Pareto, simulation.LiftoffTimeS));
        }
        var assigned = AssignedCandidate;
        RankEvaluation? assignedEvaluation = null;
        if (assigned is { } own)
        {
            var evaluation = Evaluate(own);
            var wasFailed = failed.FirstOrDefault(f => f.Candidate == own);
            assignedEvaluation = wasFailed
                ?? (simulated.TryGetValue(IndexOf(own), out var ran) ? WithSimulation(evaluation, ran, reject: false) : evaluation);
        }
        int? assignedRank = null;
        if (assigned is { } candidateOfRig)
        {
            long index = IndexOf(candidateOfRig);
            for (int i = 0; i < accepted.Length; i++)
            {
                if (accepted[i].Index == index)
                {
                    assignedRank = i + 1;
                    break;
                }
            }
        }
        return new RankResult(_options.Objective, _weights, CombinationCount, ordered, scores, paretoRanks, rejectionCounts, top, assigned, assignedEvaluation, assignedRank)
        {
            SimulationRejections = failed,
        };
    }

    // The evaluation with its simulation and its cautions attached and, when it failed the full checks, that reason added.
    private RankEvaluation WithSimulation(RankEvaluation evaluation, RankSimulation simulation, bool reject)
    {
        var cautions = evaluation.Cautions.Concat(simulation.Cautions.Select(c => new RankRejection(RankRejectionKind.SpinupSimulation, c))).ToList();
        if (!reject)
        {
            return evaluation with { Simulation = simulation, Cautions = cautions };
        }
        var reasons = evaluation.Rejections.ToList();
        reasons.Add(new RankRejection(RankRejectionKind.SpinupSimulation, "full spin-up and hover checks: " + simulation.FailureText));
        return evaluation with { Simulation = simulation, Rejections = reasons, Cautions = cautions };
    }

    private long TieKey(RankCandidate c)
        => (((long)_motorOrder[c.MotorIndex] * _catalog.Controllers.Count + _controllerOrder[c.ControllerIndex]) * _catalog.Packs.Count + _packOrder[c.PackIndex]) * _maxPackCount + c.PackCount - 1;

    // Min-max normalised weighted sum (see RankWeights).
    private void Score(Accepted[] accepted)
    {
        if (accepted.Length == 0)
        {
            return;
        }
        double rMin = double.PositiveInfinity, rMax = double.NegativeInfinity;
        double mMin = double.PositiveInfinity, mMax = double.NegativeInfinity;
        double gMin = double.PositiveInfinity, gMax = double.NegativeInfinity;
        foreach (var a in accepted)
        {
            rMin = Math.Min(rMin, a.RuntimeS);
            rMax = Math.Max(rMax, a.RuntimeS);
            mMin = Math.Min(mMin, a.MassKg);
            mMax = Math.Max(mMax, a.MassKg);
            gMin = Math.Min(gMin, a.Margin);
            gMax = Math.Max(gMax, a.Margin);
        }
        static double Up(double v, double lo, double hi) => hi > lo ? (v - lo) / (hi - lo) : 1.0;
        static double Down(double v, double lo, double hi) => hi > lo ? (hi - v) / (hi - lo) : 1.0;
        double total = _weights.Total;
        for (int i = 0; i < accepted.Length; i++)
        {
            ref var a = ref accepted[i];
            a.Score = (_weights.Runtime * Up(a.RuntimeS, rMin, rMax)
                + _weights.Mass * Down(a.MassKg, mMin, mMax)
                + _weights.Margin * Up(a.Margin, gMin, gMax)) / total;
        }
    }

    private Comparison<Accepted> Comparer()
    {
        Func<Accepted, Accepted, int> primary = _options.Objective switch
        {
            RankObjective.Runtime => (a, b) => b.RuntimeS.CompareTo(a.RuntimeS),
            RankObjective.Mass => (a, b) => a.MassKg.CompareTo(b.MassKg),
            RankObjective.Margin => (a, b) => b.Margin.CompareTo(a.Margin),
            RankObjective.Score => (a, b) => b.Score.CompareTo(a.Score),
            _ => throw new ArgumentOutOfRangeException(nameof(_options.Objective), _options.Objective, "Unknown objective."),
        };
        return (a, b) =>
        {
            int c = primary(a, b);
            return c != 0 ? c : a.TieKey.CompareTo(b.TieKey);
        };
    }

    // Pareto set over (runtime up, mass down, margin up): sweep in order of falling runtime, keeping the staircase of
    // (mass, margin) points not dominated so far (H. T. Kung, F. Luccio, F. P. Preparata, "On finding the maxima of a set
    // of vectors", J. ACM 22, 1975). Identical triples do not dominate each other.
    private static void MarkPareto(Accepted[] sorted)
    {
        var order = Enumerable.Range(0, sorted.Length).ToArray();
        Array.Sort(order, (i, j) =>
        {
            int c = sorted[j].RuntimeS.CompareTo(sorted[i].RuntimeS);
            if (c == 0)
            {
                c = sorted[i].MassKg.CompareTo(sorted[j].MassKg);
            }
            if (c == 0)
            {
                c = sorted[j].Margin.CompareTo(sorted[i].Margin);
            }
            return c != 0 ? c : i.CompareTo(j);
        });
        var masses = new List<double>();
        var margins = new List<double>();
        int g = 0;
        while (g < order.Length)
        {
            int end = g + 1;
            var first = sorted[order[g]];
            while (end < order.Length && sorted[order[end]].RuntimeS == first.RuntimeS && sorted[order[end]].MassKg == first.MassKg && sorted[order[end]].Margin == first.Margin)
            {
                end++;
            }
            // Last staircase point with mass <= this mass has the largest margin among them.
            int idx = UpperBound(masses, first.MassKg) - 1;
            bool dominated = idx >= 0 && margins[idx] >= first.Margin;
            for (int t = g; t < end; t++)
            {
                sorted[order[t]].Pareto = !dominated;
            }
            if (!dominated)
            {
                int lo = LowerBound(masses, first.MassKg);
                int hi = lo;
                while (hi < masses.Count && margins[hi] <= first.Margin)
                {
                    hi++;
                }
                masses.RemoveRange(lo, hi - lo);
                margins.RemoveRange(lo, hi - lo);
                masses.Insert(lo, first.MassKg);
                margins.Insert(lo, first.Margin);
            }
            g = end;
        }
    }

    private static int LowerBound(List<double> values, double x)
    {
        int lo = 0, hi = values.Count;
        while (lo < hi)
        {
            int mid = (lo + hi) >> 1;
            if (values[mid] < x)
            {
                lo = mid + 1;
            }
            else
            {
                hi = mid;
            }
        }
        return lo;
    }

    private static int UpperBound(List<double> values, double x)
    {
        int lo = 0, hi = values.Count;
        while (lo < hi)
        {
            int mid = (lo + hi) >> 1;
            if (values[mid] <= x)
            {
                lo = mid + 1;
            }
            else
            {
                hi = mid;
            }
        }
        return lo;
    }
}
