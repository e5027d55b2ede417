using System.Globalization;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.Interpretation;

/// <summary>
/// For the coordinator: which result looks wrong, what it was held against, and what to check with the lab.
/// Never for a household; the letter stays as the interpretation wrote it, and waits.
/// </summary>
public static class ImplausibleText
{
    public static IReadOnlyList<string> All(IReadOnlyList<ImplausibleResult> results) =>
        results.Count == 0 ? ["A result looks wrong: check it with the lab."] : [.. results.Select(For)];

    public static string For(ImplausibleResult r) => r.Reason switch
    {
        ImplausibleReason.AboveTapWaterRange =>
            $"{Metal(r.Analyte)} {Amount(r.Value, r.Unit)} in {Bottle(r)} is above {Amount(r.Limit, r.Unit)}, far more than tap water " +
            $"usually holds: check the lab's unit ({(r.Analyte == Analyte.Lead ? "ppm vs ppb" : "mg/L vs µg/L")}).",
        ImplausibleReason.OutsideInstrumentRange =>
            $"Soil lead {Amount(r.Value, r.Unit)} {Place(r.Location)} is above {Amount(r.Limit, r.Unit)}, beyond what a portable XRF " +
            "reads reliably: check the reading and its unit with the lab.",
        ImplausibleReason.Negative =>
            $"{Metal(r.Analyte)} {Amount(r.Value, r.Unit)} in {Bottle(r)} is below zero, which no sample holds: ask the lab for the right figure.",
        _ =>
            $"Lead {Amount(r.Value, r.Unit)} in the flushed sample is more than {Number(r.Factor ?? 0)} times the first draw " +
            $"({(r.FirstDrawBelowReportingLimit ? "below " : "")}{Amount(r.FirstDraw ?? 0, r.Unit)}) and at or above the action level " +
            $"({Amount(r.Limit, r.Unit)}): check with the household and the lab that the bottles were not swapped. If the figures " +
            "stand, the lead may come from the service line or pipes further out.",
    };

    private static string Metal(Analyte analyte) => analyte == Analyte.Lead ? "Lead" : "Copper";

    private static string Bottle(ImplausibleResult r) => r.Bottle switch
    {
        BottleType.FirstDraw => "the first draw",
        BottleType.FifthLiter => "the fifth liter",
        BottleType.Flushed => "the flushed sample",
        BottleType.Sequential => $"sequential bottle {r.Position}",
        _ => $"the soil sample {Place(r.Location)}",
    };

    private static string Place(SoilLocation? location) => MessageWords.Location(location).En;

    /// <summary>As letters write figures ("2,000 µg/L"); past ten million in scientific notation, so any figure fits the line.</summary>
    private static string Amount(double value, string unit) => Math.Abs(value) < Huge ? MessageWords.Amount(value, unit).En : $"{Number(value)} {unit}";

    private static string Number(double value) =>
        value.ToString(Math.Abs(value) < Huge ? "#,0.###" : "0.###E+0", CultureInfo.InvariantCulture);

    private const double Huge = 1e7;
}
