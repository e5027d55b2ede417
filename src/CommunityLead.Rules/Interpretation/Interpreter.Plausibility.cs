using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

public static partial class Interpreter
{
    /// <summary>
    /// Results to check with the lab before any letter (<see cref="PlausibilityLimits"/>). Only detected values are
    /// held against the upper limits: a "&lt; RL" result says how low it is, not how high. Lab intake refuses
    /// negative values already; the rule stays so a figure below zero is never taken at its word.
    /// </summary>
    private static List<ImplausibleResult> Implausible(IReadOnlyList<Finding> findings, Levels levels, PlausibilityLimits limits)
    {
        var found = new List<ImplausibleResult>();
        foreach (var f in findings)
        {
            ImplausibleResult Flag(ImplausibleReason reason, double limit) =>
                new(reason, f.Bottle, f.Position, f.Location, f.Analyte, f.Value, f.Unit, limit);
            if (f.Value < 0)
                found.Add(Flag(ImplausibleReason.Negative, 0));
            else if (f.BelowReportingLimit)
                continue;
            else if (f.Bottle == BottleType.Soil && f.Value > limits.SoilMaxMgKg)
                found.Add(Flag(ImplausibleReason.OutsideInstrumentRange, limits.SoilMaxMgKg));
            else if (f.Bottle != BottleType.Soil && WaterMax(f.Analyte, limits) is var max && f.Value > max)
                found.Add(Flag(ImplausibleReason.AboveTapWaterRange, max));
        }
        if (FlushedFarAbove(findings, levels, limits) is { } flushed) found.Add(flushed);
        return found;
    }

    private static double WaterMax(Analyte analyte, PlausibilityLimits limits) =>
        analyte == Analyte.Lead ? limits.LeadWaterMaxUgL : limits.CopperWaterMaxMgL;

    /// <summary>
    /// A detected flushed lead result more than the factor times the first draw and at or above the action level.
    /// A first draw below its reporting limit is at most that limit, so the limit stands in for it: the ratio is
    /// then at least what is compared. With several bottles of a kind, the highest of each.
    /// </summary>
    private static ImplausibleResult? FlushedFarAbove(IReadOnlyList<Finding> findings, Levels levels, PlausibilityLimits limits)
    {
        var first = findings.Where(f => f is { Analyte: Analyte.Lead, Bottle: BottleType.FirstDraw }).MaxBy(f => f.Value);
        var flushed = findings.Where(f => f is { Analyte: Analyte.Lead, Bottle: BottleType.Flushed, BelowReportingLimit: false })
            .MaxBy(f => f.Value);
        if (first is null || flushed is null || levels.Water(Analyte.Lead).Action is not { } action) return null;
        if (!AtOrAbove(flushed.Value, action.Value) || flushed.Value <= limits.FlushedOverFirstDrawFactor * first.Value) return null;
        return new ImplausibleResult(ImplausibleReason.FlushedFarAboveFirstDraw, flushed.Bottle, flushed.Position, flushed.Location,
            flushed.Analyte, flushed.Value, flushed.Unit, action.Value, first.Value, first.BelowReportingLimit, limits.FlushedOverFirstDrawFactor);
    }
}
