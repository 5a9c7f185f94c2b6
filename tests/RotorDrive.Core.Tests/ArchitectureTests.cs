using System.Reflection;
using RotorDrive.Core;
using RotorDrive.Core.Tests.Support;
using Xunit;

namespace RotorDrive.Core.Tests;

public class ArchitectureTests
{
    private static readonly Assembly CoreAssembly = typeof(Preconditions).Assembly;

    [Fact]
    public void Core_ReferencesOnlyMathNetAndTheFramework()
    {
        var names = CoreAssembly.GetReferencedAssemblies().Select(a => a.Name!).ToList();
        Assert.DoesNotContain(names, n => n.StartsWith("Terminal.Gui", StringComparison.Ordinal));
        Assert.DoesNotContain(names, n => n.StartsWith("System.CommandLine", StringComparison.Ordinal));
        Assert.DoesNotContain(names, n => n.StartsWith("CsvHelper", StringComparison.Ordinal));
        Assert.DoesNotContain(names, n => n == "System.Console");
    }

    [Fact]
    public void Core_DoesNoFileAccess()
    {
        // Scan every method body's referenced members for System.IO file and directory types.
        var forbidden = new[] { typeof(File), typeof(Directory), typeof(FileStream), typeof(FileInfo), typeof(DirectoryInfo), typeof(StreamReader), typeof(StreamWriter), typeof(Console) };
        var offenders = new List<string>();
        foreach (var type in CoreAssembly.GetTypes())
        {
            foreach (var method in type.GetMethods(BindingFlags.Instance | BindingFlags.Static | BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.DeclaredOnly)
                         .Cast<MethodBase>()
                         .Concat(type.GetConstructors(BindingFlags.Instance | BindingFlags.Static | BindingFlags.Public | BindingFlags.NonPublic)))
            {
                var body = method.GetMethodBody()?.GetILAsByteArray();
                if (body is null)
                {
                    continue;
                }
                foreach (var token in ReferencedTokens(body))
                {
                    MemberInfo? member;
                    try
                    {
                        member = type.Module.ResolveMember(token, type.IsGenericType ? type.GetGenericArguments() : null, method.IsGenericMethod ? method.GetGenericArguments() : null);
                    }
                    catch (ArgumentException)
                    {
                        continue;
                    }
                    if (member?.DeclaringType is { } declaring && forbidden.Contains(declaring))
                    {
                        offenders.Add($"{type.FullName}.{method.Name} uses {declaring.Name}.{member.Name}");
                    }
                }
            }
        }
        Assert.Empty(offenders);
    }

    [Fact]
    public void Core_NamespacesDependOnEachOtherWithoutCycles()
    {
        // Layers read bottom-up (Numerics, Magnetics, Loads, Drive, Craft, Simulation, Safety, Studies): a cycle would
        // mean two folders can only be understood together.
        var graph = NamespaceGraph(CoreAssembly, "RotorDrive.Core");
        var cycles = StronglyConnected(graph).Where(c => c.Count > 1).Select(c => string.Join(" <-> ", c.Order(StringComparer.Ordinal))).ToList();
        Assert.True(cycles.Count == 0, "namespace cycles: " + string.Join("; ", cycles) + Environment.NewLine + Edges(graph, cycles));
    }

    [Fact]
    public void ResultRecords_CarryAUnitOnEveryPublicNumber()
    {
        // STYLE.md: results carry units in their member names (LiftN, DragTorqueNm, SpeedRpm, GapM); a dimensionless
        // figure says what kind of ratio it is.
        string[] units =
        [
            "M", "Mm", "M2", "M3", "Kg", "KgM2", "KgM3", "N", "Nm", "NmPerKrpm", "RadPerS", "RadPerS2", "Rpm", "Rad", "S", "Ms", "Hz",
            "A", "Ah", "V", "W", "Wh", "J", "Ohm", "C", "K", "T", "Pa", "Mpa", "PerS", "WPerN", "NPerM", "Fraction", "Percent",
            "Ratio", "Factor", "Duty", "Duties", "Efficiency", "Si", "Score", "Scores",
        ];
        var offenders = new List<string>();
        foreach (var type in CoreAssembly.GetExportedTypes().Where(IsResultRecord))
        {
            foreach (var property in type.GetProperties(BindingFlags.Public | BindingFlags.Instance | BindingFlags.DeclaredOnly))
            {
                var t = property.PropertyType;
                bool number = t == typeof(double) || t == typeof(double?) || t == typeof(double[]) || t == typeof(IReadOnlyList<double>);
                if (number && !units.Any(u => property.Name.EndsWith(u, StringComparison.Ordinal)))
                {
                    offenders.Add($"{type.Name}.{property.Name}");
                }
            }
        }
        Assert.True(offenders.Count == 0, "numbers without a unit suffix: " + string.Join(", ", offenders));
    }

    // A result record is what an analysis hands to the interfaces: a record named ...Result, ...Outcome, ...Review or
    // ...Figures, or one of the per-station and per-point records those hold.
    private static bool IsResultRecord(Type type)
    {
        bool record = type.GetMethod("<Clone>$") is not null
            || (type.IsValueType && type.GetMethod("PrintMembers", BindingFlags.NonPublic | BindingFlags.Instance) is not null);
        string[] endings = ["Result", "Outcome", "Review", "Figures", "Entry", "Station", "Point", "Margin", "Finding", "Summary", "Spinup", "Interval"];
        return record && endings.Any(e => type.Name.EndsWith(e, StringComparison.Ordinal)) && !type.Name.EndsWith("Options", StringComparison.Ordinal);
    }

    internal static Dictionary<string, HashSet<string>> NamespaceGraph(Assembly assembly, string root)
    {
        var graph = new Dictionary<string, HashSet<string>>(StringComparer.Ordinal);
        foreach (var type in assembly.GetTypes())
        {
            string from = TopNamespace(type.Namespace, root);
            if (!graph.TryGetValue(from, out var edges))
            {
                graph[from] = edges = new HashSet<string>(StringComparer.Ordinal);
            }
            foreach (var used in TypeReferences.Of(type))
            {
                if (used.Assembly == assembly && used.Namespace is { } ns)
                {
                    string to = TopNamespace(ns, root);
                    if (to != from)
                    {
                        edges.Add(to);
                    }
                }
            }
        }
        return graph;
    }

    // Studies.Ranking and Studies.Stress count as their own folders; compiler-generated types keep their owner's namespace.
    private static string TopNamespace(string? ns, string root)
        => ns is null || ns.Length <= root.Length ? root : root + "." + ns[(root.Length + 1)..];

    private static string Edges(Dictionary<string, HashSet<string>> graph, List<string> cycles)
        => string.Join(Environment.NewLine, graph.OrderBy(p => p.Key, StringComparer.Ordinal).Select(p => $"{p.Key} -> {string.Join(", ", p.Value.Order(StringComparer.Ordinal))}"));

    // Tarjan's strongly connected components (R. Tarjan, "Depth-first search and linear graph algorithms", SIAM J.
    // Comput. 1(2), 1972): every component with more than one namespace is a cycle.
    private static List<List<string>> StronglyConnected(Dictionary<string, HashSet<string>> graph)
    {
        int index = 0;
        var indices = new Dictionary<string, int>();
        var low = new Dictionary<string, int>();
        var stack = new Stack<string>();
        var onStack = new HashSet<string>();
        var components = new List<List<string>>();
        void Visit(string v)
        {
            indices[v] = low[v] = index++;
            stack.Push(v);
            onStack.Add(v);
            foreach (var w in graph.GetValueOrDefault(v) ?? [])
            {
                if (!indices.ContainsKey(w))
                {
                    Visit(w);
                    low[v] = Math.Min(low[v], low[w]);
                }
                else if (onStack.Contains(w))
                {
                    low[v] = Math.Min(low[v], indices[w]);
                }
            }
            if (low[v] == indices[v])
            {
                var component = new List<string>();
                string w;
                do
                {
                    w = stack.Pop();
                    onStack.Remove(w);
                    component.Add(w);
                }
                while (w != v);
                components.Add(component);
            }
        }
        foreach (var v in graph.Keys.ToList())
        {
            if (!indices.ContainsKey(v))
            {
                Visit(v);
            }
        }
        return components;
    }

    // Call/newobj/ldsfld-style opcodes carry a 4-byte metadata token; scanning every 4-byte window after such an opcode
    // is enough to find member references without a full IL decoder.
    private static IEnumerable<int> ReferencedTokens(byte[] il)
    {
        for (int i = 0; i + 4 < il.Length; i++)
        {
            byte op = il[i];
            if (op is 0x28 or 0x6F or 0x73 or 0x7E or 0x7B or 0x80 or 0x7D)
            {
                int token = BitConverter.ToInt32(il, i + 1);
                int table = token >>> 24;
                if (table is 0x06 or 0x0A or 0x2B or 0x04)
                {
                    yield return token;
                }
            }
        }
    }
}
