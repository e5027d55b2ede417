namespace CommunityLead.Rules.LabResults;

public enum HoldingFlagCode
{
    AnalyzedAfterHoldingTime,
    AcidifiedLate,
}

public sealed record HoldingFlag(HoldingFlagCode Code, string Message);
