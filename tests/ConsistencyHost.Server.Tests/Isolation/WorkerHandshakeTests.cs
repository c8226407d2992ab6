using ConsistencyHost.Contract.Worker;

namespace ConsistencyHost.Server.Tests.Isolation;

/// <summary>The handshake line follows hashicorp/go-plugin's format (docs/internals.md): core|app|network|address|protocol.</summary>
public sealed class WorkerHandshakeTests
{
    [Fact]
    public void Parse_LineTheWorkerPrints_GivesSocketPath()
    {
        var (path, problem) = WorkerHandshake.Parse(WorkerHandshake.Line("/tmp/ch-worker-1/worker.sock"));

        Assert.Null(problem);
        Assert.Equal("/tmp/ch-worker-1/worker.sock", path);
    }

    [Theory]
    [InlineData(null, "without a handshake line")]
    [InlineData("Now listening on: http://localhost:5000", "is not core|protocol|unix|path|grpc")]
    [InlineData("1|1|tcp|127.0.0.1:1234|grpc", "is not core|protocol|unix|path|grpc")]
    [InlineData("1|99|unix|/tmp/w.sock|grpc", "protocol 99; this host speaks 1 / 2")]
    public void Parse_UnusableLine_SaysWhy(string? line, string expected)
    {
        var (path, problem) = WorkerHandshake.Parse(line);

        Assert.Null(path);
        Assert.Contains(expected, problem, StringComparison.Ordinal);
    }
}
