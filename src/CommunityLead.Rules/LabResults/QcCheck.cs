namespace CommunityLead.Rules.LabResults;

/// <summary>
/// One QC figure and its verdict. <paramref name="Type"/> is null for batch-wide checks (how many calibration
/// checks were run). <paramref name="Value"/> is null when the figure could not or should not be computed;
/// <paramref name="Low"/>/<paramref name="High"/> are the window, null where one side has no limit.
/// </summary>
public sealed record QcCheck(
    QcType? Type,
    Analyte Analyte,
    string Figure,
    double? Value,
    double? Low,
    double? High,
    bool Passed,
    string Detail);

/// <summary>The batch passes only when every check passes.</summary>
public sealed record QcVerdict(bool Passed, IReadOnlyList<QcCheck> Checks);
