using System.Net;
using System.Text;
using System.Text.Json;
using ConsistencyHost.Contract.V1;
using Google.Protobuf;
using Google.Rpc;
using Grpc.Core;

namespace ConsistencyHost.Server.Tests.EndToEnd;

/// <summary>
/// INVALID_ARGUMENT in the standard rich form through the real host: a google.rpc.Status with a google.rpc.BadRequest
/// detail (googleapis google/rpc/error_details.proto) in the grpc-status-details-bin trailer, as the gRPC error model
/// defines it (grpc.io "Error handling", richer error model), beside the plain "field" trailer; and the same detail in
/// the JSON port's 400 body.
/// </summary>
public sealed class BadRequestDetailsTests
{
    private static readonly TimeSpan CallTimeout = TimeSpan.FromSeconds(60);
    private static readonly string[] Rules = ["ConsistencyHost.Rules.SpectrumMetadata"];

    [Fact]
    public async Task CheckEntry_UnknownNucleus_StatusDetailsHoldBadRequestWithTheFieldPath()
    {
        await using var host = await RunningHost.StartAsync(Rules);

        var error = await Assert.ThrowsAsync<RpcException>(() =>
            new EntryCheck.EntryCheckClient(host.Channel).CheckEntryAsync(Requests.UnknownNucleus("AIS-LQ-B001"), deadline: DateTime.UtcNow + CallTimeout).ResponseAsync);

        Assert.Equal(StatusCode.InvalidArgument, error.StatusCode);
        Assert.Equal("spectra[0].nucleus", error.Trailers.GetValue("field"));
        var status = Google.Rpc.Status.Parser.ParseFrom(error.Trailers.GetValueBytes("grpc-status-details-bin"));
        // The rich status agrees with the plain one: same code (google.rpc.Code INVALID_ARGUMENT = 3), same message.
        Assert.Equal(((int)StatusCode.InvalidArgument, error.Status.Detail), (status.Code, status.Message));
        var violation = Assert.Single(Violations(error));
        Assert.Equal("spectra[0].nucleus", violation.Field);
        Assert.StartsWith("'77Se' is not a supported nucleus", violation.Description, StringComparison.Ordinal);
    }

    [Fact]
    public async Task CheckEntry_JsonPortUnknownNucleus_BodyHoldsTheSameBadRequest()
    {
        await using var host = await RunningHost.StartAsync(Rules);
        using var http = new HttpClient { BaseAddress = host.HttpAddress, Timeout = CallTimeout };

        using var reply = await http.PostAsync("/v1/entries:check",
            new StringContent(JsonFormatter.Default.Format(Requests.UnknownNucleus("AIS-LQ-B002")), Encoding.UTF8, "application/json"));

        Assert.Equal(HttpStatusCode.BadRequest, reply.StatusCode);
        using var body = JsonDocument.Parse(await reply.Content.ReadAsStringAsync());
        Assert.Equal(3, body.RootElement.GetProperty("code").GetInt32());
        var detail = Assert.Single(body.RootElement.GetProperty("details").EnumerateArray());
        Assert.Equal("type.googleapis.com/google.rpc.BadRequest", detail.GetProperty("@type").GetString());
        var violation = Assert.Single(detail.GetProperty("fieldViolations").EnumerateArray());
        Assert.Equal("spectra[0].nucleus", violation.GetProperty("field").GetString());
    }

    /// <summary>The field violations of the BadRequest details in an error's grpc-status-details-bin trailer.</summary>
    internal static IReadOnlyList<BadRequest.Types.FieldViolation> Violations(RpcException error)
    {
        var bytes = error.Trailers.GetValueBytes("grpc-status-details-bin") ?? throw new InvalidOperationException("no grpc-status-details-bin trailer");
        var status = Google.Rpc.Status.Parser.ParseFrom(bytes);
        return [.. status.Details.Where(d => d.Is(BadRequest.Descriptor)).SelectMany(d => d.Unpack<BadRequest>().FieldViolations)];
    }
}
