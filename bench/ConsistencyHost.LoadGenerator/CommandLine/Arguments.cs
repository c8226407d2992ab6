using System.Globalization;

namespace ConsistencyHost.LoadGenerator.CommandLine;

/// <summary>The options of one mode, given as <c>--name value</c> or <c>--name=value</c>; each may appear once.</summary>
public sealed class Arguments
{
    private readonly Dictionary<string, string> _values;

    private Arguments(Dictionary<string, string> values) => _values = values;

    /// <summary>Parses <paramref name="args"/>, accepting only the options in <paramref name="known"/>.</summary>
    /// <exception cref="UsageException">An unknown or repeated option, a missing value, or a stray argument.</exception>
    public static Arguments Parse(IReadOnlyList<string> args, IReadOnlyCollection<string> known)
    {
        var values = new Dictionary<string, string>(StringComparer.Ordinal);
        for (var i = 0; i < args.Count; i++)
        {
            var arg = args[i];
            if (!arg.StartsWith("--", StringComparison.Ordinal)) throw new UsageException($"unexpected argument '{arg}'; options start with --");
            var equals = arg.IndexOf('=', StringComparison.Ordinal);
            var name = equals > 0 ? arg[..equals] : arg;
            if (!known.Contains(name)) throw new UsageException($"unknown option {name}; expected one of {string.Join(", ", known.Order(StringComparer.Ordinal))}");
            var value = equals > 0 ? arg[(equals + 1)..] : i + 1 < args.Count ? args[++i] : throw new UsageException($"option {name} needs a value");
            if (!values.TryAdd(name, value)) throw new UsageException($"option {name} is given twice");
        }

        return new Arguments(values);
    }

    /// <summary>The value of an option, or null when it was not given.</summary>
    public string? Value(string name) => _values.GetValueOrDefault(name);

    /// <summary>An absolute http(s) address.</summary>
    public Uri Address(string name) => ToAddress(name, Value(name) ?? throw new UsageException($"option {name} is required"));

    /// <summary>A comma-separated list of absolute http(s) addresses.</summary>
    public IReadOnlyList<Uri> Addresses(string name) =>
        [.. (Value(name) ?? throw new UsageException($"option {name} is required")).Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries).Select(a => ToAddress(name, a))];

    /// <summary>A whole number of at least <paramref name="min"/>.</summary>
    public int Int(string name, int fallback, int min = 1) => Value(name) is not { } text
        ? fallback
        : int.TryParse(text, NumberStyles.Integer, CultureInfo.InvariantCulture, out var value) && value >= min
            ? value
            : throw new UsageException($"{name}: '{text}' is not a whole number of at least {min}");

    /// <summary>A comma-separated list of process ids; empty when the option was not given.</summary>
    public IReadOnlyList<int> Pids(string name) => Value(name) is not { } text
        ? []
        : [.. text.Split(',', StringSplitOptions.TrimEntries).Select(p => int.TryParse(p, NumberStyles.Integer, CultureInfo.InvariantCulture, out var pid) && pid > 0
            ? pid
            : throw new UsageException($"{name}: '{p}' is not a process id"))];

    /// <summary>A rate in calls per second, written "50" or "50/s".</summary>
    public double Rate(string name)
    {
        var text = Value(name) ?? throw new UsageException($"option {name} is required");
        return double.TryParse(text.EndsWith("/s", StringComparison.Ordinal) ? text[..^2] : text, NumberStyles.Float, CultureInfo.InvariantCulture, out var rate) && rate > 0 && double.IsFinite(rate)
            ? rate
            : throw new UsageException($"{name}: '{text}' is not a rate; expected calls per second, e.g. 50/s");
    }

    /// <summary>A duration such as 30s or 10m.</summary>
    public TimeSpan Duration(string name, TimeSpan fallback) => Value(name) is { } text ? Durations.Parse(name, text) : fallback;

    private static Uri ToAddress(string name, string text) =>
        Uri.TryCreate(text, UriKind.Absolute, out var uri) && uri.Scheme is "http" or "https"
            ? uri
            : throw new UsageException($"{name}: '{text}' is not an address; expected e.g. http://127.0.0.1:5151");
}
