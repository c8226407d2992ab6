using ConsistencyHost.Sdk.Analyzers.Allowed;
using Verify = ConsistencyHost.Sdk.Analyzers.Tests.Verify<ConsistencyHost.Sdk.Analyzers.Allowed.AllowListAnalyzer>;

namespace ConsistencyHost.Sdk.Analyzers.Tests.Allowed;

/// <summary>
/// One compliant and one non-compliant case per group of the allow-list (src/ConsistencyHost.Sdk/AllowedApis.txt),
/// then the APIs issue 14 names as out, each refused. APIs on the banned list are left to the banned-API
/// analyzer (<see cref="BannedOutsTests"/>).
/// </summary>
public sealed class AllowListAnalyzerTests
{
    private static Microsoft.CodeAnalysis.Testing.DiagnosticResult NotAllowed(int location, string api) =>
        Verify.Diagnostic(Descriptors.NotAllowed).WithLocation(location).WithArguments(api);

    // --- Primitives, math and formatting with an explicit culture ---

    [Fact]
    public Task Analyze_PrimitivesMathAndInvariantFormatting_ReportsNothing() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var shift = double.Parse("7.26", System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture);
            var text = Math.Round(Math.Sqrt(shift), 2, MidpointRounding.AwayFromZero).ToString("F2", System.Globalization.CultureInfo.InvariantCulture);
            var limit = MathF.Max(1f, (float)decimal.ToDouble(0.5m)) + int.MaxValue % 7 + char.GetNumericValue('3') + text.Length;
            """));

    [Fact]
    public Task Analyze_SettingTheProcessCulture_IsNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            {|#0:System.Globalization.CultureInfo.CurrentCulture|} = System.Globalization.CultureInfo.InvariantCulture;
            """),
            NotAllowed(0, "System.Globalization.CultureInfo.CurrentCulture"));

    // --- Collections ---

    [Fact]
    public Task Analyze_GenericImmutableAndObjectModelCollections_ReportNothing() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var counts = new Dictionary<string, int> { ["CDCl3"] = 1 };
            var frozen = System.Collections.Immutable.ImmutableArray.Create(1, 2, 3);
            var view = new System.Collections.ObjectModel.ReadOnlyCollection<int>(new List<int>(frozen));
            var set = new HashSet<int>(view) { counts.Count };
            """));

    [Fact]
    public Task Analyze_ConcurrentCollection_IsNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var shared = {|#0:new System.Collections.Concurrent.ConcurrentDictionary<string, int>()|};
            """),
            NotAllowed(0, "System.Collections.Concurrent.ConcurrentDictionary<string, int>.ConcurrentDictionary()"));

    // --- LINQ ---

    [Fact]
    public Task Analyze_LinqToObjects_ReportsNothing() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var groups = entry.Spectra.GroupBy(s => s.Nucleus).OrderBy(g => g.Key).Select(g => (g.Key, g.Count())).ToList();
            """));

    [Fact]
    public Task Analyze_ExpressionTree_IsNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var constant = {|#0:System.Linq.Expressions.Expression.Constant(1)|};
            """),
            NotAllowed(0, "System.Linq.Expressions.Expression.Constant(object?)"));

    // --- Text ---

    [Fact]
    public Task Analyze_StringBuilderAndStringHelpers_ReportNothing() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var line = new System.Text.StringBuilder().Append("δ ").Append(7.26.ToString(System.Globalization.CultureInfo.InvariantCulture)).ToString();
            var parts = line.Split(' ', StringSplitOptions.RemoveEmptyEntries).Select(p => p.Trim().ToUpperInvariant());
            """));

    [Fact]
    public Task Analyze_Encoding_IsNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var bytes = {|#0:{|#1:System.Text.Encoding.UTF8|}.GetBytes("CDCl3")|};
            """),
            NotAllowed(0, "System.Text.Encoding.GetBytes(string)"),
            NotAllowed(1, "System.Text.Encoding.UTF8"));

    // --- Spans and memory ---

    [Fact]
    public Task Analyze_SpansAndMemory_ReportNothing() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            ReadOnlySpan<char> label = "CDCl3".AsSpan(0, 4);
            var digits = new int[] { 1, 2, 3 }.AsMemory().Span.Slice(1);
            var found = label.IndexOf('C') + digits[0];
            """));

    [Fact]
    public Task Analyze_MemoryMarshalCreateSpan_IsNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var one = 1;
            var span = {|#0:System.Runtime.InteropServices.MemoryMarshal.CreateSpan(ref one, 4096)|};
            """),
            NotAllowed(0, "System.Runtime.InteropServices.MemoryMarshal.CreateSpan<int>(scoped ref int, int)"));

    // --- Tuples ---

    [Fact]
    public Task Analyze_ValueTupleAndTuple_ReportNothing() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var pair = (Shift: 7.26, Count: 1);
            var old = Tuple.Create(pair.Shift, pair.Count);
            var (shift, count) = pair;
            """));

    [Fact]
    public Task Analyze_TupleOfAnApiOffTheList_NamesTheElementType() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            (int Count, System.Text.Encoding Encoding) {|#0:pair = default|};
            """),
            NotAllowed(0, "System.Text.Encoding"));

    // --- Exceptions ---

    [Fact]
    public Task Analyze_ArgumentAndOperationExceptions_ReportNothing() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            if (entry.EntryId.Length == 0) throw new ArgumentException("An entry needs an id.", nameof(entry));
            if (entry.Spectra.Count > 1000) throw new InvalidOperationException("Too many spectra.");
            """));

    [Fact]
    public Task Analyze_IOException_IsNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            if (entry.Spectra.Count == 0) throw {|#0:new System.IO.IOException("no spectra")|};
            """),
            NotAllowed(0, "System.IO.IOException.IOException(string?)"));

    // --- The SDK, the shared model and the cancellation token ---

    [Fact]
    public Task Analyze_SdkModelAndTokenObserved_ReportNothing() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            foreach (var spectrum in entry.Spectra)
            {
                if (cancellationToken.IsCancellationRequested) break;
                var signals = spectrum.Signals.Count;
            }
            """));

    [Fact]
    public Task Analyze_TokenRegisterCallback_IsNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var registration = {|#0:cancellationToken.Register(() => { })|};
            """),
            NotAllowed(0, "System.Threading.CancellationToken.Register(System.Action)"));

    // --- Reflection: typeof and records compile to Type; nothing of Type beyond that ---

    [Fact]
    public Task Analyze_RecordAndTypeof_ReportNothing() =>
        Verify.Analyzer("""
            public sealed record Peak(double Shift, int Count);

            public static class Shapes
            {
                public static bool SameKind(object value) => value.GetType() == typeof(Peak) && new Peak(1, 2) with { Count = 3 } != null;
            }
            """);

    [Fact]
    public Task Analyze_ReflectionOverMembers_IsNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var methods = {|#0:typeof(string).GetMethods()|};
            """),
            NotAllowed(0, "System.Type.GetMethods()"));

    // --- The APIs issue 14 names as out ---

    [Fact]
    public Task Analyze_DynamicCall_IsNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            dynamic {|#0:target = "CDCl3"|};
            object length = {|#1:target.Substring(1)|};
            """),
            NotAllowed(0, AllowListAnalyzer.DynamicApi),
            NotAllowed(1, AllowListAnalyzer.DynamicApi));

    [Fact]
    public Task Analyze_Finalizer_IsNotAllowed() =>
        Verify.Analyzer("""
            public sealed class Lingering
            {
                ~{|#0:Lingering|}() { }
            }
            """,
            NotAllowed(0, "finalizer Lingering.~Lingering() (System.Object.Finalize)"));

    [Fact]
    public Task Analyze_TaskCreationAndContinuation_AreNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            {|#0:System.Threading.Tasks.Task.Run(async () => await {|#1:System.Threading.Tasks.Task.Yield()|})|};
            {|#2:{|#3:new System.Threading.Tasks.Task(() => { })|}.Start()|};
            {|#4:{|#5:System.Threading.Tasks.Task.Delay(10)|}.ContinueWith(_ => { })|};
            """),
            NotAllowed(0, "System.Threading.Tasks.Task.Run(System.Func<System.Threading.Tasks.Task?>)"),
            NotAllowed(1, "System.Threading.Tasks.Task.Yield()"),
            NotAllowed(2, "System.Threading.Tasks.Task.Start()"),
            NotAllowed(3, "System.Threading.Tasks.Task.Task(System.Action)"),
            NotAllowed(4, "System.Threading.Tasks.Task.ContinueWith(System.Action<System.Threading.Tasks.Task>)"),
            NotAllowed(5, "System.Threading.Tasks.Task.Delay(int)"));

    [Fact]
    public Task Analyze_TaskFactoryProperty_IsNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var factory = {|#0:System.Threading.Tasks.Task.Factory|};
            """),
            NotAllowed(0, "System.Threading.Tasks.Task.Factory"));

    [Fact]
    public Task Analyze_PeriodicTimer_IsNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            using var timer = {|#0:new System.Threading.PeriodicTimer(TimeSpan.FromSeconds(1))|};
            """),
            NotAllowed(0, "System.Threading.PeriodicTimer.PeriodicTimer(System.TimeSpan)"));

    [Fact]
    public Task Analyze_TokenSourceCancelAfter_IsNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var source = {|#0:new CancellationTokenSource()|};
            {|#1:source.CancelAfter(10)|};
            """),
            NotAllowed(0, "System.Threading.CancellationTokenSource.CancellationTokenSource()"),
            NotAllowed(1, "System.Threading.CancellationTokenSource.CancelAfter(int)"));

    [Fact]
    public Task Analyze_AppContextSetSwitchAndGetData_AreNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            {|#0:AppContext.SetSwitch("System.Globalization.Invariant", true)|};
            var data = {|#1:AppContext.GetData("REGEX_DEFAULT_MATCH_TIMEOUT")|};
            """),
            NotAllowed(0, "System.AppContext.SetSwitch(string, bool)"),
            NotAllowed(1, "System.AppContext.GetData(string)"));

    [Fact]
    public Task Analyze_ReadersAndWritersTakingAPath_AreNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            using var reader = {|#0:new System.IO.StreamReader("/etc/hostname", {|#1:System.Text.Encoding.UTF8|})|};
            using var writer = {|#2:new System.IO.StreamWriter("/tmp/planted.txt", true)|};
            using var xml = {|#3:System.Xml.XmlReader.Create("/etc/fonts/fonts.conf")|};
            """),
            NotAllowed(0, "System.IO.StreamReader.StreamReader(string, System.Text.Encoding?)"),
            NotAllowed(1, "System.Text.Encoding.UTF8"),
            NotAllowed(2, "System.IO.StreamWriter.StreamWriter(string, bool)"),
            NotAllowed(3, "System.Xml.XmlReader.Create(string)"));

    [Fact]
    public Task Analyze_TextWriterAndTextReader_AreNotAllowed() =>
        Verify.Analyzer("""
            public static class Talk
            {
                public static void {|#0:Say|}(System.IO.TextWriter output, System.IO.TextReader input) => {|#2:output.WriteLine({|#3:input.ReadLine()|})|};
            }
            """,
            NotAllowed(0, "System.IO.TextWriter"),
            NotAllowed(0, "System.IO.TextReader"),
            NotAllowed(2, "System.IO.TextWriter.WriteLine(string?)"),
            NotAllowed(3, "System.IO.TextReader.ReadLine()"));

    [Fact]
    public Task Analyze_FileSystemEnumerable_IsNotAllowed() =>
        Verify.Analyzer(PluginSource.RuleWithBody("""
            var names = {|#0:new System.IO.Enumeration.FileSystemEnumerable<string>("/etc", (ref System.IO.Enumeration.FileSystemEntry item) => "x")|};
            """),
            NotAllowed(0, "System.IO.Enumeration.FileSystemEnumerable<string>.FileSystemEnumerable(string, System.IO.Enumeration.FileSystemEnumerable<string>.FindTransform, System.IO.EnumerationOptions?)"));
}
