using CommunityLead.Api.Auth;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Api.Infrastructure.OpenApi;

namespace CommunityLead.Api.Features.LabResults;

public static class LabResultEndpoints
{
    // POST /api/lab/batches                      a batch, JSON or CSV                   lab
    // GET  /api/lab/batches?status=              batches, newest first                  lab, coordinator
    // GET  /api/lab/batches/{batchId}            latest version, verdict, results       lab, coordinator
    // GET  /api/lab/batches/{batchId}/qc-report  the run's QC report, PDF               lab, coordinator
    // POST /api/lab/batches/{batchId}/release    put a held batch into effect           coordinator
    // POST /api/lab/mdl                          method detection limit                 lab, coordinator
    public static void MapLabResults(this IEndpointRouteBuilder app)
    {
        var lab = app.MapGroup("/api/lab").WithTags("Lab results").AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden);

        lab.MapGroup("").RequireAuthorization(Policies.Lab)
            .MapPost("/batches", BatchIntake.Post).WithName("postLabBatch")
            .WithSummary("Post a batch of results and QC (JSON, or CSV with the batch's fields in the query)")
            .WithQuery<string>("batchId", "CSV only: the lab's id for the batch (JSON: in the body)")
            .WithQuery<string>("method", "CSV only: the analytical method, e.g. EPA 200.8")
            .WithQuery<DateTimeOffset>("analyzedAt", "CSV only: when the batch was analysed, with its offset")
            .WithQuery<bool>("correction", "CSV only: true to replace a batch already posted")
            .WithQuery<string>("correctionReason", "CSV only: why, required with correction=true")
            .RequireRateLimiting(RateLimitSetup.LabBatches).ProducesProblem(StatusCodes.Status429TooManyRequests)
            .Accepts<BatchRequest>("application/json", "text/csv")
            .ProducesProblem(StatusCodes.Status409Conflict).ProducesProblem(StatusCodes.Status413PayloadTooLarge)
            .ProducesProblem(StatusCodes.Status415UnsupportedMediaType)
            .Produces<BatchRefusedProblem>(StatusCodes.Status422UnprocessableEntity, OpenApiMetadata.ProblemJson);

        var readers = lab.MapGroup("").RequireAuthorization(Policies.LabReader);
        readers.MapGet("/batches", BatchQueries.List).WithName("listLabBatches").WithSummary("Batches, newest first")
            .WithQuery<Data.Entities.BatchStatus>("status", "Only batches with this verdict");
        readers.MapGet("/batches/{batchId}", BatchQueries.Get).WithName("getLabBatch")
            .WithSummary("A batch's latest version: verdict, every QC figure and the results").ProducesProblem(StatusCodes.Status404NotFound);
        readers.MapGet("/batches/{batchId}/qc-report", QcReport.QcReports.Get).WithName("getLabBatchQcReport")
            .WithSummary("The latest version's QC report: calibration and residual plots, run-order charts, every figure with its verdict (PDF)")
            .Produces(StatusCodes.Status200OK, contentType: "application/pdf").ProducesProblem(StatusCodes.Status404NotFound);
        readers.MapPost("/mdl", DetectionLimitCalculation.Calculate).WithName("calculateMdl")
            .WithSummary("Method detection limit from replicate spiked samples (40 CFR 136 App. B)").ProducesValidationProblem();

        lab.MapGroup("").RequireAuthorization(Policies.Coordinator)
            .MapPost("/batches/{batchId}/release", BatchReleasing.Release).WithName("releaseLabBatch")
            .WithSummary("Put a held batch into effect, with the coordinator's reason")
            .ProducesProblem(StatusCodes.Status404NotFound).ProducesProblem(StatusCodes.Status409Conflict);
    }
}
