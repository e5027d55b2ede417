using System.Security.Cryptography;
using System.Text.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Api.Features.Letters.Composing;
using CommunityLead.Api.Features.Wording;
using CommunityLead.Api.Features.Letters.Layout;
using CommunityLead.Api.Features.Operations;
using CommunityLead.Api.Features.Results;
using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;
using KitOutcome = CommunityLead.Rules.Interpretation.Interpretation;

namespace CommunityLead.Api.Features.Letters;

public sealed record RenderedLetter(IssuedLetter Record, byte[] Pdf);

/// <summary>
/// Composes and renders letters from kits' stored interpretations and records each one issued (content,
/// hash, interpretation and profile version, language, and who released it if it needed a person first).
/// Works on many kits at once for a mailing.
/// </summary>
public sealed class LetterIssuing(CommunityLeadDb db, ProfileCatalog catalog, ILetterLayout layout, LetterSettings settings,
    IOptions<JsonOptions> json, TimeProvider clock, ProgramCalendar calendar, ResultSecrets secrets)
{
    private JsonSerializerOptions Json => json.Value.SerializerOptions;

    /// <summary>
    /// Letters for the given kits; kits without a stored interpretation are skipped, and so are kits whose letter is
    /// still held back (<see cref="LetterRelease"/>): those have only a preview.
    /// </summary>
    public async Task<List<RenderedLetter>> IssueAsync(IReadOnlyCollection<int> kitIds, LetterLanguage? language, Actor actor, CancellationToken ct)
    {
        for (var attempt = 1; ; attempt++)
        {
            try
            {
                return await IssueOnceAsync(kitIds, language, actor, ct);
            }
            catch (DbUpdateException e) when (StoreErrors.IsLostRace(e) && attempt < 3)
            {
                // Another request (or instance) recorded the same letter a moment ago: the unique index kept one
                // record; issuing again finds and returns it. Only our unsaved letter records are dropped, not
                // whatever else the caller is tracking.
                foreach (var added in db.ChangeTracker.Entries<IssuedLetter>().Where(x => x.State == EntityState.Added).ToList())
                    added.State = EntityState.Detached;
            }
        }
    }

    private async Task<List<RenderedLetter>> IssueOnceAsync(IReadOnlyCollection<int> kitIds, LetterLanguage? language, Actor actor, CancellationToken ct)
    {
        var releases = await LetterRelease.ForAsync(db, kitIds, ct);
        // A letter still held back is not issued: nothing is recorded that could be confirmed as sent.
        var drafts = (await DraftAsync(kitIds, language, ct)).Where(d => releases.Of(d.KitId).Released).ToList();
        var files = RenderAll(drafts, ct);
        var draftKits = drafts.Select(d => d.KitId).ToList();
        // One query for the letters already on record, not one per letter.
        var onRecord = (await db.Letters.Where(l => draftKits.Contains(l.KitId)).ToListAsync(ct))
            .ToLookup(l => (l.KitId, l.Sha256, l.InterpretationId));
        var now = clock.GetUtcNow().UtcDateTime;
        var letters = new List<RenderedLetter>(drafts.Count);
        var newlyIssued = 0;
        for (var i = 0; i < drafts.Count; i++)
        {
            var (draft, file) = (drafts[i], files[i]);
            var stored = draft.Stored;
            var record = onRecord[(draft.KitId, file.Sha256, stored.Id)].FirstOrDefault();
            if (record is null)
            {
                newlyIssued++;
                record = new IssuedLetter
                {
                    KitId = draft.KitId, KitCode = draft.KitCode, InterpretationId = stored.Id, ProfileId = stored.ProfileId,
                    ProfileVersion = stored.ProfileVersion, Language = draft.Language, Kind = draft.Kind,
                    ContentJson = file.ContentJson, Sha256 = file.Sha256, Pages = file.Pages,
                    IssuedAtUtc = now, IssuedBy = actor.Label, CollectedOn = draft.CollectedOn, CatalogVersion = WordingCatalogue.Version,
                };
                db.Letters.Add(record);
            }
            // Recorded before the gate existed (or issued again): it carries its release from now on.
            var release = releases.Of(draft.KitId);
            if (release.Needed && record.ReleasedBy is null)
                (record.ReleasedBy, record.ReleasedAtUtc) = (release.ReleasedBy, release.ReleasedAtUtc);
            letters.Add(new RenderedLetter(record, file.Pdf));
        }
        await db.SaveChangesAsync(ct);
        // The secret printed on these letters is what the household result page checks, by its hash only.
        foreach (var draft in drafts.Where(d => d.Content.OnlineLine is not null))
        {
            var hash = ResultSecrets.Hash(secrets.For(draft.KitCode));
            await db.Kits.Where(k => k.Id == draft.KitId && k.ResultSecretHash != hash)
                .ExecuteUpdateAsync(k => k.SetProperty(x => x.ResultSecretHash, hash), ct);
        }
        ServiceMetrics.LettersIssued(newlyIssued);
        return letters;
    }

    private sealed record LetterFile(byte[] Pdf, int Pages, string Sha256, string ContentJson);

    /// <summary>
    /// Renders on every core: a mailing is hundreds of letters, each pure work on its own content (the layout is
    /// thread-safe and gives the same bytes for the same content whichever thread draws it). Order is kept. One worker per
    /// core at most: the pool starts more threads at once than there are cores (ThreadPoolMinThreads), and more workers
    /// than cores draw no faster.
    /// </summary>
    private LetterFile[] RenderAll(List<Draft> drafts, CancellationToken ct)
    {
        var files = new LetterFile[drafts.Count];
        Parallel.For(0, drafts.Count, new ParallelOptions { CancellationToken = ct, MaxDegreeOfParallelism = Environment.ProcessorCount }, i =>
        {
            var pdf = layout.Render(drafts[i].Content, out var pages);
            files[i] = new LetterFile(pdf, pages, Convert.ToHexStringLower(SHA256.HashData(pdf)),
                JsonSerializer.Serialize(drafts[i].Content, Json));
        });
        return files;
    }

    /// <summary>
    /// The kit's letter as it would go out, marked as a preview on every page; recorded nowhere. Null when the kit
    /// has no stored interpretation.
    /// </summary>
    public async Task<byte[]?> PreviewAsync(int kitId, LetterLanguage? language, CancellationToken ct)
    {
        var content = await ContentAsync(kitId, language, ct);
        return content is null ? null
            : PreviewStamp.Apply(layout.Render(content), PreviewWords.For(content.Language), PreviewWords.Watermark(content.Language));
    }

    /// <summary>The kit's letter as it would go out now, worded but neither rendered nor recorded; null as for a preview.</summary>
    public async Task<LetterContent?> ContentAsync(int kitId, LetterLanguage? language, CancellationToken ct) =>
        (await DraftAsync([kitId], language, ct)).SingleOrDefault()?.Content;

    private sealed record Draft(int KitId, string KitCode, KitInterpretation Stored, LetterLanguage Language, LetterKind Kind,
        DateOnly CollectedOn, LetterContent Content);

    /// <summary>Each kit's letter worded from its stored interpretation, in code order; kits without one are skipped.</summary>
    private async Task<List<Draft>> DraftAsync(IReadOnlyCollection<int> kitIds, LetterLanguage? language, CancellationToken ct)
    {
        var kits = await db.Kits.AsNoTracking().Where(k => kitIds.Contains(k.Id))
            .Select(k => new { k.Id, k.Code, k.Household }).ToListAsync(ct);
        var interpretations = await db.Interpretations.AsNoTracking()
            .Where(i => kitIds.Contains(i.KitId) && i.SupersededAtUtc == null).ToDictionaryAsync(i => i.KitId, ct);
        var collectedOn = (await db.CurrentSamples(kitIds)
                .Select(x => new { x.KitId, x.Sample.CollectedAt, x.Sample.CollectedAtUtc })
                .ToListAsync(ct))
            .GroupBy(x => x.KitId).ToDictionary(g => g.Key, g => DateOnly.FromDateTime(g.MinBy(x => x.CollectedAtUtc)!.CollectedAt.DateTime));
        var sentBefore = (await db.Letters.AsNoTracking().Where(l => kitIds.Contains(l.KitId) && l.SentAtUtc != null)
            .Select(l => l.KitId).Distinct().ToListAsync(ct)).ToHashSet();

        // Dated as the household reads the calendar, not by UTC (an evening letter in the Americas said tomorrow).
        var today = calendar.Today();
        var drafts = new List<Draft>();
        foreach (var kit in kits.OrderBy(k => k.Code, StringComparer.Ordinal))
        {
            if (!interpretations.TryGetValue(kit.Id, out var stored)) continue;
            var outcome = JsonSerializer.Deserialize<KitOutcome>(stored.OutcomeJson, Json)!;
            var household = kit.Household!;
            var lang = language ?? household.Language;
            var kind = outcome.Band == Band.Retest ? LetterKind.Retest
                : sentBefore.Contains(kit.Id) ? LetterKind.Corrected : LetterKind.Results;
            var profile = catalog.All.FirstOrDefault(p => p.Id == stored.ProfileId);
            var collected = collectedOn.GetValueOrDefault(kit.Id);
            // The scales show every level only if the profile is still the version the interpretation used.
            var levels = profile is not null && profile.Version == stored.ProfileVersion
                ? LetterLevels.For(profile, catalog.ProgramRules, collected) : null;
            var content = LetterComposer.Compose(outcome, profile?.NameIn(lang == LetterLanguage.Es) ?? stored.ProfileId,
                new LetterRecipient(household.Name, household.Address.Line1, household.Address.Line2, household.Address.City,
                    household.Address.Region, household.Address.PostalCode),
                lang, kind, kit.Code, collected, today, household.WaterSource == WaterSource.PrivateWell,
                household.ChildUnder6 || household.Pregnant, settings, levels);
            if (secrets.Enabled)
                content = content with
                {
                    OnlineLine = lang == LetterLanguage.Es ? LetterWords.Online(secrets.PageAddress!, kit.Code).Es : LetterWords.Online(secrets.PageAddress!, kit.Code).En,
                    ResultSecret = secrets.For(kit.Code),
                };
            drafts.Add(new Draft(kit.Id, kit.Code, stored, lang, kind, collected, content));
        }
        return drafts;
    }

    /// <summary>Renders a stored letter again from its recorded content; the bytes must match the recorded hash.</summary>
    public byte[] Rerender(IssuedLetter letter) => layout.Render(Read(letter));

    /// <summary>A stored letter's content, with the kit's secret put back when the letter prints one.</summary>
    public LetterContent Read(IssuedLetter letter)
    {
        var content = JsonSerializer.Deserialize<LetterContent>(letter.ContentJson, Json)!;
        return content.OnlineLine is null || !secrets.Enabled ? content : content with { ResultSecret = secrets.For(letter.KitCode) };
    }
}
