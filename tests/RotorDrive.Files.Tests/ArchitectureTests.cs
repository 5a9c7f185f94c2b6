using System.Reflection;
using RotorDrive.Core.Tests.Support;
using RotorDrive.Files;
using Xunit;

namespace RotorDrive.Files.Tests;

public class ArchitectureTests
{
    [Fact]
    public void Files_UsesOnlyTheDataContractOfStudiesAndSimulations()
    {
        // DESIGN.md section 2: files -> Files (parse, validate) -> Core values -> studies -> results. Files may read and
        // write a study's requests, options, tolerances and results (records, enums and their key tables, and the
        // request's validity rule) but never runs or reaches into a study's engine (the study itself, its evaluator,
        // sampler, workers, simulators, recorders and workspaces), so a study can change its insides without touching a
        // reader or an export.
        var files = typeof(InputProblem).Assembly;
        string[] engines = ["RotorDrive.Core.Studies", "RotorDrive.Core.Simulation"];
        var offenders = new SortedSet<string>(StringComparer.Ordinal);
        foreach (var type in files.GetTypes())
        {
            foreach (var used in TypeReferences.Of(type))
            {
                if (used.Namespace is { } ns && engines.Any(e => ns.StartsWith(e, StringComparison.Ordinal)) && IsEngine(used))
                {
                    offenders.Add($"{type.FullName} uses {used.FullName}");
                }
            }
        }
        Assert.True(offenders.Count == 0, string.Join(Environment.NewLine, offenders));
    }

    private static bool IsEngine(Type type)
    {
        bool data = type.IsEnum
            || type.GetMethod("<Clone>$") is not null
            || (type.IsValueType && type.GetMethod("PrintMembers", BindingFlags.NonPublic | BindingFlags.Instance) is not null);
        string[] roles = ["Study", "Evaluator", "Sampler", "Worker", "Simulator", "Recorder", "Workspace", "Kernel", "Model", "Simulation"];
        return !data && (!type.IsPublic || roles.Any(r => type.Name.EndsWith(r, StringComparison.Ordinal)));
    }
}
