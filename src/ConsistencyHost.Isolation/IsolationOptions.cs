namespace ConsistencyHost.Isolation;

/// <summary>How untrusted plugins' worker processes are started, confined and supervised.</summary>
public sealed record IsolationOptions
{
    /// <summary>The worker assembly, run as <c>dotnet ConsistencyHost.Worker.dll</c>; by default in worker/ beside the host.</summary>
    public string WorkerAssemblyPath { get; init; } = Path.Combine(AppContext.BaseDirectory, "worker", "ConsistencyHost.Worker.dll");

    /// <summary>
    /// How long a worker may take to load its plugin and print its handshake. A cold .NET start with
    /// Kestrel takes about a second on an idle machine; thirty seconds covers a loaded, shared one.
    /// </summary>
    public TimeSpan StartTimeout { get; init; } = TimeSpan.FromSeconds(30);

    /// <summary>
    /// How long a started worker may take to describe its plugin and bind every profile's options (the plugin's
    /// options constructors and <c>Validate</c> run then); past it the worker is killed and the plugin refused.
    /// </summary>
    public TimeSpan DescribeTimeout { get; init; } = TimeSpan.FromSeconds(30);

    /// <summary>
    /// Time allowed past a rule's deadline for its reply to arrive before the worker is killed. The rule's own
    /// deadline runs in the worker from when the rule starts; this grace covers what surrounds it — the call, the
    /// entry's intake and shared perception in the worker, and on a worker's first call the runtime compiling all
    /// of that — which on a loaded 2-core machine took more than the 500 ms this used to be.
    /// </summary>
    public TimeSpan DeadlineGrace { get; init; } = TimeSpan.FromSeconds(2);

    /// <summary>Managed heap limit of a worker (DOTNET_GCHeapHardLimit); an allocation past it throws OutOfMemoryException.</summary>
    public long ManagedHeapBytes { get; init; } = 256L * 1024 * 1024;

    /// <summary>
    /// Address-space limit (RLIMIT_AS via prlimit). Generous because the runtime reserves address space far
    /// beyond what it uses; it caps native allocations the managed limit does not see.
    /// </summary>
    public long AddressSpaceBytes { get; init; } = 8L * 1024 * 1024 * 1024;

    /// <summary>
    /// Wall time a worker may take to compile one source plugin (start, Roslyn, analyzers, emit); past it the
    /// compiler process is killed and the plugin refused. A lab's plugin takes a few seconds in a fresh process
    /// (most of it loading Roslyn); a minute covers a loaded, shared machine and stops nested-lambda blow-ups.
    /// </summary>
    public TimeSpan CompileTimeout { get; init; } = TimeSpan.FromSeconds(60);

    /// <summary>
    /// Managed heap limit of a compiling worker. Roslyn with the .NET reference assemblies needs more than a rule
    /// does; a constant string doubled past the metadata limit needs gigabytes and is stopped here.
    /// </summary>
    public long CompileHeapBytes { get; init; } = 768L * 1024 * 1024;

    /// <summary>Open file descriptors a worker may hold (RLIMIT_NOFILE); Kestrel and the runtime need a few dozen.</summary>
    public int OpenFiles { get; init; } = 256;

    /// <summary>
    /// Tasks (processes and threads) a worker's uid may have (RLIMIT_NPROC via prlimit). The kernel counts them per
    /// uid, and each plugin has a uid of its own, so this bounds one plugin's fork or thread bomb without counting
    /// other workers. A worker runs about thirty threads (the runtime, Kestrel, the thread pool); Roslyn a few more.
    /// </summary>
    public int Processes { get; init; } = 512;

    /// <summary>Worker losses (crashes and overrun kills) within <see cref="CrashWindow"/> that quarantine a plugin.</summary>
    public int CrashLimit { get; init; } = 3;

    /// <summary>The window for <see cref="CrashLimit"/>; VS Code uses 3 crashes in 5 minutes for its extension host.</summary>
    public TimeSpan CrashWindow { get; init; } = TimeSpan.FromMinutes(5);

    /// <summary>Put workers in a fresh network namespace (no network at all) when <c>unshare</c> allows it here.</summary>
    public bool IsolateNetwork { get; init; } = true;

    /// <summary>
    /// The user ids workers run under, one each (the group id is the same number), through <c>setpriv</c>: different
    /// uids keep workers from signalling, tracing or reading one another and the host. Needs a host that runs as root
    /// (or holds the capabilities <see cref="WorkerUsers"/> names); elsewhere untrusted plugins are refused.
    /// </summary>
    public UidRange WorkerUids { get; init; } = UidRange.Default;

    /// <summary>Give workers a read-only view of the file system except their private folder, where this host can (<see cref="ReadOnlyView"/>).</summary>
    public bool ReadOnlyFileSystem { get; init; } = true;

    /// <summary>The clock for the crash window.</summary>
    public TimeProvider Clock { get; init; } = TimeProvider.System;
}
