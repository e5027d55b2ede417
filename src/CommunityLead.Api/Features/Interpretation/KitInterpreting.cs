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
/// A batch completes thousands of kits at once, so nothing here goes through the change tracker: the facts are read
/// in a few queries, the rules run in memory, and the rows are written in bulk (set-based updates, multi-row inserts,
/// <see cref="KitWrites"/> for the kits' moves and their version guard) inside the caller's transaction.
/// </summary>
public static class KitInterpreting
{
    /// <summary>Kit states from which a kit may be interpreted (analyzed, or interpreted again); a sent letter is not rewritten here.</summary>
    private static readonly KitState[] Interpretable = [.. Enum.GetValues<KitState>().Where(s => KitLifecycle.TryMove(s, KitAction.Interpret, out _))];

    /// <summary>Interprets and writes inside the caller's transaction; a kit changed meanwhile throws <see cref="DbUpdateConcurrencyException"/>.</summary>
    /// <param name="foundAt">The versions the caller found the kits at, when only those may be interpreted (the repair, a
    /// coordinator's request): a kit found at another one throws, as a tracked kit's save would.</param>
    public static async Task<IReadOnlyDictionary<int, KitOutcome>> InterpretAsync(CommunityLeadDb db, ProfileCatalog catalog,
        IReadOnlyCollection<int> kitIds, Actor actor, DateTime nowUtc, JsonSerializerOptions json, CancellationToken ct,
        IReadOnlyDictionary<int, int>? foundAt = null)
    {
        if (db.Database.CurrentTransaction is null)
            throw new InvalidOperationException("Interpreting writes in bulk inside the caller's transaction.");
        var wanted = kitIds.ToList();
        // Writing first: on SQLite a transaction that has read cannot then take the write lock once another writer
        // committed (it would fail at once instead of waiting); a write first waits its turn and sees the latest store.
        await db.Interpretations
            .Where(i => wanted.Contains(i.KitId) && i.SupersededAtUtc == null && db.Kits.Any(k => k.Id == i.KitId && Interpretable.Contains(k.State)))
            .ExecuteUpdateAsync(set => set.SetProperty(i => i.SupersededAtUtc, nowUtc), CancellationToken.None);
        await db.Attention
            .Where(a => wanted.Contains(a.KitId) && a.ResolvedAtUtc == null && a.Reason != AttentionFlag.CorrectedAfterLetter
                        && db.Kits.Any(k => k.Id == a.KitId && Interpretable.Contains(k.State)))
            .ExecuteUpdateAsync(set => set.SetProperty(a => a.ResolvedAtUtc, nowUtc).SetProperty(a => a.ResolvedBy, actor.Label)
                .SetProperty(a => a.ResolutionNote, "Replaced by a new interpretation."), CancellationToken.None);
        var kits = await db.Kits.AsNoTracking().Where(k => wanted.Contains(k.Id) && Interpretable.Contains(k.State)).ToListAsync(CancellationToken.None);
        if (foundAt is not null && kits.FirstOrDefault(k => foundAt.GetValueOrDefault(k.Id) != k.Version) is { } moved)
            throw new DbUpdateConcurrencyException($"Kit {moved.Code} was changed since it was found.");
        var outcomes = new Dictionary<int, KitOutcome>();
        // A chunk at a time, so a 50,000-kit batch never holds every kit's facts and stored outcome at once.
        foreach (var chunk in kits.Chunk(ChunkSize)) await InterpretChunkAsync(db, catalog, chunk, actor, nowUtc, json, outcomes);
        return outcomes;
    }

    private const int ChunkSize = 2_000;

    private static async Task InterpretChunkAsync(CommunityLeadDb db, ProfileCatalog catalog, IReadOnlyList<Kit> kits, Actor actor,
        DateTime nowUtc, JsonSerializerOptions json, Dictionary<int, KitOutcome> outcomes)
    {
        var facts = await KitFactsLoader.LoadAsync(db, [.. kits.Select(k => k.Id)], CancellationToken.None);
        var stored = new List<KitInterpretation>();
        var raised = new List<AttentionItem>();
        var writes = new KitWrites();
        var judged = Judge(catalog, kits, facts, json);
        for (var i = 0; i < kits.Count; i++)
        {
            var kit = writes.Track(kits[i]);
            var (profile, outcome, outcomeJson) = judged[i];
            outcomes[kit.Id] = outcome;
            stored.Add(new KitInterpretation
            {
                KitId = kit.Id, KitCode = kit.Code, Band = outcome.Band, ProfileId = profile.Id, ProfileVersion = profile.Version,
                OutcomeJson = outcomeJson, CreatedAtUtc = nowUtc, CreatedBy = actor.Label,
            });
            (kit.Band, kit.LeadBand, kit.CopperBand) = (outcome.Band, BandOf(outcome, Analyte.Lead), BandOf(outcome, Analyte.Copper));
            KitTransitions.Apply(kit, KitAction.Interpret, actor, nowUtc, writes.Record,
                detail: $"band {KebabEnum.Name(outcome.Band)}, profile {profile.Id} v{profile.Version}");
            foreach (var flag in outcome.Flags.Where(f => f != AttentionFlag.CorrectedAfterLetter))
                raised.Add(AttentionItem.Raise(kit.Id, kit.Code, flag, AttentionText.For(flag, outcome), nowUtc));
        }

        await BulkInsert.InsertAsync(db, stored);
        if (raised.Count > 0)
        {
            // The new interpretations' keys, by kit (each kit has one current interpretation), for the items they raise.
            var ids = kits.Select(k => k.Id).ToList();
            var interpretationOf = await db.Interpretations.AsNoTracking().Where(i => ids.Contains(i.KitId) && i.SupersededAtUtc == null)
                .Select(i => new { i.KitId, i.Id }).ToDictionaryAsync(i => i.KitId, i => i.Id, CancellationToken.None);
            foreach (var item in raised) item.InterpretationId = interpretationOf[item.KitId];
            writes.Attention.AddRange(raised);
        }
        await writes.FlushAsync(db);
    }

    /// <summary>
    /// Runs the rules and writes each outcome's JSON. Both are pure and each kit's are its own, and on a large batch they
    /// were half of interpretation's time: a chunk of many kits is shared among the cores. A few kits (a coordinator's
    /// request, a small batch) are done on the request's own thread.
    /// </summary>
    private static (RuleProfile Profile, KitOutcome Outcome, string Json)[] Judge(ProfileCatalog catalog, IReadOnlyList<Kit> kits,
        IReadOnlyDictionary<int, KitFacts> facts, JsonSerializerOptions json)
    {
        var judged = new (RuleProfile, KitOutcome, string)[kits.Count];
        void One(int i)
        {
            var profile = catalog.For(kits[i].Kind);
            var outcome = Interpreter.Interpret(facts[kits[i].Id], profile, catalog.ProgramRules);
            judged[i] = (profile, outcome, JsonSerializer.Serialize(outcome, json));
        }
        if (kits.Count < 64) for (var i = 0; i < kits.Count; i++) One(i);
        // One worker per core at most: more are no faster, and would hold pool threads that requests arriving meanwhile
        // (kit reads) need.
        else Parallel.For(0, kits.Count, new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount }, One);
        return judged;
    }

    /// <summary>
    /// <see cref="InterpretAsync"/> in a transaction of its own, committed (the repair sweep, a coordinator's request to
    /// interpret again), for kits at the versions they were found at. Nothing is written when a kit changed meanwhile:
    /// the <see cref="DbUpdateConcurrencyException"/> is thrown.
    /// </summary>
    public static async Task<IReadOnlyDictionary<int, KitOutcome>> InterpretAndCommitAsync(CommunityLeadDb db, ProfileCatalog catalog,
        IReadOnlyDictionary<int, int> foundAt, Actor actor, DateTime nowUtc, JsonSerializerOptions json, CancellationToken ct)
    {
        await using var transaction = await db.Database.BeginTransactionAsync(ct);
        var outcomes = await InterpretAsync(db, catalog, [.. foundAt.Keys], actor, nowUtc, json, ct, foundAt);
        await transaction.CommitAsync(CancellationToken.None);
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
