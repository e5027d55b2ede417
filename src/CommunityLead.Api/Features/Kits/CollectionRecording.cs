using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Api.Features.LabResults;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.Sampling;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.Kits;

/// <summary>
/// Records the bottles as the household wrote them down. Problems the household could not see (too short
/// a standing time, a flushed bottle taken first…) become flags on the kit; the data is always kept.
/// </summary>
public static class CollectionRecording
{
    public static async Task<Results<Ok<KitResponse>, ValidationProblem, ProblemHttpResult>> Record(
        string code, CollectionRequest request, CommunityLeadDb db, TimeProvider clock, IOptions<SamplingLimits> limits,
        IOptions<LabIntakeOptions> intake, IOptions<JsonOptions> json, InterpretWithResults interpreting, HttpContext http, CancellationToken ct)
    {
        var (kit, invalid, missing) = await KitLookup.FindAsync(db, code, ct);
        if (invalid is not null) return invalid;
        if (kit is null) return missing!;
        var samples = request.Samples!;
        if (WrongBottles(kit.Kind, samples) is { Count: > 0 } wrong) return Problems.Fields(wrong);

        var now = clock.GetUtcNow();
        var checkedSamples = Review(kit.Kind, samples, now, limits.Value);
        var review = checkedSamples with { Flags = [.. checkedSamples.Flags, .. IssueDates.CollectedBeforeIssue(kit, samples)] };
        var actor = Actor.From(http.User);
        if (KitTransitions.Apply(db, kit, KitAction.RecordCollection, actor, now.UtcDateTime, detail: Describe(samples.Count, review)) is { } illegal)
            return illegal;

        await SupersedeAsync(db, kit.Id, now.UtcDateTime, ct);
        kit.CollectedAtUtc = samples.Min(s => s.CollectedAt!.Value.UtcDateTime);
        var collection = NewCollection(kit.Id, samples, review, now.UtcDateTime, actor.Label);
        db.Collections.Add(collection);
        var waiting = await WaitingResults.MatchAsync(db, kit, collection.Samples, intake.Value.Holding, json.Value.SerializerOptions,
            actor, now.UtcDateTime, ct);
        if (waiting.Errors.Count > 0) return Problems.Fields(waiting.Errors);
        if (!waiting.Completed) return await KitMoves.SaveAndReadAsync(db, kit.Code, actor, ct);
        try
        {
            // The results that waited for this form are interpreted in the same transaction, as at lab intake.
            await interpreting.SaveAsync([kit.Id], actor, now.UtcDateTime);
        }
        catch (DbUpdateException e) when (StoreErrors.IsLostRace(e))
        {
            return Problems.ChangedMeanwhile(kit.Code);
        }
        return TypedResults.Ok((await KitReader.ReadAsync(db, kit.Code, actor, ct))!);
    }

    /// <summary>A new recording supersedes the previous one; both stay in the database.</summary>
    internal static Task SupersedeAsync(CommunityLeadDb db, int kitId, DateTime nowUtc, CancellationToken ct) =>
        db.Collections.Where(c => c.KitId == kitId && c.SupersededAtUtc == null)
            .ForEachAsync(c => c.SupersededAtUtc = nowUtc, ct);

    internal static CollectionReview Review(KitKind kind, IReadOnlyList<SampleRequest> samples, DateTimeOffset recordedAt, SamplingLimits limits) =>
        CollectionCheck.Review(kind, [.. samples.Select(s => new SampleEntry(s.Bottle!.Value, s.Position, s.Location,
            s.CollectedAt!.Value, s.WaterLastUsedAt, s.FlushSeconds))], recordedAt, limits);

    internal static string Describe(int sampleCount, CollectionReview review) => review.Flags.Count == 0
        ? $"{sampleCount} samples, no flags"
        : $"{sampleCount} samples; flags: {string.Join(", ", review.Flags.Select(f => KebabEnum.Name(f.Code)).Distinct())}";

    internal static Collection NewCollection(int kitId, IReadOnlyList<SampleRequest> samples, CollectionReview review,
        DateTime recordedAtUtc, string recordedBy) => new()
    {
        KitId = kitId,
        RecordedAtUtc = recordedAtUtc,
        RecordedBy = recordedBy,
        Samples = [.. samples.Select((s, i) => new Sample
        {
            Index = i, Bottle = s.Bottle!.Value, Position = s.Position, Location = s.Location, VolumeMl = s.VolumeMl,
            CollectedAt = s.CollectedAt!.Value, CollectedAtUtc = s.CollectedAt.Value.UtcDateTime,
            WaterLastUsedAt = s.WaterLastUsedAt, FlushSeconds = s.FlushSeconds, Tap = s.Tap,
            TapNote = string.IsNullOrWhiteSpace(s.TapNote) ? null : s.TapNote.Trim(),
            StandingMinutes = review.StandingTimes[i] is { } t ? (int)Math.Round(t.TotalMinutes) : null,
        })],
        Flags = [.. review.Flags.Select(f => new KitFlag
        {
            Code = f.Code, Severity = f.Severity, SampleIndex = f.SampleIndex, Message = f.Message,
        })],
    };

    internal static Dictionary<string, string[]> WrongBottles(KitKind kind, IReadOnlyList<SampleRequest> samples)
    {
        var errors = new Dictionary<string, string[]>();
        for (var i = 0; i < samples.Count; i++)
            if (!Bottles.FitsKit(kind, samples[i].Bottle!.Value))
                errors[$"samples[{i}].bottle"] =
                    [$"A {KebabEnum.Name(kind)} kit has no {KebabEnum.Name(samples[i].Bottle!.Value)} bottle."];
        return errors;
    }
}
