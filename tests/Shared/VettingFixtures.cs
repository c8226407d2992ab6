namespace ConsistencyHost.Tests.Shared;

/// <summary>
/// The vetting corpus of tests/fixtures/vetting: small plugins kept as source folders. Among them the hostile
/// plugins Hostile.* (issue 14: each passed the banned list) and the APIs each must be refused for as
/// <see cref="HostileCode"/> (not on the allow-list). The API names are the parts that the analyzers' display
/// (<c>System.IO.StreamReader.StreamReader(string, …)</c>) and the IL scan's documentation-id spelling
/// (<c>System.IO.StreamReader.#ctor(System.String,…)</c>) share.
/// </summary>
internal static class VettingFixtures
{
    public const string HostileCode = "CHSDK1002";

    public static IReadOnlyDictionary<string, string[]> HostileApis { get; } = new Dictionary<string, string[]>
    {
        ["Hostile.StreamReaderPath"] = ["System.IO.StreamReader"],
        ["Hostile.StreamWriterPath"] = ["System.IO.StreamWriter"],
        ["Hostile.FileSystemEnumerable"] = ["System.IO.Enumeration.FileSystemEnumerable"],
        ["Hostile.XmlReaderPath"] = ["System.Xml.XmlReader.Create"],
        ["Hostile.DynamicCall"] = ["Microsoft.CSharp.RuntimeBinder"],
        ["Hostile.MemoryMarshalSpan"] = ["System.Runtime.InteropServices.MemoryMarshal.CreateSpan"],
        ["Hostile.TaskRun"] = ["System.Threading.Tasks.Task.Run"],
        ["Hostile.TaskStart"] = ["System.Threading.Tasks.Task.Start"],
        ["Hostile.CancelAfterRegister"] = ["System.Threading.CancellationTokenSource.CancelAfter", "System.Threading.CancellationToken.Register"],
        ["Hostile.DelayContinueWith"] = ["System.Threading.Tasks.Task.Delay", "System.Threading.Tasks.Task.ContinueWith"],
        ["Hostile.PeriodicTimer"] = ["System.Threading.PeriodicTimer"],
        ["Hostile.Finalizer"] = ["System.Object.Finalize"],
        ["Hostile.AppContextSwitch"] = ["System.AppContext.SetSwitch"],
        ["Hostile.ConsoleTextWriter"] = ["System.IO.TextWriter"],
    };

    /// <summary>The folder of one corpus plugin.</summary>
    public static string Folder(string plugin) => Path.Combine(RepoPaths.Root, "tests", "fixtures", "vetting", plugin);
}
