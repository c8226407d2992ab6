using System.Reflection;

namespace ConsistencyHost.Engine.Plugins;

/// <summary>
/// The finding codes a plugin assembly declares: the string constants of its static classes named <c>…Codes</c>,
/// where the SDK and its analyzers ask rules to keep them (CHSDK3002). Read from metadata only; nothing runs.
/// </summary>
internal static class DeclaredCodes
{
    /// <summary>Every declared code, sorted; empty when the assembly has no such class.</summary>
    public static IReadOnlyList<string> Of(Assembly assembly)
    {
        Type[] types;
        try
        {
            types = assembly.GetTypes();
        }
        catch (ReflectionTypeLoadException partial)
        {
            types = [.. partial.Types.OfType<Type>()];
        }

        var codes = new SortedSet<string>(StringComparer.Ordinal);
        foreach (var type in types)
        {
            if (!(type.IsAbstract && type.IsSealed) || !type.Name.EndsWith("Codes", StringComparison.Ordinal)) continue;
            foreach (var field in type.GetFields(BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.Static))
            {
                if (field.IsLiteral && field.FieldType == typeof(string) && field.GetRawConstantValue() is string { Length: > 0 } code)
                {
                    codes.Add(code);
                }
            }
        }

        return [.. codes];
    }
}
