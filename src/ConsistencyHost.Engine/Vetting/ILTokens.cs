using System.Buffers.Binary;
using System.Reflection;
using System.Reflection.Emit;
using System.Reflection.Metadata;
using System.Reflection.Metadata.Ecma335;

namespace ConsistencyHost.Engine.Vetting;

/// <summary>
/// Reads the metadata tokens (methods, fields, types) a method body's IL refers to, without running it.
/// Operand sizes come from the runtime's own opcode table (<see cref="OpCodes"/>), so every ECMA-335
/// instruction is stepped over correctly.
/// </summary>
internal static class ILTokens
{
    private static readonly Dictionary<short, OperandType> Operands = typeof(OpCodes)
        .GetFields(BindingFlags.Public | BindingFlags.Static)
        .Select(field => (OpCode)field.GetValue(null)!)
        .DistinctBy(code => code.Value)
        .ToDictionary(code => code.Value, code => code.OperandType);

    /// <summary>Every token operand of the body's instructions, in order.</summary>
    public static IEnumerable<EntityHandle> Of(MethodBodyBlock body) => Of(body.GetILBytes() ?? []);

    /// <summary>Every token operand of an IL byte stream, in order.</summary>
    /// <exception cref="BadImageFormatException">An opcode the runtime does not know, or a truncated operand.</exception>
    internal static IReadOnlyList<EntityHandle> Of(byte[] il)
    {
        var tokens = new List<EntityHandle>();
        var at = 0;
        while (at < il.Length)
        {
            var start = at;
            int first = il[at++];
            var value = first == 0xFE && at < il.Length ? (short)(0xFE00 | il[at++]) : (short)first;
            if (!Operands.TryGetValue(value, out var operand))
            {
                throw new BadImageFormatException($"unknown IL opcode 0x{(ushort)value:X} at offset {start}");
            }

            var size = OperandSize(il, at, operand);
            if (at + size > il.Length)
            {
                throw new BadImageFormatException($"IL operand of the instruction at offset {start} runs past the end of the body");
            }

            if (operand is OperandType.InlineMethod or OperandType.InlineField or OperandType.InlineType or OperandType.InlineTok)
            {
                tokens.Add(MetadataTokens.EntityHandle(BinaryPrimitives.ReadInt32LittleEndian(il.AsSpan(at, 4))));
            }

            at += size;
        }

        return tokens;
    }

    /// <summary>Bytes of the operand that starts at <paramref name="at"/>; a switch is its count plus 4 bytes per target.</summary>
    private static int OperandSize(byte[] il, int at, OperandType operand) => operand switch
    {
        OperandType.InlineNone => 0,
        OperandType.ShortInlineBrTarget or OperandType.ShortInlineI or OperandType.ShortInlineVar => 1,
        OperandType.InlineVar => 2,
        OperandType.InlineI8 or OperandType.InlineR => 8,
        OperandType.InlineSwitch when at + 4 <= il.Length => 4 + (4 * (int)Math.Min(BinaryPrimitives.ReadUInt32LittleEndian(il.AsSpan(at, 4)), int.MaxValue / 8)),
        OperandType.InlineSwitch => 4,
        _ => 4,
    };
}
