using RotorDrive.Core.Craft;
using RotorDrive.Core.Studies.Stress;

namespace RotorDrive.Core.Tests.Studies.Stress;

/// <summary>A constructed model whose only criterion is a stall threshold on the controller current limit: a station
/// stalls when its drawn limit is below a fixed threshold. Its failure probability has a closed form.</summary>
internal sealed class ThresholdModel(Rig rig, double thresholdA) : IStressModel
{
    public Rig Rig => rig;

    public IStressEvaluator CreateEvaluator() => new Evaluator(thresholdA);

    private sealed class Evaluator(double thresholdA) : IStressEvaluator
    {
        public StressOutcome Evaluate(StressParts parts, bool recordTrace)
        {
            var margins = new double?[StressCriteria.All.Count];
            double worst = parts.Stations.Min(s => s.CurrentLimitA);
            margins[(int)StressCriterion.Stall] = worst / thresholdA - 1;
            var stalled = parts.Stations.Select((s, i) => (s, i)).Where(x => x.s.CurrentLimitA < thresholdA).Select(x => x.i).ToArray();
            return new StressOutcome(margins, null, stalled, worst, 0, 0, null, null, null, null, null, null, null);
        }
    }
}
