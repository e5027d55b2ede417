using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Letters;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Kits;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Results;

/// <summary>What a household sees: the words of its latest letter, in the letter's language.</summary>
public sealed record HouseholdResult(
    string KitCode, LetterLanguage Language, string Title, IReadOnlyList<LabeledValue> Facts, ResultTable? Results,
    IReadOnlyList<LetterSection> Sections, string Closing, DateTime LetterIssuedAt);

/// <summary>
/// Finds a kit's latest issued letter by its code and secret. Only issued letters are shown (a letter held for a
/// coordinator's call is never issued), so the page never says more than the household's letter does.
/// </summary>
public static class ResultLookup
{
    public static async Task<Results<Ok<HouseholdResult>, ProblemHttpResult>> Result(
        ResultRequest request, HttpContext http, CommunityLeadDb db, LetterIssuing letters, ResultThrottle throttle, CancellationToken ct)
    {
        var (letter, refusal) = await FindAsync(request, http, db, throttle, ct);
        if (letter is null) return refusal!;
        return TypedResults.Ok(Words(letter, letters.Read(letter)));
    }

    /// <summary>The letter's words in the order the letter prints them; the coordinator's preview shows the same.</summary>
    public static HouseholdResult Words(IssuedLetter letter, LetterContent c) =>
        new(letter.KitCode, c.Language, c.Title, c.KitFacts, c.Results, Sections(c), c.Closing, letter.IssuedAtUtc);

    /// <summary>The letter's sections in the order it prints them (the scales and signature are the PDF's alone).</summary>
    public static IReadOnlyList<LetterSection> Sections(LetterContent c) => [c.Meaning, c.Steps, c.Cautions, c.WhoToCall];

    public static async Task<Results<FileContentHttpResult, ProblemHttpResult>> Letter(
        ResultRequest request, HttpContext http, CommunityLeadDb db, LetterIssuing letters, ResultThrottle throttle, CancellationToken ct)
    {
        var (letter, refusal) = await FindAsync(request, http, db, throttle, ct);
        if (letter is null) return refusal!;
        return TypedResults.File(letters.Rerender(letter), "application/pdf", $"letter-{letter.KitCode}.pdf");
    }

    private static async Task<(IssuedLetter? Letter, ProblemHttpResult? Refusal)> FindAsync(
        ResultRequest request, HttpContext http, CommunityLeadDb db, ResultThrottle throttle, CancellationToken ct)
    {
        var ip = http.Connection.RemoteIpAddress;
        var address = ip is null ? "unknown" : (ip.IsIPv4MappedToIPv6 ? ip.MapToIPv4() : ip).ToString();
        if (!throttle.TryTake(address))
        {
            http.Response.Headers.RetryAfter = ((int)throttle.Window.TotalSeconds).ToString();
            return (null, TypedResults.Problem(statusCode: StatusCodes.Status429TooManyRequests, title: "Too many tries.",
                detail: "Too many lookups came from this connection. Wait a while, then try again, or call the program."));
        }
        var parsed = KitCode.Parse(request.Code);
        var kit = parsed.IsValid
            ? await db.Kits.AsNoTracking().Where(k => k.Code == parsed.Code).Select(k => new { k.Id, k.ResultSecretHash }).SingleOrDefaultAsync(ct)
            : null;
        // The secret is checked even for an unknown code, so both take the same time and get the same answer.
        var matches = ResultSecrets.Matches(request.Secret!, kit?.ResultSecretHash);
        var letter = matches
            ? await db.Letters.AsNoTracking().Where(l => l.KitId == kit!.Id).OrderByDescending(l => l.IssuedAtUtc).ThenByDescending(l => l.Id)
                .FirstOrDefaultAsync(ct)
            : null;
        return letter is null ? (null, NoMatch()) : (letter, null);
    }

    private static ProblemHttpResult NoMatch() => TypedResults.Problem(statusCode: StatusCodes.Status404NotFound,
        title: "No result matches this kit code and secret code.",
        detail: "Check both codes on your letter. If your letter has not come yet, your result is not ready.");
}
