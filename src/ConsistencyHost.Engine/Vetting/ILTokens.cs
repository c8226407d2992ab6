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
    public static IEnumerable<EntityHandle> Of(MethodBodyBlock body)
    {
        var il = body.GetILReader();
        var tokens = new List<EntityHandle>();
        while (il.RemainingBytes > 0)
        {
            var first = il.ReadByte();
            var value = first == 0xFE ? (short)(0xFE00 | il.ReadByte()) : (short)first;
            if (!Operands.TryGetValue(value, out var operand))
            {
                throw new BadImageFormatException($"unknown IL opcode 0x{(ushort)value:X} at offset {il.Offset - 1}");
            }

            if (operand is OperandType.InlineMethod or OperandType.InlineField or OperandType.InlineType or OperandType.InlineTok)
            {
                tokens.Add(MetadataTokens.EntityHandle(il.ReadInt32()));
                continue;
            }

            Skip(ref il, operand);
        }

        return tokens;
    }

    private static void Skip(ref BlobReader il, OperandType operand)
    {
        switch (operand)
        {
            case OperandType.InlineNone:
                return;
            case OperandType.ShortInlineBrTarget or OperandType.ShortInlineI or OperandType.ShortInlineVar:
                il.Offset += 1;
                return;
            case OperandType.InlineVar:
                il.Offset += 2;
                return;
            case OperandType.InlineI8 or OperandType.InlineR:
                il.Offset += 8;
                return;
            case OperandType.InlineSwitch:
                il.Offset += 4 * il.ReadInt32();
                return;
            default:
                il.Offset += 4;
                return;
        }
    }
}
