using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// Every check a batch must pass before anything is written. It collects all problems rather than stopping at
/// the first, so the lab can fix its file in one go.
/// </summary>
public sealed class BatchChecker(CommunityLeadDb db, LabIntakeOptions options, TimeProvider clock)
{
    /// <summary>Kit states in which results are taken: the kit reached the lab and is not closed or void.</summary>
    public static readonly KitState[] AcceptingStates = [KitState.Received, KitState.Analyzed, KitState.Interpreted, KitState.LetterSent];

    public async Task<(CheckedBatch? Batch, List<BatchProblem> Problems)> CheckAsync(ParsedBatch parsed, CancellationToken ct)
    {
        var problems = new List<BatchProblem>(parsed.Problems);
        var request = parsed.Request;
        CheckHeader(request, problems);
        var rows = request.Results ?? [];
        if (rows.Count == 0) problems.Add(new("", "results", "A batch needs at least one result."));

        var codes = rows.Select(r => KitCode.Parse(r.KitCode)).ToList();
        var wanted = codes.Where(c => c.IsValid).Select(c => c.Code!).Distinct().ToList();
        var kits = await db.Kits.AsNoTracking().Where(k => wanted.Contains(k.Code))
            .Select(k => new BatchKit(k.Id, k.Code, k.Kind, k.State)).ToDictionaryAsync(k => k.Code, ct);
        var kitIds = kits.Values.Select(k => k.Id).ToList();
        var samples = (await db.CurrentSamples(kitIds)
                .Select(x => new SampleFacts(x.KitId, x.Sample.Bottle, x.Sample.Position, x.Sample.Location, x.Sample.CollectedAt))
                .ToListAsync(ct))
            .ToLookup(s => s.KitId);

        var analyzedAt = Time(request.AnalyzedAt);
        // A cell that did not parse (CSV) is reported already; the row checks must not also call it missing.
        var unreadable = parsed.Problems.Select(p => p.Key).ToHashSet();
        var rowCheck = new ResultRowCheck(analyzedAt, options.Holding, problems, unreadable);
        var results = new List<CheckedResult>();
        var seen = new Dictionary<string, string>();
        var rowKits = new List<BatchKit>();
        for (var i = 0; i < rows.Count; i++)
        {
            var row = rows[i];
            if (!codes[i].IsValid)
            {
                problems.Add(new(row.Where, "kitCode", codes[i].Error!));
                continue;
            }
            if (!kits.TryGetValue(codes[i].Code!, out var kit))
            {
                problems.Add(new(row.Where, "kitCode", $"No kit {codes[i].Code} was issued here."));
                continue;
            }
            rowKits.Add(kit);
            if (rowCheck.Check(row, kit, samples[kit.Id]) is not { } result) continue;
            var key = $"{kit.Code}|{result.Bottle}|{row.Position}|{result.Location}|{result.Analyte}";
            if (!seen.TryAdd(key, row.Where))
                problems.Add(new(row.Where, "analyte", $"This kit, bottle and analyte were already reported at {seen[key]}."));
            else
                results.Add(result);
        }
        // QC rows name no kit; a batch of soil results has soil QC. Judged by the rows' kits, not only the rows that
        // passed, so that a bad soil row does not also make the soil QC look like water QC with the wrong unit.
        var matrix = rowKits.Count > 0 && rowKits.All(k => k.Kind == KitKind.Soil) ? Matrix.Soil : Matrix.Water;
        var qc = new QcRowCheck(problems, unreadable).CheckAll(request.Qc ?? [], matrix);
        // The optional run blocks (calibration, XRF references and repeats): RunBlockCheck.
        var runCheck = new RunBlockCheck(problems);
        runCheck.CheckRows(rows, request.Qc ?? []);
        var (calibrations, references, repeats) = runCheck.Check(request.Run, matrix);

        if (problems.Count > 0) return (null, problems);
        return (new CheckedBatch(request.BatchId!, request.Method!, analyzedAt!.Value, request.Correction == true,
            request.CorrectionReason, results, qc)
        {
            Run = RunAssembly.Assemble(results, request.Qc ?? [], qc, calibrations, references, repeats),
        }, problems);
    }

    internal static DateTimeOffset? Time(string? text) =>
        text is not null && OffsetRequiredConverter.TryParse(text.Trim(), out var value) ? value : null;

    private void CheckHeader(BatchRequest r, List<BatchProblem> problems)
    {
        if (string.IsNullOrWhiteSpace(r.BatchId)) problems.Add(new("", "batchId", "The lab's batch id is required."));
        else if (r.BatchId.Length > 64 || r.BatchId.Any(c => !(char.IsAsciiLetterOrDigit(c) || c is '-' or '_' or '.')))
            problems.Add(new("", "batchId", "Use up to 64 letters, digits, dots, dashes or underscores."));
        if (string.IsNullOrWhiteSpace(r.Method)) problems.Add(new("", "method", "Name the method, e.g. EPA 200.8."));
        else if (r.Method.Length > 100) problems.Add(new("", "method", "At most 100 characters."));
        if (r.AnalyzedAt is null) problems.Add(new("", "analyzedAt", "When the batch was analyzed, with a UTC offset."));
        else if (Time(r.AnalyzedAt) is not { } analyzed) problems.Add(new("", "analyzedAt", OffsetRequiredConverter.Message));
        else if (analyzed > clock.GetUtcNow().AddMinutes(15)) problems.Add(new("", "analyzedAt", "The analysis time is in the future."));
        if (r.Correction == true && string.IsNullOrWhiteSpace(r.CorrectionReason))
            problems.Add(new("", "correctionReason", "A correction needs the lab's reason."));
        if (r.CorrectionReason is { Length: > 500 }) problems.Add(new("", "correctionReason", "At most 500 characters."));
    }
}

public sealed record BatchKit(int Id, string Code, KitKind Kind, KitState State);

public sealed record SampleFacts(int KitId, Rules.Sampling.BottleType Bottle, int? Position, Rules.Sampling.SoilLocation? Location, DateTimeOffset CollectedAt);
