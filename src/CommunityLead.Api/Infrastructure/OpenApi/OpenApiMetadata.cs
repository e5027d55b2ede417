namespace CommunityLead.Api.Infrastructure.OpenApi;

/// <summary>A header an operation reads or answers with, put in the API description by <see cref="OperationDetails"/>.</summary>
public sealed record DocumentedHeader(string Name, string Description, int? ResponseStatus);

/// <summary>A query parameter the handler reads itself (to name a bad value in its own words), for the API description.</summary>
public sealed record DocumentedQuery(string Name, Type Type, string Description);

public static class OpenApiMetadata
{
    public const string ProblemJson = "application/problem+json";

    public static RouteHandlerBuilder WithRequestHeader(this RouteHandlerBuilder builder, string name, string description) =>
        builder.WithMetadata(new DocumentedHeader(name, description, null));

    public static RouteHandlerBuilder WithResponseHeader(this RouteHandlerBuilder builder, int status, string name, string description) =>
        builder.WithMetadata(new DocumentedHeader(name, description, status));

    public static RouteHandlerBuilder WithQuery<T>(this RouteHandlerBuilder builder, string name, string description) =>
        builder.WithMetadata(new DocumentedQuery(name, typeof(T), description));

    /// <summary>A move of a kit's lifecycle: the kit may not exist (404) or its state may not allow the move (409).</summary>
    public static RouteHandlerBuilder KitMove(this RouteHandlerBuilder builder) =>
        builder.ProducesProblem(StatusCodes.Status404NotFound)
            .Produces<KitStateProblem>(StatusCodes.Status409Conflict, ProblemJson);
}
