using System.Globalization;
using System.Reflection;
using ConsistencyHost.Engine.Plugins;

namespace ConsistencyHost.Engine.Profiles;

/// <summary>
/// An options object as text: its settable properties (exactly the keys a profile may set, as
/// <see cref="OptionsBinder"/> accepts them) with invariant values. The worker describes an untrusted rule's
/// options with it; the command line shows a trusted rule's options with it.
/// </summary>
public static class OptionText
{
    /// <summary>The bound values of <paramref name="options"/>, ordered by name.</summary>
    public static IReadOnlyList<KeyValuePair<string, string>> Values(object options) =>
    [
        .. Settable(options.GetType()).Select(p => KeyValuePair.Create(p.Name, Invariant(p.GetValue(options)))),
    ];

    /// <summary>Name, type and default of every option of <paramref name="optionsType"/> (it must have a parameterless constructor).</summary>
    public static IReadOnlyList<RuleOptionInfo> Schema(Type optionsType)
    {
        var defaults = Activator.CreateInstance(optionsType)!;
        return [.. Settable(optionsType).Select(p => new RuleOptionInfo(p.Name, TypeName(p.PropertyType), Invariant(p.GetValue(defaults))))];
    }

    /// <summary>A value as a profile would write it.</summary>
    public static string Invariant(object? value) => value switch
    {
        null => "",
        bool b => b ? "true" : "false",
        IFormattable f => f.ToString(null, CultureInfo.InvariantCulture),
        _ => value.ToString() ?? "",
    };

    private static IEnumerable<PropertyInfo> Settable(Type type) =>
        type.GetProperties(BindingFlags.Public | BindingFlags.Instance)
            .Where(p => p.CanWrite && p.Name != "EqualityContract")
            .OrderBy(p => p.Name, StringComparer.Ordinal);

    private static string TypeName(Type type)
    {
        var target = Nullable.GetUnderlyingType(type) ?? type;
        return target.IsEnum ? "one of " + string.Join(", ", Enum.GetNames(target)) : target.Name;
    }
}
