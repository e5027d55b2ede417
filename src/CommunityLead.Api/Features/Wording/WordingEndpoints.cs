using System.Text;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Infrastructure;
using Microsoft.AspNetCore.Http.HttpResults;

namespace CommunityLead.Api.Features.Wording;

public static class WordingEndpoints
{
    // GET /api/admin/messages[?format=json|csv]   every sentence a household can get, for review   admin
    public static void MapWording(this IEndpointRouteBuilder app)
    {
        var group = app.MapGroup("/api/admin").WithTags("Wording")
            .RequireAuthorization(Policies.Admin).AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden);
        group.MapGet("/messages", Export).WithName("exportWording")
            .WithSummary("Every sentence a household can be shown, for review (JSON or CSV)").Produces(StatusCodes.Status200OK, contentType: "text/csv");
    }

    /// <summary>Wording only: no household's data is in it, so the admin role may read it.</summary>
    public static Results<Ok<WordingExport>, ContentHttpResult, ValidationProblem> Export(string? format = null) =>
        WordingFormats.Parse(format) switch
        {
            WordingFormat.Json => TypedResults.Ok(WordingCatalogue.Export()),
            WordingFormat.Csv => TypedResults.Text(WordingCsv.Write(WordingCatalogue.Export()), "text/csv", Encoding.UTF8),
            _ => Problems.Field("format", WordingFormats.Problem),
        };
}

public enum WordingFormat { Json, Csv }

public static class WordingFormats
{
    public const string Problem = "Use json or csv.";

    /// <summary>json when not given; null for anything else.</summary>
    public static WordingFormat? Parse(string? format) =>
        format is null ? WordingFormat.Json : KebabEnum.TryParse<WordingFormat>(format, out var parsed) ? parsed : null;
}
