using ConsistencyHost.Engine.Vetting;

namespace ConsistencyHost.Engine.Tests.Vetting;

public sealed class CompiledPluginVetterTests
{
    private static VettingResult Vet(string source, bool allowUnsafe = false) =>
        CompiledPluginVetter.Default.Vet(new MemoryStream(VettingCorpus.EmitSource("Probe", source, allowUnsafe)));

    [Fact]
    public void Vet_PInvokeDeclaration_NamesLibraryAndMethod()
    {
        var result = Vet("""
            namespace Lab;
            public static class Native
            {
                [System.Runtime.InteropServices.DllImport("libc")]
                public static extern int getpid();
            }
            """);

        Assert.Contains(result.Problems, p => p is { Code: "CHSDK1001", Api: "P/Invoke into 'libc'", Member: "Lab.Native.getpid" });
    }

    [Fact]
    public void Vet_UnsafeCodeEnabled_ReportsTheUnverifiableCodeMarker()
    {
        var result = Vet("namespace Lab; public static class Pointers { public static unsafe int Read(int* p) => *p; }", allowUnsafe: true);

        Assert.Contains(result.Problems, p => p.Api == "[System.Security.UnverifiableCodeAttribute]" && p.Member == "the module");
    }

    [Fact]
    public void Vet_UnsafeAccessorAndSkipLocalsInit_AreRefusedWithTheirMember()
    {
        var result = Vet("""
            using System.Runtime.CompilerServices;
            namespace Lab;
            public static class Sneaky
            {
                [UnsafeAccessor(UnsafeAccessorKind.Field, Name = "_items")]
                public static extern ref object[] Items(List<object> list);

                [SkipLocalsInit]
                public static int Sum() => 1;
            }
            """, allowUnsafe: true);

        Assert.Contains(result.Problems, p => p.Api == "[System.Runtime.CompilerServices.UnsafeAccessorAttribute]" && p.Member == "Lab.Sneaky.Items");
        Assert.Contains(result.Problems, p => p.Api == "[System.Runtime.CompilerServices.SkipLocalsInitAttribute]" && p.Member == "Lab.Sneaky.Sum");
    }

    [Fact]
    public void Vet_ReflectionByName_EveryLookupAndCallIsRefused()
    {
        // The calls of the two reflective hostile fixtures (tests/fixtures/ConsistencyHost.Fixtures.Reflective*Rule).
        var result = Vet("""
            namespace Lab;
            public static class Reach
            {
                public static object? Run()
                {
                    var file = typeof(object).Assembly.GetType("System.IO.File", throwOnError: true)!;
                    var read = file.GetMethod("ReadAllText", [typeof(string)])!.CreateDelegate<Func<string, string>>();
                    var socket = Type.GetType("System.Net.Sockets.Socket, System.Net.Sockets", null, null, throwOnError: true)!;
                    var made = socket.GetConstructors()[0].Invoke([2, 1, 6]);
                    return socket.GetMethod("Close", Type.EmptyTypes)!.Invoke(made, null) ?? read;
                }
            }
            """);

        // The banned calls name their reason (CHSDK1001); the lookups between them are off the allow-list (CHSDK1002).
        var banned = result.Problems.Where(p => p.Code == "CHSDK1001").ToList();
        Assert.All(banned, p => Assert.Equal("Lab.Reach.Run", p.Member));
        Assert.Equal(
            ["System.Reflection.Assembly.GetType", "System.Reflection.ConstructorInfo.Invoke", "System.Reflection.MethodBase.Invoke",
             "System.Reflection.MethodInfo.CreateDelegate", "System.Type.GetType"],
            // The API is named with its documentation-id signature; the member name is what this test is about.
            banned.Select(p => p.Api.Split('(', '`')[0]).Distinct().Order(StringComparer.Ordinal));
        Assert.Contains(result.Problems, p => p is { Code: "CHSDK1002", Api: "System.Type.GetConstructors", Member: "Lab.Reach.Run" });
    }

    [Fact]
    public void Vet_BannedBaseType_NamesTheDerivedType()
    {
        var result = Vet("namespace Lab; public sealed class Handler : System.Net.Http.HttpClientHandler { }");

        Assert.Contains(result.Problems, p => p is { Code: "CHSDK1001", Api: "System.Net.Http.HttpClientHandler", Member: "Lab.Handler" });
    }

    [Fact]
    public void Vet_CallInsideLambda_IsAttributedToTheEnclosingMethod()
    {
        var result = Vet("""
            namespace Lab;
            public static class Stamps
            {
                public static IEnumerable<string> Label(IEnumerable<int> items) => items.Select(i => i + "@" + Guid.NewGuid());
            }
            """);

        var problem = Assert.Single(result.Problems);
        Assert.Equal(("CHSDK2001", "System.Guid.NewGuid", "Lab.Stamps.Label"), (problem.Code, problem.Api, problem.Member));
    }

    [Fact]
    public void Vet_SeededRandomAndUnseeded_OnlyUnseededIsRefused()
    {
        var result = Vet("""
            namespace Lab;
            public static class Draws
            {
                public static int Fixed() => new Random(417).Next();
                public static int Loose() => new Random().Next();
            }
            """);

        var problem = Assert.Single(result.Problems);
        Assert.Equal(("System.Random.#ctor", "Lab.Draws.Loose"), (problem.Api, problem.Member));
    }

    [Fact]
    public void Vet_StaticStateOfEveryKind_ReportsFieldsAndAutoProperty()
    {
        var result = Vet("""
            namespace Lab;
            public static class State
            {
                public static readonly List<double> Seen = new();
                public static double Tolerance { get; set; } = 0.5;
                public static readonly IReadOnlyList<string> Fine = ["d"];
                public const string Code = "c";
            }
            """);

        Assert.Equal(["Lab.State.Seen", "Lab.State.Tolerance"], result.Problems.Where(p => p.Code == "CHSDK2002").Select(p => p.Api).Order());
        Assert.Equal(2, result.Problems.Count);
    }

    [Fact]
    public void ILTokens_SwitchInstruction_StepsOverCountAndTargets()
    {
        // ECMA-335 III.3.66: switch (0x45) takes a uint32 count N followed by N int32 targets. A reader that loses
        // the count's four bytes lands inside the targets (an optimised build's iterator refused with "unknown IL
        // opcode"). Here: switch with one target 0xA6 (an unused opcode byte if misread), call 0x0A000001, ret.
        byte[] il = [0x45, 0x01, 0x00, 0x00, 0x00, 0xA6, 0x00, 0x00, 0x00, 0x28, 0x01, 0x00, 0x00, 0x0A, 0x2A];

        var tokens = ILTokens.Of(il);

        Assert.Equal(0x0A000001, System.Reflection.Metadata.Ecma335.MetadataTokens.GetToken(Assert.Single(tokens)));
    }

    [Fact]
    public void ILTokens_TruncatedOperand_IsBadImageNotACrash() =>
        Assert.Throws<BadImageFormatException>(() => ILTokens.Of([0x28, 0x01, 0x00]));

    [Fact]
    public void Vet_IteratorLambdaCacheAndCollectionExpression_CompilerGeneratedCodeIsAccepted()
    {
        // Iterators read Environment.CurrentManagedThreadId and cache lambdas in static fields of generated types.
        var result = Vet("""
            namespace Lab;
            public static class Generated
            {
                public static IEnumerable<int> Evens(IEnumerable<int> items)
                {
                    foreach (var item in items.Where(i => i % 2 == 0)) yield return item;
                }

                public static int First() { ReadOnlySpan<int> span = [1, 2, 3]; return span[0]; }

                // C# 13 binds these to params ReadOnlySpan<T> overloads, built on an inline array by compiler helpers.
                public static string Joined(string a, string b, int c) => string.Join(", ", a, b) + string.Concat(a, b, a, b, c.ToString());
            }
            """);

        Assert.True(result.IsAccepted, result.Reason);
    }

    [Fact]
    public void Vet_EnvironmentReadInAuthorsOwnCode_IsRefusedDespiteTheCompilerExemption()
    {
        var result = Vet("namespace Lab; public static class Threads { public static int Id() => Environment.CurrentManagedThreadId; }");

        Assert.Contains(result.Problems, p => p is { Api: "System.Environment.get_CurrentManagedThreadId", Member: "Lab.Threads.Id" });
    }

    [Fact]
    public void Vet_TextFile_ThrowsBadImageFormatForDiscoveryToReport()
    {
        var error = Record.Exception(() => CompiledPluginVetter.Default.Vet(new MemoryStream("not a portable executable"u8.ToArray())));

        Assert.IsType<BadImageFormatException>(error);
    }

    [Fact]
    public void Vet_UnsafeInAFileLocalType_IsRefusedDespiteTheCompilerExemption()
    {
        // A file-local type's metadata name starts with '<' like the compiler's own types (<File>F…__Reach); the
        // exemption for compiler-emitted Unsafe calls must not extend to code the author wrote in one.
        var result = Vet("""
            namespace Lab;
            file static class Reach
            {
                public static ref int At(ref int first, int offset) => ref System.Runtime.CompilerServices.Unsafe.Add(ref first, offset);
            }
            public static class Entry { public static int Read(int[] items) { return Reach.At(ref items[0], 1 << 20); } }
            """);

        Assert.Contains(result.Problems, p => p.Code == "CHSDK1001" && p.Api.StartsWith("System.Runtime.CompilerServices.Unsafe.Add", StringComparison.Ordinal));
    }

    [Fact]
    public void Vet_UnsafeAndMemoryMarshalInIteratorsAndLambdas_AreRefusedDespiteTheCompilerExemption()
    {
        // An iterator's body moves into <Read>d__0.MoveNext and a lambda's into <>c; both names start with '<' like
        // the compiler's own helpers, but they hold the author's code (the Hostile.MemoryMarshalSpan fixture's case).
        var result = Vet("""
            namespace Lab;
            public static class Sneaky
            {
                public static IEnumerable<int> Read(int[] items)
                {
                    yield return System.Runtime.CompilerServices.Unsafe.Add(ref items[0], 1 << 20);
                }

                public static Func<int> Later(int[] items) => () => System.Runtime.InteropServices.MemoryMarshal.CreateSpan(ref items[0], 1 << 20)[4096];
            }
            """);

        Assert.Contains(result.Problems, p => p is { Code: "CHSDK1001", Member: "Lab.Sneaky.Read" } && p.Api.StartsWith("System.Runtime.CompilerServices.Unsafe.Add", StringComparison.Ordinal));
        Assert.Contains(result.Problems, p => p is { Code: "CHSDK1002", Member: "Lab.Sneaky.Later" } && p.Api.StartsWith("System.Runtime.InteropServices.MemoryMarshal.CreateSpan", StringComparison.Ordinal));
    }

    public static TheoryData<string> BuiltPlugins() =>
    [
        .. new[] { "plugins", "sample-plugins" }
            .Select(drop => Path.Combine(ConsistencyHost.Tests.Shared.RepoPaths.Root, "artifacts", drop))
            .Where(Directory.Exists)
            .SelectMany(Directory.EnumerateDirectories)
            .Select(folder => Path.Combine(folder, Path.GetFileName(folder) + ".dll"))
            .Where(File.Exists)
            .Select(path => Path.GetRelativePath(ConsistencyHost.Tests.Shared.RepoPaths.Root, path)),
    ];

    [Theory]
    [MemberData(nameof(BuiltPlugins))]
    public void Vet_EveryBuiltInAndSamplePlugin_PassesTheAllowList(string relativePath)
    {
        // The built-in rules (regular-expression generator output included) and the sample lab's
        // plugin as the build dropped them: the allow-list must not refuse what the repository ships.
        var result = CompiledPluginVetter.Default.Vet(Path.Combine(ConsistencyHost.Tests.Shared.RepoPaths.Root, relativePath));

        Assert.True(result.IsAccepted, result.Reason);
    }
}
