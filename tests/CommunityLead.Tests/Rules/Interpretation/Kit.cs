using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using Outcome = CommunityLead.Rules.Interpretation.Interpretation;

namespace CommunityLead.Tests.Rules.Interpretation;

/// <summary>Short builders for kits, homes and results (lead µg/L, copper mg/L, soil mg/kg).</summary>
internal static class Kit
{
    public static readonly DateOnly Day = new(2026, 4, 2);
    public static readonly ProgramRules Program = new();

    public static HouseholdContext Home(bool child = false, bool pregnant = false, bool well = false,
        ServiceLineMaterial line = ServiceLineMaterial.Copper, int? built = 1995, bool filter = false) =>
        new(child, pregnant, well ? WaterSource.PrivateWell : WaterSource.Public, line, built, filter);

    public static BottleResult First(double lead) => Lead(BottleType.FirstDraw, lead);
    public static BottleResult Flushed(double lead) => Lead(BottleType.Flushed, lead);
    public static BottleResult Fifth(double lead) => Lead(BottleType.FifthLiter, lead);

    public static BottleResult Lead(BottleType bottle, double value, int? position = null, int? volumeMl = null) =>
        new(bottle, position, null, volumeMl, Analyte.Lead, value, false, 1);

    /// <summary>Below the reporting limit: the value is the limit.</summary>
    public static BottleResult NotDetected(BottleType bottle, double reportingLimit = 1, int? position = null, Analyte analyte = Analyte.Lead) =>
        new(bottle, position, null, null, analyte, reportingLimit, true, reportingLimit);

    public static BottleResult Copper(double mgL, BottleType bottle = BottleType.FirstDraw) =>
        new(bottle, null, null, null, Analyte.Copper, mgL, false, 0.02);

    public static BottleResult Seq(int position, double lead, int? volumeMl = 1000) =>
        Lead(BottleType.Sequential, lead, position, volumeMl);

    public static BottleResult Soil(SoilLocation? location, double mgKg, double? sigma = null) =>
        new(BottleType.Soil, null, location, null, Analyte.Lead, mgKg, false, 10, sigma);

    public static BottleResult SoilNotDetected(SoilLocation location, double reportingLimit = 20) =>
        new(BottleType.Soil, null, location, null, Analyte.Lead, reportingLimit, true, reportingLimit);

    public static KitFacts Water(params BottleResult[] results) => Facts(KitKind.Water, Home(), results);
    public static KitFacts Water(HouseholdContext home, params BottleResult[] results) => Facts(KitKind.Water, home, results);
    public static KitFacts Sequential(HouseholdContext home, params BottleResult[] results) => Facts(KitKind.WaterSequential, home, results);
    public static KitFacts SoilKit(HouseholdContext home, params BottleResult[] results) => Facts(KitKind.Soil, home, results);

    public static KitFacts Facts(KitKind kind, HouseholdContext home, BottleResult[] results) => new(kind, Day, home, results, []);

    public static Outcome Interpret(KitFacts kit, RuleProfile? profile = null, ProgramRules? program = null) =>
        Interpreter.Interpret(kit, profile ?? Levels.UsLcri, program ?? Program);

    public static string[] Codes(Outcome outcome) => [.. outcome.Messages.Select(m => m.Code)];
}
