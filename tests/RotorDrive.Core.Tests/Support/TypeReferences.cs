using System.Reflection;
using System.Reflection.Emit;

namespace RotorDrive.Core.Tests.Support;

/// <summary>Which types a type uses: its base type, interfaces, fields, properties, method signatures and every type,
/// method or field its method bodies name. Architecture tests build namespace graphs from it.</summary>
internal static class TypeReferences
{
    private const BindingFlags Everything =
        BindingFlags.Instance | BindingFlags.Static | BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.DeclaredOnly;

    /// <summary>Every type the given type refers to (generic arguments and element types unwrapped).</summary>
    public static IReadOnlySet<Type> Of(Type type)
    {
        var found = new HashSet<Type>();
        void Add(Type? t)
        {
            if (t is null || t.IsGenericParameter)
            {
                return;
            }
            if (t.HasElementType)
            {
                Add(t.GetElementType());
                return;
            }
            if (t.IsGenericType && !t.IsGenericTypeDefinition)
            {
                foreach (var argument in t.GetGenericArguments())
                {
                    Add(argument);
                }
                t = t.GetGenericTypeDefinition();
            }
            found.Add(t);
        }

        Add(type.BaseType);
        foreach (var i in type.GetInterfaces())
        {
            Add(i);
        }
        foreach (var f in type.GetFields(Everything))
        {
            Add(f.FieldType);
        }
        foreach (var p in type.GetProperties(Everything))
        {
            Add(p.PropertyType);
        }
        foreach (var method in type.GetMethods(Everything).Cast<MethodBase>().Concat(type.GetConstructors(Everything)))
        {
            if (method is MethodInfo info)
            {
                Add(info.ReturnType);
            }
            foreach (var parameter in method.GetParameters())
            {
                Add(parameter.ParameterType);
            }
            var body = method.GetMethodBody();
            if (body is null)
            {
                continue;
            }
            foreach (var local in body.LocalVariables)
            {
                Add(local.LocalType);
            }
            var il = body.GetILAsByteArray();
            if (il is null)
            {
                continue;
            }
            foreach (int token in Tokens(il))
            {
                try
                {
                    var member = type.Module.ResolveMember(
                        token,
                        type.IsGenericType ? type.GetGenericArguments() : null,
                        method.IsGenericMethod ? method.GetGenericArguments() : null);
                    Add(member as Type ?? member?.DeclaringType);
                }
                catch (ArgumentException)
                {
                    // A token into a generic context this scan does not rebuild: its declaring type is seen elsewhere.
                }
            }
        }
        return found;
    }

    private static readonly Dictionary<short, OpCode> OpCodesByValue = typeof(OpCodes)
        .GetFields(BindingFlags.Public | BindingFlags.Static)
        .Select(f => (OpCode)f.GetValue(null)!)
        .ToDictionary(o => o.Value);

    // Decodes the IL stream opcode by opcode (ECMA-335 III.1.2) and yields the metadata token of every instruction that
    // names a type, method or field.
    private static IEnumerable<int> Tokens(byte[] il)
    {
        int i = 0;
        while (i < il.Length)
        {
            short value = il[i] == 0xFE && i + 1 < il.Length ? (short)(0xFE00 | il[i + 1]) : il[i];
            if (!OpCodesByValue.TryGetValue(value, out var op))
            {
                yield break;
            }
            i += op.Size;
            switch (op.OperandType)
            {
                case OperandType.InlineMethod:
                case OperandType.InlineField:
                case OperandType.InlineType:
                case OperandType.InlineTok:
                    yield return BitConverter.ToInt32(il, i);
                    i += 4;
                    break;
                case OperandType.InlineNone:
                    break;
                case OperandType.ShortInlineBrTarget:
                case OperandType.ShortInlineI:
                case OperandType.ShortInlineVar:
                    i += 1;
                    break;
                case OperandType.InlineVar:
                    i += 2;
                    break;
                case OperandType.InlineI8:
                case OperandType.InlineR:
                    i += 8;
                    break;
                case OperandType.InlineSwitch:
                    int count = BitConverter.ToInt32(il, i);
                    i += 4 + 4 * count;
                    break;
                default:
                    i += 4;
                    break;
            }
        }
    }
}
