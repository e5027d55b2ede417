using CommunityLead.Api.Auth;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Api.Infrastructure.OpenApi;
using CommunityLead.Rules.Households;

namespace CommunityLead.Api.Features.Letters;

public sealed record LetterSentRequest(int? LetterId);

public sealed record LetterListing(int Id, string KitCode, LetterKind Kind, LetterLanguage Language, string ProfileId, int ProfileVersion,
    string Sha256, int Pages, DateTime IssuedAt, DateTime? SentAt, int? DaysFromCollection, string? CatalogVersion, string? ReleasedBy,
    DateTime? ReleasedAt);

public static class LetterEndpoints
{
    // GET  /api/kits/{code}/letter[?lang=es]   the letter for the current interpretation (PDF; a   coordinator
    //                                          preview while urgent/implausible items are open)
    // GET  /api/kits/{code}/letter/words       its words as it would be printed now, held or not;   coordinator
    //                                          nothing recorded (a held letter's in-page preview)
    // POST /api/kits/{code}/letter/sent        confirm it went out: kit → letter-sent              coordinator
    // GET  /api/kits/{code}/letters            every letter issued for the kit                     coordinator
    // GET  /api/letters/{id}                   a stored letter, rendered again byte for byte       coordinator
    // GET  /api/letters/{id}/words             its words as the household's result page shows them   coordinator
    // POST /api/letters/batch[?combined=true]  ZIP of every kit ready for a letter (held kits       coordinator
    //                                          listed in the manifest, without a PDF)
    public static void MapLetters(this IEndpointRouteBuilder app)
    {
        var kit = app.MapGroup("/api/kits/{code}").WithTags("Letters")
            .RequireAuthorization(Policies.Coordinator).AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden)
            .ProducesProblem(StatusCodes.Status404NotFound);
        kit.MapGet("/letter", LetterHandlers.Get).WithName("getKitLetter")
            .WithSummary("The letter for the kit's current interpretation (a preview while urgent items are open)")
            .Produces(StatusCodes.Status200OK, contentType: "application/pdf").ProducesProblem(StatusCodes.Status409Conflict)
            .WithQuery<CommunityLead.Rules.Households.LetterLanguage>("lang", "The letter's language; the household's own by default")
            .WithResponseHeader(StatusCodes.Status200OK, "X-Letter-Id", "The issued letter's id, to confirm it was sent");
        kit.MapGet("/letter/words", LetterDraftWords.Get).WithName("getKitLetterWords")
            .WithSummary("The words of the kit's letter as it would be printed now, also while it is held (nothing is recorded)")
            .ProducesProblem(StatusCodes.Status409Conflict)
            .WithQuery<CommunityLead.Rules.Households.LetterLanguage>("lang", "The letter's language; the household's own by default");
        kit.MapPost("/letter/sent", LetterHandlers.MarkSent).WithName("markLetterSent")
            .WithSummary("Confirm the letter went out: the kit moves to letter-sent").ProducesProblem(StatusCodes.Status409Conflict);
        kit.MapGet("/letters", LetterHandlers.List).WithName("listKitLetters").WithSummary("Every letter issued for the kit");

        var letters = app.MapGroup("/api/letters").WithTags("Letters")
            .RequireAuthorization(Policies.Coordinator).AddEndpointFilter<ValidationFilter>()
            .ProducesProblem(StatusCodes.Status401Unauthorized).ProducesProblem(StatusCodes.Status403Forbidden);
        letters.MapGet("/{id:int}", LetterHandlers.Rerender).WithName("getLetter")
            .WithSummary("A stored letter, rendered again byte for byte").Produces(StatusCodes.Status200OK, contentType: "application/pdf")
            .ProducesProblem(StatusCodes.Status404NotFound);
        letters.MapGet("/{id:int}/words", LetterHandlers.Words).WithName("getLetterWords")
            .WithSummary("A stored letter's words (facts, result table, sections), for a preview on the page")
            .ProducesProblem(StatusCodes.Status404NotFound);
        letters.MapPost("/batch", LetterBatch.Create).WithName("createLetterBatch")
            .WithSummary("A ZIP of every kit ready for a letter, with a manifest (held kits listed without a PDF)").Produces(StatusCodes.Status200OK, contentType: "application/zip")
            .RequireRateLimiting(RateLimitSetup.LetterBatches).ProducesProblem(StatusCodes.Status429TooManyRequests);
    }
}
