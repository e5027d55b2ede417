using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

/// <summary>
/// Typical values for each message's placeholders, so a reviewer reads a whole sentence and its reading level
/// is measured on what a household would get: a first-draw bottle, lead in µg/L, copper in mg/L, soil from the
/// play area in mg/kg, with numbers that fit the message (a low result below its level, an urgent one far above).
/// Invented examples, written with the same <see cref="MessageWords"/> as real letters.
/// </summary>
public static class MessageExamples
{
    public static Message Filled(MessageTemplate template) => template.Fill(For(template.Code));

    public static IReadOnlyDictionary<string, Phrase> For(string code)
    {
        var (result, level, rl, margin, unit) = Amounts(code);
        var values = new Dictionary<string, Phrase>
        {
            ["bottle"] = MessageWords.Bottle(BottleType.FirstDraw, null),
            ["location"] = MessageWords.Location(SoilLocation.PlayArea),
            ["metal"] = MessageWords.Metal(code.StartsWith("copper.", StringComparison.Ordinal) || code == "result.below-level" ? Analyte.Copper : Analyte.Lead),
            ["result"] = MessageWords.Amount(result, unit),
            ["level"] = MessageWords.Amount(level, unit),
            ["rl"] = MessageWords.Amount(rl, unit),
            ["margin"] = MessageWords.Amount(margin, unit),
            // The urgent level (program default 50 µg/L) and the yard's hazard standard (1,200 mg/kg, 40 CFR 745.65).
            ["urgent"] = MessageWords.Amount(50, Units.MicrogramsPerLiter),
            ["hazard"] = MessageWords.Amount(1200, Units.MilligramsPerKilogram),
        };
        // A peak within the first liter points to the home's pipes; 19 mm pipe holds about 0.29 L per meter.
        var (position, litres, metres) = code == MessageCatalog.PeakHomePipes.Code ? (2, 0.75, 2.65) : (3, 2.0, 7.05);
        values["position"] = MessageWords.Count(position);
        values["litres"] = MessageWords.Litres(litres);
        values["metres"] = MessageWords.Metres(metres);
        return values;
    }

    private static (double Result, double Level, double Rl, double Margin, string Unit) Amounts(string code) => code switch
    {
        "result.advisory" => (6.1, 5, 1, 0, Units.MicrogramsPerLiter),
        "result.action" => (12.3, 10, 1, 0, Units.MicrogramsPerLiter),
        "result.urgent" => (145, 10, 1, 0, Units.MicrogramsPerLiter),
        "result.reporting-limit-at-level" => (1, 1, 1, 0, Units.MicrogramsPerLiter),
        "copper.taste" => (1.2, 1, 0.02, 0, Units.MilligramsPerLiter),
        "soil.measured" => (250, 400, 20, 0, Units.MilligramsPerKilogram),
        "soil.below" => (150, 400, 20, 0, Units.MilligramsPerKilogram),
        "soil.below-screening" => (150, 200, 20, 0, Units.MilligramsPerKilogram),
        "soil.above-screening" => (940, 200, 20, 0, Units.MilligramsPerKilogram),
        "result.below-level" => (0.4, 1, 0.02, 0, Units.MilligramsPerLiter),
        "soil.above" => (450, 400, 20, 0, Units.MilligramsPerKilogram),
        "soil.inconclusive" => (380, 400, 20, 60, Units.MilligramsPerKilogram),
        "soil.reporting-limit-at-level" => (120, 100, 120, 0, Units.MilligramsPerKilogram),
        "soil.other-source" or "soil.not-detected" => (20, 100, 20, 0, Units.MilligramsPerKilogram),
        _ => (3.2, 10, 1, 0, Units.MicrogramsPerLiter),
    };
}
