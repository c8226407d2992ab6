namespace ConsistencyHost.Cli.CommandLine;

/// <summary>
/// Arguments of one command after parsing: positional values and named options (each possibly repeated).
/// Accepts <c>--name value</c> and <c>--name=value</c>; flags declared as switches take no value.
/// </summary>
public sealed class ParsedArguments
{
    private readonly Dictionary<string, List<string>> _options;

    private ParsedArguments(List<string> positional, Dictionary<string, List<string>> options)
    {
        Positional = positional;
        _options = options;
    }

    /// <summary>Positional arguments in order.</summary>
    public IReadOnlyList<string> Positional { get; }

    /// <summary>The last value of an option, or null.</summary>
    public string? Value(string name) => _options.TryGetValue(name, out var values) ? values[^1] : null;

    /// <summary>Every value of a repeatable option.</summary>
    public IReadOnlyList<string> Values(string name) => _options.TryGetValue(name, out var values) ? values : [];

    /// <summary>True when a switch was given.</summary>
    public bool Has(string name) => _options.ContainsKey(name);

    /// <summary>
    /// Parses <paramref name="args"/>. <paramref name="valued"/> lists options that take a value (aliases map
    /// to their canonical name); <paramref name="switches"/> lists those that do not.
    /// </summary>
    /// <exception cref="UsageException">An unknown option or a missing value.</exception>
    public static ParsedArguments Parse(IReadOnlyList<string> args, IReadOnlyDictionary<string, string> valued, IReadOnlyCollection<string> switches)
    {
        var positional = new List<string>();
        var options = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        for (var i = 0; i < args.Count; i++)
        {
            var arg = args[i];
            if (!arg.StartsWith("--", StringComparison.Ordinal) || arg == "--")
            {
                positional.Add(arg);
                continue;
            }

            var equals = arg.IndexOf('=', StringComparison.Ordinal);
            var name = equals > 0 ? arg[..equals] : arg;
            if (switches.Contains(name))
            {
                Add(options, name, "true");
            }
            else if (valued.TryGetValue(name, out var canonical))
            {
                var value = equals > 0 ? arg[(equals + 1)..] : (i + 1 < args.Count ? args[++i] : throw new UsageException($"option {name} needs a value"));
                Add(options, canonical, value);
            }
            else
            {
                var known = valued.Keys.Concat(switches).Order(StringComparer.Ordinal);
                throw new UsageException($"unknown option '{name}'; known options: {string.Join(", ", known)}");
            }
        }

        return new ParsedArguments(positional, options);
    }

    private static void Add(Dictionary<string, List<string>> options, string name, string value)
    {
        if (!options.TryGetValue(name, out var list))
        {
            options[name] = list = [];
        }

        list.Add(value);
    }
}
