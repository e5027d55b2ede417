using System.Globalization;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.Kits;

/// <summary>
/// Collections and receipts dated before the kit was issued are kept and flagged, not refused: v1 of the contract
/// took them, and a kit entered after it was handed out without its hand-out date (<see cref="IssueKitRequest.IssuedAt"/>)
/// carries the date it was typed in, so an earlier bottle is not proof of a typo. The flag puts the date in front of
/// the coordinator on the kit (and the receipt's in its history) so a mistyped one is put right.
/// </summary>
internal static class IssueDates
{
    public static IEnumerable<CollectionFlag> CollectedBeforeIssue(Kit kit, IReadOnlyList<SampleRequest> samples) =>
        CollectionCheck.BeforeIssue(kit.Code, new DateTimeOffset(kit.IssuedAtUtc, TimeSpan.Zero), [.. samples.Select(s => s.CollectedAt!.Value)]);

    /// <summary>A note for the receipt's history when it is dated before the kit was issued; null otherwise.</summary>
    public static string? ReceivedBeforeIssue(Kit kit, DateTimeOffset receivedAt) =>
        receivedAt.UtcDateTime < kit.IssuedAtUtc
            ? $"received date is before the kit was issued ({Shown(kit)}): check it"
            : null;

    private static string Shown(Kit kit) => kit.IssuedAtUtc.ToString("yyyy-MM-dd HH:mm 'UTC'", CultureInfo.InvariantCulture);
}
