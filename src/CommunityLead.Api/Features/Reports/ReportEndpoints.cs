using System.Text;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Api.Infrastructure.OpenApi;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.Reports;

public static class ReportEndpoints
{
    // GET /api/reports/summary?from=&to=&kitKind=&areaCode=|waterSource=|ageBand=|serviceLine=&groupBy=&format=csv   health
    // GET /api/reports/summary/chart?chart=lead-bands|share-at-action-level&lang=es&(the same filters)      health
    //     the same summary drawn as SVG (SummaryChart)
    public static void MapReports(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/reports").WithTags("Reports")
            .RequireAuthorization(Policies.Health).AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden);
        group.MapGet("/summary", Summary).WithName("getSummary")
            .WithSummary("Counts and statistics by area, period, age band, service line, band or kit kind; small counts hidden")
            .Produces(StatusCodes.Status200OK, contentType: "text/csv").Produces<SummaryReport>(StatusCodes.Status200OK)
            .WithQuery<DateOnly>("from", "First day of one whole month, quarter or year, e.g. 2026-04-01 (with to)")
            .WithQuery<DateOnly>("to", "Last day of that month, quarter or year, e.g. 2026-06-30 (with from)")
            .WithQuery<ReportKitKind>("kitKind", "Water (the default) or soil: never counted together")
            .WithQuery<string>("areaCode", "Only this area (at most one of areaCode, waterSource, ageBand, serviceLine)")
            .WithQuery<CommunityLead.Rules.Households.WaterSource>("waterSource", "Only homes on this water source")
            .WithQuery<string>("ageBand", "Only homes of this age: before-1950, 1950-1985, 1986-and-later or unknown")
            .WithQuery<CommunityLead.Rules.Households.ServiceLineMaterial>("serviceLine", "Only homes with this service line")
            .WithQuery<SummaryGrouping>("groupBy", "What the rows are (area by default)")
            .WithQuery<string>("format", "json (default) or csv");
        group.MapGet("/summary/chart", Chart).WithName("getSummaryChart")
            .WithSummary("The summary drawn as SVG; hidden groups hatched, never drawn as zero")
            .Produces(StatusCodes.Status200OK, contentType: "image/svg+xml");
    }

    /// <summary>Aggregates only: no route of this group returns a row about one home.</summary>
    public static async Task<Results<Ok<SummaryReport>, ContentHttpResult, ValidationProblem>> Summary(
        HttpContext http, CommunityLeadDb db, ReportRelease release, ProgramCalendar calendar, IOptions<ReportOptions> options, CancellationToken ct)
    {
        var (request, errors) = SummaryRequest.Parse(http.Request.Query);
        if (request is null) return Problems.Fields(errors);
        // Decided over the whole store, once per version of it, so two calls (or two instances) never disagree on a cell.
        var tables = await release.TablesAsync(db, ct);
        var report = SummaryBuilder.Build(request, tables, options.Value, calendar.Zone.Id);
        return request.Csv
            ? TypedResults.Text(SummaryCsv.Write(report), "text/csv", Encoding.UTF8)
            : TypedResults.Ok(report);
    }

    public static async Task<Results<ContentHttpResult, ValidationProblem>> Chart(
        HttpContext http, CommunityLeadDb db, ReportRelease release, ProgramCalendar calendar, IOptions<ReportOptions> options, CancellationToken ct)
    {
        var chart = http.Request.Query["chart"].ToString();
        if (chart is not ("lead-bands" or "share-at-action-level"))
            return Problems.Field("chart", "Use chart=lead-bands or chart=share-at-action-level.");
        var (request, errors) = SummaryRequest.Parse(http.Request.Query);
        if (request is null) return Problems.Fields(errors);
        // The chart draws the same protected report as the table: a hidden cell stays hidden in both.
        var report = SummaryBuilder.Build(request, await release.TablesAsync(db, ct), options.Value, calendar.Zone.Id);
        var spanish = http.Request.Query["lang"] == "es";
        var svg = chart == "lead-bands" ? SummaryChart.LeadBands(report, spanish) : SummaryChart.ShareAtActionLevel(report, spanish);
        return TypedResults.Text(svg, "image/svg+xml", Encoding.UTF8);
    }
}
