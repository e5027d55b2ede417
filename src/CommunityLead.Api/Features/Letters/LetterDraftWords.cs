using CommunityLead.Api.Data;
using CommunityLead.Api.Features.Kits;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Households;
using Microsoft.AspNetCore.Http.HttpResults;

namespace CommunityLead.Api.Features.Letters;

/// <summary>
/// A kit's letter as it would be printed now, in the words the household's result page uses. <see cref="Released"/>
/// false: the letter is held back (<see cref="LetterRelease"/>) until the attention items in
/// <see cref="AwaitingAttention"/> are resolved, so none may be mailed yet.
/// </summary>
public sealed record LetterDraft(
    string KitCode, LetterLanguage Language, bool Released, IReadOnlyList<int> AwaitingAttention, string Title,
    IReadOnlyList<LabeledValue> Facts, ResultTable? Results, IReadOnlyList<LetterSection> Sections, string Closing);

public static class LetterDraftWords
{
    /// <summary>
    /// A held letter is never issued, so it has no stored words (GET /api/letters/{id}/words) and its stamped PDF
    /// was all a coordinator could read; these are its words for the kit page. Recorded nowhere: printing it stays
    /// GET /api/kits/{code}/letter's work, behind the release gate.
    /// </summary>
    public static async Task<Results<Ok<LetterDraft>, ValidationProblem, ProblemHttpResult>> Get(
        string code, CommunityLeadDb db, LetterIssuing issuing, CancellationToken ct, string? lang = null)
    {
        if (!LetterHandlers.TryLanguage(lang, out var language)) return Problems.Field("lang", "Use en or es.");
        var (kit, invalid, missing) = await KitLookup.FindAsync(db, code, ct);
        if (invalid is not null) return invalid;
        if (kit is null) return missing!;
        if (!LetterHandlers.HasLetter(kit.State)) return LetterHandlers.NotReady(kit.Code, kit.State);
        var content = await issuing.ContentAsync(kit.Id, language, ct);
        if (content is null) return LetterHandlers.NotReady(kit.Code, kit.State);
        var release = (await LetterRelease.ForAsync(db, [kit.Id], ct)).Of(kit.Id);
        return TypedResults.Ok(new LetterDraft(kit.Code, content.Language, release.Released, [.. release.Pending.Select(p => p.Id)],
            content.Title, content.KitFacts, content.Results, Features.Results.ResultLookup.Sections(content), content.Closing));
    }
}
