using System.Text.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Kits;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using Microsoft.EntityFrameworkCore;
using KitOutcome = CommunityLead.Rules.Interpretation.Interpretation;

namespace CommunityLead.Api.Features.Interpretation;

/// <summary>
/// Interprets kits whose results are complete, stores each outcome with its profile version, moves the kit
/// to interpreted, and puts what needs a person on the attention list. The previous interpretation is
/// superseded (kept), and its open attention items are closed as replaced.
/// </summary>
public static class KitInterpreting
{
    public static async Task<IReadOnlyDictionary<int, KitOutcome>> InterpretAsync(CommunityLeadDb db, ProfileCatalog catalog,
        IReadOnlyCollection<int> kitIds, Actor actor, DateTime nowUtc, JsonSerializerOptions json, CancellationToken ct)
    {
        // Only kits whose state allows it (analyzed, or interpreted again); a sent letter is not rewritten here.
        var kits = (await db.Kits.Where(k => kitIds.Contains(k.Id)).ToListAsync(ct))
            .Where(k => KitLifecycle.TryMove(k.State, KitAction.Interpret, out _)).ToList();
        kitIds = [.. kits.Select(k => k.Id)];
        var facts = await KitFactsLoader.LoadAsync(db, kitIds, ct);
        var previous = await db.Interpretations.Where(i => kitIds.Contains(i.KitId) && i.SupersededAtUtc == null).ToListAsync(ct);
        foreach (var p in previous) p.SupersededAtUtc = nowUtc;
        var open = await db.Attention
            .Where(a => kitIds.Contains(a.KitId) && a.ResolvedAtUtc == null && a.Reason != AttentionFlag.CorrectedAfterLetter)
            .ToListAsync(ct);
        foreach (var item in open)
        {
            item.ResolvedAtUtc = nowUtc;
            item.ResolvedBy = actor.Label;
            item.ResolutionNote = "Replaced by a new interpretation.";
        }

        var outcomes = new Dictionary<int, KitOutcome>();
        foreach (var kit in kits)
        {
            var profile = catalog.For(kit.Kind);
            var outcome = Interpreter.Interpret(facts[kit.Id], profile, catalog.ProgramRules);
            outcomes[kit.Id] = outcome;
            var stored = new KitInterpretation
            {
                KitId = kit.Id, KitCode = kit.Code, Band = outcome.Band, ProfileId = profile.Id, ProfileVersion = profile.Version,
                OutcomeJson = JsonSerializer.Serialize(outcome, json), CreatedAtUtc = nowUtc, CreatedBy = actor.Label,
            };
            db.Interpretations.Add(stored);
            (kit.Band, kit.LeadBand, kit.CopperBand) = (outcome.Band, BandOf(outcome, Analyte.Lead), BandOf(outcome, Analyte.Copper));
            KitTransitions.Apply(db, kit, KitAction.Interpret, actor, nowUtc,
                detail: $"band {KebabEnum.Name(outcome.Band)}, profile {profile.Id} v{profile.Version}");
            foreach (var flag in outcome.Flags.Where(f => f != AttentionFlag.CorrectedAfterLetter))
                db.Attention.Add(AttentionItem.Raise(kit.Id, kit.Code, flag, AttentionText.For(flag, outcome), nowUtc, stored));
        }
        return outcomes;
    }

    /// <summary>An analyte's band for the reports: retest for the whole kit, else its most serious finding; null if not measured.</summary>
    private static Band? BandOf(KitOutcome outcome, Analyte analyte)
    {
        var findings = outcome.Findings.Where(f => f.Analyte == analyte).ToList();
        if (findings.Count == 0) return null;
        return outcome.Band == Band.Retest ? Band.Retest : findings.Max(f => f.Band);
    }
}
