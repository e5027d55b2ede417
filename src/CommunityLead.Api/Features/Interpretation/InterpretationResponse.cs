using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Api.Features.Interpretation;

public sealed record ProfileRef(string Id, int Version);

/// <summary>
/// What a kit's results mean. <see cref="Provisional"/> is true when nothing is stored yet (for example the
/// results are held by QC): shown to the coordinator, never sent to the household. <see cref="Implausible"/>: results
/// to check with the lab before any letter.
/// </summary>
public sealed record InterpretationResponse(
    string KitCode,
    Band Band,
    ProfileRef Profile,
    IReadOnlyList<Finding> Findings,
    IReadOnlyList<Message> Messages,
    IReadOnlyList<AttentionFlag> Flags,
    SourcePattern? Pattern,
    SequentialPeak? Peak,
    IReadOnlyList<ValidityIssue> Validity,
    DateTime? InterpretedAt,
    bool Provisional,
    IReadOnlyList<ImplausibleResult> Implausible);
