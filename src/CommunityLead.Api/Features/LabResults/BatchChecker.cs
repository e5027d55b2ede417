using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// Every check a batch must pass before anything is written. It collects all problems rather than stopping at
/// the first, so the lab can fix its file in one go. Rows are checked a chunk at a time (<see cref="AddResultsAsync"/>
/// hands back the chunk's passed rows), so a streamed batch is checked as it is read and keeps per row only its key;
/// what the QC verdict needs is tallied as the rows pass (<see cref="BatchTally"/>).
/// </summary>
public sealed class BatchChecker(CommunityLeadDb db, LabIntakeOptions options, TimeProvider clock)
{
    /// <summary>Rows looked up together: few enough to hold, many enough that queries stay few.</summary>
    public const int ChunkSize = 2_000;

    /// <summary>Kit states in which results are taken: the kit reached the lab and is not closed or void.</summary>
    public static readonly KitState[] AcceptingStates = [KitState.Received, KitState.Analyzed, KitState.Interpreted, KitState.LetterSent];

    private BatchProblemList problems = new(0);
    private DateTimeOffset? analyzedAt;
    // Kit, bottle and analyte of every row that passed, with where it was: a second report of one is a problem.
    private readonly Dictionary<ResultKey, string> seen = [];
    private readonly Dictionary<Analyte, int> sampleCounts = [];
    private readonly Dictionary<Analyte, double> reportingLimits = [];
    private bool anySampleFigures;
    private int rows;
    private bool anyKit, allSoil = true;

    public async Task<(CheckedBatch? Batch, BatchProblemList Problems)> CheckAsync(ParsedBatch parsed, CancellationToken ct)
    {
        Begin(parsed.Request, parsed.Problems);
        var results = new List<CheckedResult>();
        foreach (var chunk in (parsed.Request.Results ?? []).Chunk(ChunkSize))
        {
            var passed = await AddResultsAsync(chunk, ct);
            if (problems.Count == 0) results.AddRange(passed);
        }
        return (await FinishAsync(parsed.Request, parsed.Request.Qc ?? [], new HeldResults(results)), problems);
    }

    /// <summary>Checks the batch's own fields; problems found from here on go to <paramref name="list"/>.</summary>
    public void Begin(BatchRequest header, BatchProblemList list)
    {
        problems = list;
        CheckHeader(header);
        analyzedAt = Time(header.AnalyzedAt);
    }

    /// <summary>Checks a chunk of result rows; the rows that passed, normalised (none once the batch has a problem).</summary>
    public async Task<IReadOnlyList<CheckedResult>> AddResultsAsync(IReadOnlyList<ResultRow> chunk, CancellationToken ct)
    {
        var results = new List<CheckedResult>(chunk.Count);
        rows += chunk.Count;
        var codes = chunk.Select(r => KitCode.Parse(r.KitCode)).ToList();
        var wanted = codes.Where(c => c.IsValid).Select(c => c.Code!).Distinct().ToList();
        var kits = await db.Kits.AsNoTracking().Where(k => wanted.Contains(k.Code))
            .Select(k => new BatchKit(k.Id, k.Code, k.Kind, k.State)).ToDictionaryAsync(k => k.Code, ct);
        var kitIds = kits.Values.Select(k => k.Id).ToList();
        var samples = (await db.CurrentSamples(kitIds)
                .Select(x => new SampleFacts(x.KitId, x.Sample.Bottle, x.Sample.Position, x.Sample.Location, x.Sample.CollectedAt))
                .ToListAsync(ct))
            .ToLookup(s => s.KitId);
        new RunBlockCheck(problems).CheckRows(chunk, []);
        var rowCheck = new ResultRowCheck(analyzedAt, options.Holding, problems);
        for (var i = 0; i < chunk.Count; i++)
        {
            var row = chunk[i];
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
            anyKit = true;
            allSoil &= kit.Kind == KitKind.Soil;
            if (rowCheck.Check(row, kit, samples[kit.Id]) is not { } result) continue;
            if (!seen.TryAdd(result.Key, row.Where))
                problems.Add(new(row.Where, "analyte", $"This kit, bottle and analyte were already reported at {seen[result.Key]}."));
            else if (problems.Count == 0)
            {
                results.Add(result);
                sampleCounts[result.Analyte] = sampleCounts.GetValueOrDefault(result.Analyte) + 1;
                reportingLimits[result.Analyte] = Math.Min(result.ReportingLimit, reportingLimits.GetValueOrDefault(result.Analyte, double.PositiveInfinity));
                anySampleFigures |= row.Intensities is not null || row.RunOrder is not null;
            }
        }
        return problems.Count == 0 ? results : [];
    }

    /// <summary>After the last row: the QC rows, then the batch if nothing was wrong.</summary>
    /// <param name="results">Where the passed rows are when they are stored: kept in memory, or read again from the spooled file.</param>
    public async Task<CheckedBatch?> FinishAsync(BatchRequest header, IReadOnlyList<QcRow> qcRows, CheckedResults results)
    {
        if (rows == 0) problems.Add(new("", "results", "A batch needs at least one result."));
        // QC rows name no kit; a batch of soil results has soil QC. Judged by the rows' kits, not only the rows that
        // passed, so that a bad soil row does not also make the soil QC look like water QC with the wrong unit.
        var matrix = anyKit && allSoil ? Matrix.Soil : Matrix.Water;
        var qc = new QcRowCheck(problems).CheckAll(qcRows, matrix);
        // The optional run blocks (calibration, XRF references and repeats): RunBlockCheck. Result rows' own run
        // figures were checked chunk by chunk (AddResultsAsync).
        var runCheck = new RunBlockCheck(problems);
        runCheck.CheckRows([], qcRows);
        var (calibrations, references, repeats) = runCheck.Check(header.Run, matrix);
        if (problems.Count > 0) return null;
        var tally = new BatchTally(seen.Count, sampleCounts, reportingLimits, seen);
        return new CheckedBatch(header.BatchId!, header.Method!, analyzedAt!.Value, header.Correction == true,
            header.CorrectionReason, tally, results, qc)
        {
            Run = await RunAssembly.AssembleAsync(anySampleFigures, results, qcRows, qc, calibrations, references, repeats),
        };
    }

    internal static DateTimeOffset? Time(string? text) =>
        text is not null && OffsetRequiredConverter.TryParse(text.Trim(), out var value) ? value : null;

    private void CheckHeader(BatchRequest r)
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
