using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

/// <summary>
/// Whether a stored interpretation was made from the results in effect now. Its findings keep each bottle's
/// analyte and figure, so a kit whose results changed after it was interpreted can be told from one where the lab
/// only restated the same figures (a correction repeats the rows it did not change, with newer dates).
/// </summary>
public static class InterpretationBasis
{
    public static bool MadeFrom(Interpretation interpretation, IReadOnlyList<BottleResult> results)
    {
        var used = interpretation.Findings.Select(f => (f.Bottle, f.Position, f.Location, f.Analyte, f.Value, f.BelowReportingLimit));
        var now = results.Select(r => (r.Bottle, r.Position, r.Location, r.Analyte, r.Value, r.BelowReportingLimit));
        return Sorted(used).SequenceEqual(Sorted(now));
    }

    private static List<(BottleType, int?, SoilLocation?, Analyte, double, bool)> Sorted(
        IEnumerable<(BottleType, int?, SoilLocation?, Analyte, double, bool)> figures) => [.. figures.Order()];
}
