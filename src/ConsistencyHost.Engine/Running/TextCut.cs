namespace ConsistencyHost.Engine.Running;

/// <summary>
/// Cuts over-long text for messages, saying how long it was. Its own file so that the test kit, which compiles the
/// host's options binder from source, compiles it too.
/// </summary>
public static class TextCut
{
    /// <summary>Cuts text to <paramref name="max"/> characters, saying how long it was.</summary>
    public static string Cut(string text, int max) =>
        text.Length <= max ? text : $"{text[..max]}… (cut, {text.Length} characters in all)";
}
