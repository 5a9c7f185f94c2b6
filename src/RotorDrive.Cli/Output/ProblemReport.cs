using RotorDrive.Files;

namespace RotorDrive.Cli.Output;

/// <summary>Prints input problems for people: one "FILE:LINE:COL: FIELD: MESSAGE" line each, then a count.</summary>
public static class ProblemReport
{
    /// <summary>Writes every problem and a closing count line to <paramref name="error"/>.</summary>
    public static void Print(IReadOnlyCollection<InputProblem> problems, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(problems);
        ArgumentNullException.ThrowIfNull(error);
        if (error is ProblemCollector collector)
        {
            error = collector.Record(problems);
        }
        foreach (var problem in problems)
        {
            error.WriteLine(problem.ToString());
        }
        if (problems.Count > 0)
        {
            error.WriteLine(problems.Count == 1
                ? "1 problem in the input; nothing was computed."
                : $"{problems.Count} problems in the input; nothing was computed.");
        }
    }
}
