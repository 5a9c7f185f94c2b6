using System.Reflection;
using RotorDrive.Core;
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
