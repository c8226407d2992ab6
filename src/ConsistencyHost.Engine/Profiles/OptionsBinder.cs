using System.ComponentModel.DataAnnotations;
using System.Globalization;
using System.Reflection;
using ConsistencyHost.Sdk.Options;

namespace ConsistencyHost.Engine.Profiles;

/// <summary>
/// Builds a rule's options object from a profile's text overrides and validates it (data annotations plus
/// the options' own <see cref="RuleOptions.Validate"/>), returning every problem rather than the first.
/// </summary>
internal static class OptionsBinder
{
    public static (object? Options, IReadOnlyList<string> Problems) Bind(Type optionsType, IReadOnlyDictionary<string, string> overrides)
    {
        var options = Activator.CreateInstance(optionsType)!;
        var problems = new List<string>();
        foreach (var (name, text) in overrides.OrderBy(pair => pair.Key, StringComparer.Ordinal))
        {
            var property = FindProperty(optionsType, name);
            if (property is null)
            {
                problems.Add($"has no option {ConfiguredValue.Quote(name)}; known options: {KnownOptions(optionsType)}");
                continue;
            }

            if (!TryConvert(text, property.PropertyType, out var value))
            {
                problems.Add($"option '{property.Name}' expects {Describe(property.PropertyType)} but got {ConfiguredValue.Quote(text)}");
                continue;
            }

            property.SetValue(options, value);
        }

        problems.AddRange(Validate(options));
        return (problems.Count == 0 ? options : null, problems);
    }

    private static IEnumerable<string> Validate(object options)
    {
        var results = new List<ValidationResult>();
        Validator.TryValidateObject(options, new ValidationContext(options), results, validateAllProperties: true);
        foreach (var result in results)
        {
            yield return result.ErrorMessage ?? "invalid option";
        }

        if (options is RuleOptions ruleOptions)
        {
            foreach (var message in ruleOptions.Validate())
            {
                yield return message;
            }
        }
    }

    private static PropertyInfo? FindProperty(Type type, string name) =>
        type.GetProperties(BindingFlags.Public | BindingFlags.Instance)
            .FirstOrDefault(p => p.CanWrite && string.Equals(p.Name, name, StringComparison.OrdinalIgnoreCase));

    private static string KnownOptions(Type type)
    {
        var names = type.GetProperties(BindingFlags.Public | BindingFlags.Instance)
            .Where(p => p.CanWrite && p.Name != "EqualityContract").Select(p => p.Name).Order(StringComparer.Ordinal).ToList();
        return names.Count == 0 ? "(none)" : string.Join(", ", names);
    }

    private static bool TryConvert(string text, Type type, out object? value)
    {
        var target = Nullable.GetUnderlyingType(type) ?? type;
        value = null;
        var invariant = CultureInfo.InvariantCulture;
        switch (target)
        {
            case var t when t == typeof(string): value = text; return true;
            case var t when t == typeof(bool) && bool.TryParse(text, out var b): value = b; return true;
            case var t when t == typeof(int) && int.TryParse(text, NumberStyles.Integer, invariant, out var i): value = i; return true;
            case var t when t == typeof(double) && double.TryParse(text, NumberStyles.Float, invariant, out var d): value = d; return true;
            case var t when t == typeof(TimeSpan) && TimeSpan.TryParse(text, invariant, out var span): value = span; return true;
            case { IsEnum: true } when Enum.TryParse(target, text, ignoreCase: true, out var e) && Enum.IsDefined(target, e!): value = e; return true;
            default: return false;
        }
    }

    private static string Describe(Type type)
    {
        var target = Nullable.GetUnderlyingType(type) ?? type;
        return target.IsEnum ? "one of " + string.Join(", ", Enum.GetNames(target)) : "a value of type " + target.Name;
    }
}
