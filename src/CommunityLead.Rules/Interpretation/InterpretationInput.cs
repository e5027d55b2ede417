using CommunityLead.Rules.Households;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

/// <summary>Everything the rules need about one kit: plain facts, no database or HTTP.</summary>
public sealed record KitFacts(
    KitKind Kind,
    DateOnly CollectedOn,
    HouseholdContext Household,
    IReadOnlyList<BottleResult> Results,
    IReadOnlyList<ValidityIssue> Validity,
    bool CorrectedAfterLetter = false);

public sealed record HouseholdContext(
    bool ChildUnder6,
    bool Pregnant,
    WaterSource WaterSource,
    ServiceLineMaterial ServiceLine,
    int? YearBuilt,
    bool FilterInUse);

/// <summary>One current result, already in the normal unit (lead µg/L, copper mg/L, soil mg/kg).</summary>
/// <param name="BelowReportingLimit">Reported as "&lt; RL": censored, not zero; Value is then the limit.</param>
/// <param name="Uncertainty">One standard deviation (portable XRF), normal unit.</param>
public sealed record BottleResult(
    BottleType Bottle,
    int? Position,
    SoilLocation? Location,
    int? VolumeMl,
    Analyte Analyte,
    double Value,
    bool BelowReportingLimit,
    double ReportingLimit,
    double? Uncertainty = null,
    bool Estimated = false);

public enum ValidityIssueCode
{
    StandingTimeShort,
    CollectionInvalid,
    OutsideHoldingTime,
    QcHeld,
}

/// <summary>Why the sample may not show the truth: the household is asked to sample again.</summary>
public sealed record ValidityIssue(ValidityIssueCode Code, string Reason);

/// <summary>The program's own choices on top of its profile.</summary>
/// <param name="AdvisoryLeadUgL">A stricter advisory level for lead in water, if the program wants one.</param>
/// <param name="UrgentLeadUgL">Lead in water at or above this is urgent: call the household now.</param>
/// <param name="PipeInnerDiameterMm">For sequential profiles: the inner diameter used to turn volume into pipe length.</param>
public sealed record ProgramRules(
    double? AdvisoryLeadUgL = null,
    double UrgentLeadUgL = 50,
    double PipeInnerDiameterMm = 19)
{
    /// <summary>Results to check with the lab before any letter.</summary>
    public PlausibilityLimits Plausibility { get; init; } = new();
}
