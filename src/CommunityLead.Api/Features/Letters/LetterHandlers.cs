using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Kits;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Letters;

public static class LetterHandlers
{
    public static async Task<Results<FileContentHttpResult, ValidationProblem, ProblemHttpResult>> Get(
        string code, CommunityLeadDb db, LetterIssuing issuing, HttpContext http, CancellationToken ct, string? lang = null)
    {
        if (!TryLanguage(lang, out var language)) return Problems.Field("lang", "Use en or es.");
        var (kit, invalid, missing) = await KitLookup.FindAsync(db, code, ct);
        if (invalid is not null) return invalid;
        if (kit is null) return missing!;
        if (!HasLetter(kit.State)) return NotReady(kit.Code, kit.State);
        var release = (await LetterRelease.ForAsync(db, [kit.Id], ct)).Of(kit.Id);
        if (!release.Released)
        {
            // Only a preview until a coordinator has checked the result and called: nothing is recorded.
            var preview = await issuing.PreviewAsync(kit.Id, language, ct);
            if (preview is null) return NotReady(kit.Code, kit.State);
            http.Response.Headers["X-Letter-Released"] = "false";
            http.Response.Headers["X-Letter-Awaiting-Attention"] = string.Join(",", release.Pending.Select(p => p.Id));
            return TypedResults.File(preview, "application/pdf", $"letter-{kit.Code}-preview.pdf");
        }
        var letter = (await issuing.IssueAsync([kit.Id], language, Actor.From(http.User), ct)).SingleOrDefault();
        if (letter is null) return NotReady(kit.Code, kit.State);
        http.Response.Headers["X-Letter-Released"] = "true";
        http.Response.Headers["X-Letter-Id"] = letter.Record.Id.ToString();
        http.Response.Headers["X-Letter-Sha256"] = letter.Record.Sha256;
        return TypedResults.File(letter.Pdf, "application/pdf", FileName(letter.Record));
    }

    /// <summary>Nothing is marked sent without this confirmation; it also records how long the household waited.</summary>
    public static async Task<Results<Ok<LetterListing>, ValidationProblem, ProblemHttpResult>> MarkSent(
        string code, LetterSentRequest? request, CommunityLeadDb db, TimeProvider clock, ProgramCalendar calendar, HttpContext http,
        CancellationToken ct)
    {
        var (kit, invalid, missing) = await KitLookup.FindAsync(db, code, ct);
        if (invalid is not null) return invalid;
        if (kit is null) return missing!;
        var release = (await LetterRelease.ForAsync(db, [kit.Id], ct)).Of(kit.Id);
        if (!release.Released) return LetterRelease.NotReleased(kit.Code, release);
        var current = await db.Interpretations.Where(i => i.KitId == kit.Id && i.SupersededAtUtc == null).Select(i => (int?)i.Id).SingleOrDefaultAsync(ct);
        var letter = await db.Letters
            .Where(l => l.KitId == kit.Id && (request == null || request.LetterId == null ? l.InterpretationId == current : l.Id == request.LetterId))
            .OrderByDescending(l => l.IssuedAtUtc).ThenByDescending(l => l.Id).FirstOrDefaultAsync(ct);
        if (letter is null)
            return TypedResults.Problem(statusCode: 409, title: "No letter to confirm.",
                detail: $"Render the letter for kit {kit.Code} first (GET /api/kits/{kit.Code}/letter), then confirm it was sent.");
        // An old letter must not close a corrected result, and a confirmed one keeps its first sending date.
        if (letter.InterpretationId != current)
            return TypedResults.Problem(statusCode: 409, title: "This letter is out of date.",
                detail: $"Letter {letter.Id} was written for an earlier interpretation of kit {kit.Code}. Render the current letter and confirm that one.");
        if (letter.SentAtUtc is not null)
            return TypedResults.Problem(statusCode: 409, title: "This letter was already confirmed as sent.",
                detail: $"Letter {letter.Id} was confirmed on {letter.SentAtUtc:yyyy-MM-dd} by {letter.SentBy}.");
        // A letter recorded before the gate existed, released since: it carries who released it.
        if (release.Needed && letter.ReleasedBy is null)
            (letter.ReleasedBy, letter.ReleasedAtUtc) = (release.ReleasedBy, release.ReleasedAtUtc);
        if (await ConfirmAsync(db, kit, letter, Actor.From(http.User), clock.GetUtcNow().UtcDateTime, calendar, ct) is { } illegal)
            return illegal;
        if (await KitTransitions.SaveAsync(db, kit.Code, ct) is { } conflict) return conflict;
        return TypedResults.Ok(Listing(letter));
    }

    /// <summary>Marks one issued letter sent: the kit moves to letter-sent, the wait is recorded, a corrected-result item closes.</summary>
    internal static async Task<ProblemHttpResult?> ConfirmAsync(CommunityLeadDb db, Kit kit, IssuedLetter letter, Actor actor, DateTime now,
        ProgramCalendar calendar, CancellationToken ct)
    {
        if (KitTransitions.Apply(db, kit, KitAction.SendLetter, actor, now,
                detail: $"letter {letter.Id} ({KebabEnum.Name(letter.Kind)}, {KebabEnum.Name(letter.Language)}), sha256 {letter.Sha256[..12]}") is { } illegal)
            return illegal;
        letter.SentAtUtc = now;
        letter.SentBy = actor.Label;
        // Both the household's local date: CollectedOn is the date the household wrote, the sending date the program's.
        letter.DaysFromCollection = calendar.DateOf(now).DayNumber - letter.CollectedOn.DayNumber;
        await db.Attention.Where(a => a.KitId == kit.Id && a.ResolvedAtUtc == null && a.Reason == AttentionFlag.CorrectedAfterLetter)
            .ForEachAsync(a => { a.ResolvedAtUtc = now; a.ResolvedBy = actor.Label; a.ResolutionNote = $"Corrected letter {letter.Id} sent."; }, ct);
        return null;
    }

    public static async Task<Results<Ok<List<LetterListing>>, ValidationProblem, ProblemHttpResult>> List(
        string code, CommunityLeadDb db, CancellationToken ct)
    {
        var (kit, invalid, missing) = await KitLookup.FindAsync(db, code, ct);
        if (invalid is not null) return invalid;
        if (kit is null) return missing!;
        var letters = await db.Letters.AsNoTracking().Where(l => l.KitId == kit.Id).OrderBy(l => l.Id).ToListAsync(ct);
        return TypedResults.Ok(letters.Select(Listing).ToList());
    }

    public static async Task<Results<FileContentHttpResult, ProblemHttpResult>> Rerender(
        int id, CommunityLeadDb db, LetterIssuing issuing, HttpContext http, CancellationToken ct)
    {
        var letter = await db.Letters.AsNoTracking().SingleOrDefaultAsync(l => l.Id == id, ct);
        if (letter is null) return TypedResults.Problem(statusCode: 404, title: "No such letter.");
        var pdf = issuing.Rerender(letter);
        var same = Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(pdf)) == letter.Sha256;
        http.Response.Headers["X-Letter-Sha256"] = letter.Sha256;
        http.Response.Headers["X-Letter-Identical"] = same ? "true" : "false";
        return TypedResults.File(pdf, "application/pdf", FileName(letter));
    }

    /// <summary>A stored letter's words, for a preview on the page; the same the household's result page shows.</summary>
    public static async Task<Results<Ok<Features.Results.HouseholdResult>, ProblemHttpResult>> Words(
        int id, CommunityLeadDb db, LetterIssuing issuing, CancellationToken ct)
    {
        var letter = await db.Letters.AsNoTracking().SingleOrDefaultAsync(l => l.Id == id, ct);
        if (letter is null) return TypedResults.Problem(statusCode: 404, title: "No such letter.");
        return TypedResults.Ok(Features.Results.ResultLookup.Words(letter, issuing.Read(letter)));
    }

    /// <summary>A letter's language asked for by ?lang=; none asked: the household's own.</summary>
    internal static bool TryLanguage(string? lang, out LetterLanguage? language)
    {
        language = null;
        if (lang is null) return true;
        if (!KebabEnum.TryParse<LetterLanguage>(lang, out var parsed)) return false;
        language = parsed;
        return true;
    }

    internal static bool HasLetter(KitState state) => state is KitState.Interpreted or KitState.LetterSent or KitState.Closed;

    internal static ProblemHttpResult NotReady(string code, KitState state) =>
        TypedResults.Problem(statusCode: 409, title: "This kit has no interpretation for a letter yet.",
            detail: $"Kit {code} is {KebabEnum.Name(state)}; a letter is written once its results are in and interpreted.",
            extensions: new Dictionary<string, object?> { ["currentState"] = KebabEnum.Name(state) });

    internal static string FileName(IssuedLetter l) => $"letter-{l.KitCode}-{KebabEnum.Name(l.Language)}.pdf";

    private static LetterListing Listing(IssuedLetter l) =>
        new(l.Id, l.KitCode, l.Kind, l.Language, l.ProfileId, l.ProfileVersion, l.Sha256, l.Pages, l.IssuedAtUtc, l.SentAtUtc, l.DaysFromCollection,
            l.CatalogVersion, l.ReleasedBy, l.ReleasedAtUtc);
}
