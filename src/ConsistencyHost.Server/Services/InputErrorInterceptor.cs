using ConsistencyHost.Engine.Intake;
using Grpc.Core;
using Grpc.Core.Interceptors;

namespace ConsistencyHost.Server.Services;

/// <summary>
/// The one place where engine errors become gRPC status codes: unusable input is INVALID_ARGUMENT with the
/// field path in the message, in the "field" trailer and as a google.rpc.BadRequest in the status details
/// (<see cref="BadRequestStatus"/>). Nothing else is translated here; an unexpected exception stays INTERNAL
/// without details (EnableDetailedErrors is off).
/// </summary>
public sealed class InputErrorInterceptor : Interceptor
{
    /// <summary>Trailer that carries the offending field path for machine use.</summary>
    public const string FieldTrailer = BadRequestStatus.FieldTrailer;

    /// <inheritdoc />
    public override async Task<TResponse> UnaryServerHandler<TRequest, TResponse>(
        TRequest request, ServerCallContext context, UnaryServerMethod<TRequest, TResponse> continuation)
    {
        try
        {
            return await continuation(request, context);
        }
        catch (EntryInputException error)
        {
            throw BadRequestStatus.Exception(error.Field, error.Reason);
        }
    }
}
