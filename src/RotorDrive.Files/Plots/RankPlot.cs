using System.Globalization;
using RotorDrive.Core.Studies.Ranking;

namespace RotorDrive.Files.Plots;

/// <summary>The <c>rank</c> figure: pack runtime against total mass for the Pareto set (over runtime, mass and current
/// margin), the shortlist, and the rig's own choice marked.</summary>
public static class RankPlot
{
    /// <summary>Builds the figure.</summary>
    /// <param name="result">The ranking.</param>
    /// <param name="evaluate">Core's evaluation of one accepted combination (<see cref="RankStudy.Evaluate"/>).</param>
    /// <param name="rigName">The rig's name, for the stamp.</param>
    /// <param name="date">The date for the stamp.</param>
    public static PlotFigure Build(RankResult result, Func<RankCandidate, RankEvaluation> evaluate, string rigName, DateOnly date)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(evaluate);
        var pareto = result.ParetoRanks
            .Select(r => evaluate(result.Ordered[r - 1]).Figures)
            .Where(f => f is not null)
            .Select(f => f!)
            .ToList();
        var top = result.Top.Select(t => t.Evaluation.Figures).Where(f => f is not null).Select(f => f!).ToList();
        var series = new List<PlotSeries>
        {
            PlotSeries.Marks($"Pareto set ({pareto.Count.ToString("N0", CultureInfo.InvariantCulture)})", pareto.Select(f => f.TotalMassKg).ToArray(), pareto.Select(f => f.RuntimeS / 60).ToArray()),
            PlotSeries.Marks($"best {top.Count} by {result.Objective.ToString().ToLowerInvariant()}", top.Select(f => f.TotalMassKg).ToArray(), top.Select(f => f.RuntimeS / 60).ToArray(), hollow: true),
        };
        if (result.Assigned?.Figures is { } own)
        {
            string where = result.AssignedRank is { } rank ? $"rank {rank.ToString("N0", CultureInfo.InvariantCulture)}" : "rejected";
            series.Add(PlotSeries.Marks($"the rig's own choice ({where})", [own.TotalMassKg], [own.RuntimeS / 60]));
        }
        return new PlotFigure(string.Create(CultureInfo.InvariantCulture, $"Catalog ranking, {result.AcceptedCount:N0} accepted of {result.TotalCombinations:N0}"), rigName, date,
            [new PlotPanel("pack runtime against craft mass", "total mass, kg", "pack runtime, min", series)]);
    }
}
