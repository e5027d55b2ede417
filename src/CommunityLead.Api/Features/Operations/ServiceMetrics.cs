using System.Diagnostics;
using System.Diagnostics.Metrics;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Api.Features.Operations;

/// <summary>
/// The work that matters to an operator, as OpenTelemetry counters on the meter "CommunityLead": lab batches by
/// verdict, result rows taken in, interpretations by band, letters issued. Counted after the work is committed,
/// never before, so a rolled-back save counts nothing. Tags are verdicts and bands only: no kit code, no person.
/// </summary>
public static class ServiceMetrics
{
    public const string Name = "CommunityLead";

    private static readonly Meter Meter = new(Name, "1.0");

    /// <summary>Spans of our own work (a batch's checks and save) beside the HTTP and EF Core ones.</summary>
    public static readonly ActivitySource Activities = new(Name, "1.0");

    private static readonly Counter<long> Batches = Meter.CreateCounter<long>("communitylead.lab.batches", "{batch}",
        "Lab batches stored, by QC verdict (accepted, held).");

    private static readonly Counter<long> Rows = Meter.CreateCounter<long>("communitylead.lab.rows", "{row}",
        "Result rows of lab batches stored.");

    private static readonly Counter<long> Refused = Meter.CreateCounter<long>("communitylead.lab.batches.refused", "{batch}",
        "Lab batches refused whole (422): nothing stored.");

    private static readonly Counter<long> Interpretations = Meter.CreateCounter<long>("communitylead.interpretations", "{kit}",
        "Kits interpreted, by band.");

    private static readonly Counter<long> Letters = Meter.CreateCounter<long>("communitylead.letters.issued", "{letter}",
        "Letters newly recorded as issued (a letter issued again is not counted twice).");

    public static void BatchStored(BatchStatus status, int rows)
    {
        Batches.Add(1, new KeyValuePair<string, object?>("verdict", KebabEnum.Name(status)));
        Rows.Add(rows);
    }

    public static void BatchRefused() => Refused.Add(1);

    public static void Interpreted(IEnumerable<Band> bands)
    {
        foreach (var band in bands) Interpretations.Add(1, new KeyValuePair<string, object?>("band", KebabEnum.Name(band)));
    }

    public static void LettersIssued(int count)
    {
        if (count > 0) Letters.Add(count);
    }
}
