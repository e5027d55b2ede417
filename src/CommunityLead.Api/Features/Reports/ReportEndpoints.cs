using System.Text;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.Reports;

public static class ReportEndpoints
{
    // GET /api/reports/summary?from=&to=&kitKind=&areaCode=|waterSource=|ageBand=|serviceLine=&groupBy=&format=csv   health
    public static void MapReports(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/reports").WithTags("Reports")
            .RequireAuthorization(Policies.Health).AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden);
        group.MapGet("/summary", Summary).Produces(StatusCodes.Status200OK, contentType: "text/csv");
    }

    /// <summary>Aggregates only: no route of this group returns a row about one home.</summary>
    public static async Task<Results<Ok<SummaryReport>, ContentHttpResult, ValidationProblem>> Summary(
        HttpContext http, CommunityLeadDb db, IOptions<ReportOptions> options, CancellationToken ct)
    {
        var (request, errors) = SummaryRequest.Parse(http.Request.Query);
        if (request is null) return Problems.Fields(errors);
        // Decided over the whole store on every call, so two instances (or two calls) never disagree on a cell.
        var tables = SummaryTables.Protect(await ReportKits.LoadAsync(db, ct), options.Value);
        var report = SummaryBuilder.Build(request, tables, options.Value);
        return request.Csv
            ? TypedResults.Text(SummaryCsv.Write(report), "text/csv", Encoding.UTF8)
            : TypedResults.Ok(report);
    }
}
