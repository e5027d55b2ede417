using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>Checks one result row against its kit and the bottles recorded at collection, and normalises it.</summary>
internal sealed class ResultRowCheck(DateTimeOffset? analyzedAt, HoldingLimits holding, BatchProblemList problems)
{
    public CheckedResult? Check(ResultRow row, BatchKit kit, IEnumerable<SampleFacts> kitSamples)
    {
        var before = problems.Count;
        void Problem(string field, string reason) => problems.Add(new(row.Where, field, reason));
        var incomplete = false;
        void Missing(string field, string reason)
        {
            incomplete = true;
            if (row.Unreadable?.Contains(field) != true) Problem(field, reason);
        }

        if (!BatchChecker.AcceptingStates.Contains(kit.State))
            Problem("kitCode", KitLifecycle.IsTerminal(kit.State)
                ? $"Kit {kit.Code} is {KebabEnum.Name(kit.State)} and takes no more results. If these bottles are a new test, the program issues a replacement kit."
                : $"Kit {kit.Code} is {KebabEnum.Name(kit.State)}; results are taken once the kit has been received.");
        var matrix = kit.Kind == KitKind.Soil ? Matrix.Soil : Matrix.Water;

        SampleFacts? sample = null;
        if (!KebabEnum.TryParse<BottleType>(row.Bottle, out var bottle))
            Problem("bottle", row.Bottle is null ? "Which bottle was analyzed?" : $"Use one of: {KebabEnum.Allowed<BottleType>()}.");
        SoilLocation? location = null;
        if (row.Location is not null)
        {
            if (KebabEnum.TryParse<SoilLocation>(row.Location, out var l)) location = l;
            else Problem("location", $"Use one of: {KebabEnum.Allowed<SoilLocation>()}.");
        }
        else if (bottle == BottleType.Soil)
            Problem("location", $"Which soil sample? {KebabEnum.Allowed<SoilLocation>()}.");
        // The lab may receive a kit whose form the coordinator has not typed in yet. Its results are kept and wait
        // for the form (WaitingResults), so only what the kit itself decides can be checked now.
        var waiting = !kitSamples.Any();
        if (problems.Count == before && waiting)
        {
            if (!Bottles.FitsKit(kit.Kind, bottle))
                Problem("bottle", $"A {KebabEnum.Name(kit.Kind)} kit has no {KebabEnum.Name(bottle)} bottle.");
            else if ((bottle == BottleType.Sequential) != (row.Position is not null) || row.Position is < 1 or > 30)
                Problem("position", "Sequential bottles, and only they, have a position from 1 to 30.");
        }
        else if (problems.Count == before)
        {
            sample = kitSamples.FirstOrDefault(s => s.Bottle == bottle && s.Position == row.Position && (location is null || s.Location == location));
            if (sample is null && row.Unreadable?.Contains("position") != true)
                Problem("bottle", $"Kit {kit.Code} has no {Describe(bottle, row.Position, location)} recorded at collection.");
        }

        if (!Analytes.TryParse(row.Analyte, out var analyte))
            Problem("analyte", row.Analyte is null ? "Which analyte? lead or copper." : $"'{row.Analyte}' is not an analyte we take: lead (Pb) or copper (Cu).");
        double factor = 1;
        if (problems.Count == before && !Units.TryFactor(analyte, matrix, row.Unit, out factor, out var unitError))
            Problem("unit", unitError!);

        CheckNumbers(row, Problem, Missing);
        if (factor > 1) CheckConvertible(row, factor, Analytes.NormalUnit(analyte, matrix), Problem);
        var acidifiedAt = BatchChecker.Time(row.AcidifiedAt);
        if (row.AcidifiedAt is not null && acidifiedAt is null) Problem("acidifiedAt", OffsetRequiredConverter.Message);
        if (acidifiedAt is { } acidified && sample is not null && acidified < sample.CollectedAt)
            Problem("acidifiedAt", "The sample cannot be acidified before it was collected.");
        if (acidifiedAt is { } preserved && analyzedAt is { } run && preserved > run)
            Problem("acidifiedAt", "The sample cannot be acidified after the batch was analyzed.");
        else if (acidifiedAt is { } acid && analyzedAt is { } analysis && analysis - acid < holding.WaitAfterAcidification)
            // Refused rather than flagged: a figure read too soon can be low, and a low figure would tell a
            // household its water is fine. The lab can wait and analyse the same bottle again.
            Problem("acidifiedAt", $"The batch was analyzed {(int)(analysis - acid).TotalHours} h {(analysis - acid).Minutes} min after acid was added; wait at least " +
                $"{holding.WaitAfterAcidification.TotalHours:0.#} h so lead on particles dissolves, then analyze this bottle again.");
        if (analyzedAt is { } analyzed && sample is not null && analyzed < sample.CollectedAt)
            Problem("analyzedAt", $"The batch's analysis time is before kit {kit.Code}'s sample was collected.");
        // Without a valid analysis time (reported once, for the batch) holding times cannot be judged.
        if (problems.Count > before || incomplete || (sample is null && !waiting) || analyzedAt is null) return null;

        var unit = Analytes.NormalUnit(analyte, matrix);
        return new CheckedResult(row, kit.Id, kit.Code, bottle, sample?.Location ?? location, matrix, analyte,
            row.Value!.Value * factor, unit, row.Mdl!.Value * factor, row.ReportingLimit!.Value * factor,
            row.Uncertainty * factor, row.Replicates?.Select(v => v * factor).ToList(), acidifiedAt, sample?.CollectedAt,
            sample is null ? [] : HoldingTimes.Check(sample.CollectedAt, analyzedAt!.Value, acidifiedAt, holding));
    }

    private static void CheckNumbers(ResultRow row, Action<string, string> problem, Action<string, string> missing)
    {
        if (row.Value is not { } value) missing("value", "The result value is required (for '<' results, the reporting limit).");
        else if (!double.IsFinite(value) || value < 0) problem("value", "A result is a finite number, zero or more.");
        if (row.Mdl is not { } mdl) missing("mdl", "The method detection limit is required.");
        else if (mdl < 0) problem("mdl", "The detection limit cannot be negative.");
        if (row.ReportingLimit is not { } rl) missing("reportingLimit", "The reporting limit is required.");
        else if (rl <= 0) problem("reportingLimit", "The reporting limit must be above zero.");
        if (row.Mdl is { } m && row.ReportingLimit is { } r && m > r)
            problem("mdl", $"The detection limit ({m}) cannot be above the reporting limit ({r}).");
        switch (row.Qualifier?.Trim().ToUpperInvariant())
        {
            case null or "":
            case "J":
                break;
            case "<":
                // The contract: below the reporting limit, value = the limit. Anything else is ambiguous.
                if (row.Value is { } v && row.ReportingLimit is { } limit && Math.Abs(v - limit) > 1e-9 * Math.Max(1, limit))
                    problem("value", $"With qualifier '<' the value must be the reporting limit ({limit}).");
                break;
            default:
                problem("qualifier", "Use '<' (below the reporting limit), 'J' (estimated) or nothing.");
                break;
        }
        if (row.Uncertainty is < 0) problem("uncertainty", "An uncertainty (one standard deviation) cannot be negative.");
        if (row.Replicates is { } reps && (reps.Count > 20 || reps.Any(x => !double.IsFinite(x) || x < 0)))
            problem("replicates", "Up to 20 replicate readings, each a finite number, zero or more.");
    }

    /// <summary>mg/L becomes µg/L by × 1000: a figure near double's limit would turn into infinity, which JSON cannot hold.</summary>
    private static void CheckConvertible(ResultRow row, double factor, string unit, Action<string, string> problem)
    {
        (string Field, double? Number)[] figures =
            [("value", row.Value), ("mdl", row.Mdl), ("reportingLimit", row.ReportingLimit), ("uncertainty", row.Uncertainty),
             ("replicates", row.Replicates?.DefaultIfEmpty().Max())];
        foreach (var (field, number) in figures)
            if (number is { } n && !double.IsFinite(n * factor))
                problem(field, $"{n} {row.Unit?.Trim()} is too large to convert to {unit}; check the figure and its unit.");
    }

    private static string Describe(BottleType bottle, int? position, SoilLocation? location) => bottle switch
    {
        BottleType.Sequential => $"sequential bottle {position?.ToString() ?? "(no position given)"}",
        BottleType.Soil => location is null ? "soil sample" : $"{KebabEnum.Name(location.Value)} soil sample",
        _ => $"{KebabEnum.Name(bottle)} bottle",
    };
}
