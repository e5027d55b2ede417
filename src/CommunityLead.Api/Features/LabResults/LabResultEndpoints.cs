using CommunityLead.Api.Auth;
using CommunityLead.Api.Infrastructure;

namespace CommunityLead.Api.Features.LabResults;

public static class LabResultEndpoints
{
    // POST /api/lab/batches                      a batch, JSON or CSV                   lab
    // GET  /api/lab/batches?status=              batches, newest first                  lab, coordinator
    // GET  /api/lab/batches/{batchId}            latest version, verdict, results       lab, coordinator
    // POST /api/lab/batches/{batchId}/release    put a held batch into effect           coordinator
    // POST /api/lab/mdl                          method detection limit                 lab, coordinator
    public static void MapLabResults(this IEndpointRouteBuilder app)
    {
        var lab = app.MapGroup("/api/lab").WithTags("Lab results").AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden);

        lab.MapGroup("").RequireAuthorization(Policies.Lab)
            .MapPost("/batches", BatchIntake.Post)
            .RequireRateLimiting(RateLimitSetup.LabBatches).ProducesProblem(StatusCodes.Status429TooManyRequests)
            .Accepts<BatchRequest>("application/json", "text/csv")
            .ProducesProblem(StatusCodes.Status409Conflict).ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType).ProducesProblem(StatusCodes.Status422UnprocessableEntity);

        var readers = lab.MapGroup("").RequireAuthorization(Policies.LabReader);
        readers.MapGet("/batches", BatchQueries.List);
        readers.MapGet("/batches/{batchId}", BatchQueries.Get).ProducesProblem(StatusCodes.Status404NotFound);
        readers.MapPost("/mdl", DetectionLimitCalculation.Calculate);

        lab.MapGroup("").RequireAuthorization(Policies.Coordinator)
            .MapPost("/batches/{batchId}/release", BatchReleasing.Release)
            .ProducesProblem(StatusCodes.Status404NotFound).ProducesProblem(StatusCodes.Status409Conflict);
    }
}
