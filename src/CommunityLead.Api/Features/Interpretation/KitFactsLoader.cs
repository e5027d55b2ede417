using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Sampling;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Interpretation;

/// <summary>
/// Gathers, for many kits at once (a batch can complete thousands), the plain facts the rules need: the
/// household's context, the bottles, the results in effect, and anything that makes the sample untrustworthy.
/// </summary>
public static class KitFactsLoader
{
    /// <param name="includeHeld">
    /// Only for the coordinator's provisional view: results of a batch held by QC, and a "QC held" reason. A stored
    /// interpretation (and so a letter) never uses held results, as the README promises.
    /// </param>
    public static async Task<Dictionary<int, KitFacts>> LoadAsync(CommunityLeadDb db, IReadOnlyCollection<int> kitIds, CancellationToken ct,
        bool includeHeld = false)
    {
        var kits = await db.Kits.AsNoTracking().Where(k => kitIds.Contains(k.Id))
            .Select(k => new
            {
                k.Id, k.Kind,
                Context = new HouseholdContext(k.Household!.ChildUnder6, k.Household.Pregnant, k.Household.WaterSource,
                    k.Household.ServiceLine, k.Household.YearBuilt, k.Household.FilterInUse),
            })
            .ToListAsync(ct);
        var current = db.Collections.Where(c => kitIds.Contains(c.KitId) && c.SupersededAtUtc == null);
        var samples = (await db.CurrentSamples(kitIds).ToListAsync(ct)).ToLookup(x => x.KitId, x => x.Sample);
        var invalidating = (await db.KitFlags.AsNoTracking()
                .Where(f => f.Severity == FlagSeverity.InvalidatesSample)
                .Join(current, f => f.CollectionId, c => c.Id, (f, c) => new { c.KitId, f.Code, f.Message })
                .ToListAsync(ct)).ToLookup(x => x.KitId);
        var results = (await db.LabResults.AsNoTracking()
                .Where(r => kitIds.Contains(r.KitId) && r.SupersededAtUtc == null)
                .Select(r => new { Result = r, r.Batch!.Status, r.Batch.BatchId })
                .ToListAsync(ct)).ToLookup(x => x.Result.KitId);
        var correctedAfterLetter = (await db.Attention.AsNoTracking()
            .Where(a => kitIds.Contains(a.KitId) && a.ResolvedAtUtc == null && a.Reason == AttentionFlag.CorrectedAfterLetter)
            .Select(a => a.KitId).ToListAsync(ct)).ToHashSet();

        var facts = new Dictionary<int, KitFacts>();
        foreach (var kit in kits)
        {
            var bottles = samples[kit.Id].ToDictionary(s => (s.Bottle, s.Position, s.Location));
            var validity = invalidating[kit.Id].Select(f => new ValidityIssue(
                f.Code == CollectionFlagCode.StandingTimeShort ? ValidityIssueCode.StandingTimeShort : ValidityIssueCode.CollectionInvalid,
                f.Message)).ToList();
            // Results in effect win; a held result is used only where nothing in effect covers that bottle and analyte.
            var inEffect = results[kit.Id].Where(r => r.Status != BatchStatus.Held).Select(r => r.Result).ToList();
            var covered = inEffect.Select(Key).ToHashSet();
            var held = includeHeld
                ? results[kit.Id].Where(r => r.Status == BatchStatus.Held && !covered.Contains(Key(r.Result))).ToList()
                : [];
            foreach (var batchId in held.Select(h => h.BatchId).Distinct())
                validity.Add(new(ValidityIssueCode.QcHeld, $"Batch {batchId} failed the lab's quality checks and is held."));
            if (inEffect.Concat(held.Select(h => h.Result)).Any(r => r.HoldingFlags is not null))
                validity.Add(new(ValidityIssueCode.OutsideHoldingTime, "A sample was analyzed or preserved later than its holding time allows."));
            var used = inEffect.Concat(held.Select(h => h.Result)).ToList();
            facts[kit.Id] = new KitFacts(kit.Kind, CollectedOn(samples[kit.Id]), kit.Context,
                [.. used.Select(r => new BottleResult(r.Bottle, r.Position, r.Location,
                    bottles.TryGetValue((r.Bottle, r.Position, r.Location), out var s) ? s.VolumeMl : null,
                    r.Analyte, r.Value, r.Qualifier == "<", r.ReportingLimit, r.Uncertainty, r.Qualifier == "J"))],
                validity, correctedAfterLetter.Contains(kit.Id));
        }
        return facts;
    }

    /// <summary>The household's own calendar day of the first bottle: levels are "in effect" by that date.</summary>
    private static DateOnly CollectedOn(IEnumerable<Sample> samples)
    {
        var first = samples.OrderBy(s => s.CollectedAtUtc).FirstOrDefault();
        return first is null ? DateOnly.MinValue : DateOnly.FromDateTime(first.CollectedAt.DateTime);
    }

    private static (BottleType, int?, SoilLocation?, Rules.LabResults.Analyte) Key(LabResult r) => (r.Bottle, r.Position, r.Location, r.Analyte);
}
