using Google.Protobuf;
using Google.Protobuf.Reflection;
using Google.Protobuf.WellKnownTypes;
using Google.Rpc;
using Grpc.Core;

namespace ConsistencyHost.Server.Services;

/// <summary>
/// An INVALID_ARGUMENT error in the standard rich form (googleapis google/rpc/error_details.proto): a
/// google.rpc.Status whose details hold a google.rpc.BadRequest with one field violation per offending field.
/// On gRPC it travels in the <c>grpc-status-details-bin</c> trailer (the gRPC error model, read by e.g.
/// Grpc.StatusProto's GetRpcStatus or grpcio-status), beside the plain <c>field</c> trailer; on the JSON port it is
/// the response body.
/// </summary>
public static class BadRequestStatus
{
    /// <summary>The trailer the gRPC error model defines for the serialised google.rpc.Status.</summary>
    public const string DetailsTrailer = "grpc-status-details-bin";

    /// <summary>Trailer that carries the offending field path for machine use (the older, plain form).</summary>
    public const string FieldTrailer = "field";

    /// <summary>The detail types the host puts into a status, for JSON formatting of its Any values.</summary>
    public static TypeRegistry DetailTypes { get; } = TypeRegistry.FromMessages(BadRequest.Descriptor);

    private static readonly JsonFormatter Json = new(JsonFormatter.Settings.Default.WithTypeRegistry(DetailTypes));

    /// <summary>The status for one offending field; the message reads "field: reason".</summary>
    public static Google.Rpc.Status For(string field, string reason)
    {
        var details = new BadRequest();
        details.FieldViolations.Add(new BadRequest.Types.FieldViolation { Field = field, Description = reason });
        return new Google.Rpc.Status
        {
            Code = (int)Code.InvalidArgument,
            Message = $"{field}: {reason}",
            Details = { Any.Pack(details) },
        };
    }

    /// <summary>The gRPC exception for one offending field, with both trailers.</summary>
    public static RpcException Exception(string field, string reason)
    {
        var status = For(field, reason);
        return new RpcException(new Grpc.Core.Status(StatusCode.InvalidArgument, status.Message), Trailers(status, field));
    }

    /// <summary>The two trailers of an INVALID_ARGUMENT error: the field path and the rich status.</summary>
    public static Metadata Trailers(Google.Rpc.Status status, string field) => new()
    {
        { FieldTrailer, field },
        { DetailsTrailer, status.ToByteArray() },
    };

    /// <summary>The status in its proto JSON mapping, as the JSON port answers errors.</summary>
    public static string ToJson(Google.Rpc.Status status) => Json.Format(status);
}
