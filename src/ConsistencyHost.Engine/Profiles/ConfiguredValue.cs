using ConsistencyHost.Engine.Running;

namespace ConsistencyHost.Engine.Profiles;

/// <summary>
/// A configured value (option value, key, rule id) as start-up and binding messages quote it: cut at
/// <see cref="MaxShown"/> characters with its full length, so a value pasted by mistake (a whole file, a key)
/// leaves the message one readable line and does not echo more of a secret than needed to recognise it.
/// </summary>
public static class ConfiguredValue
{
    /// <summary>Characters shown before the cut.</summary>
    public const int MaxShown = 80;

    /// <summary>"'value'" or "'first 80 characters… (cut, N characters in all)'".</summary>
    public static string Quote(string? text) => $"'{TextCut.Cut(text ?? "", MaxShown)}'";
}
