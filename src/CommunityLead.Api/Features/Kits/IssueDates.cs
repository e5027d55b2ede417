using System.Globalization;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Infrastructure;
using Microsoft.AspNetCore.Http.HttpResults;

namespace CommunityLead.Api.Features.Kits;

/// <summary>
/// Collections and receipts dated before the kit was issued are refused (400 naming the field), not flagged: no
/// bottle is filled and no kit reaches the lab before the kit was handed out, so the date was mistyped, and the
/// person typing it is there to put it right now. Kept with a flag, the wrong date would still shift standing
/// time, holding times and the report month until someone acted on it. A kit entered after it was handed out
/// carries its hand-out date (<see cref="IssueKitRequest.IssuedAt"/>), so a true date is never refused.
/// </summary>
internal static class IssueDates
{
    public static Dictionary<string, string[]> CollectedBeforeIssue(Kit kit, IReadOnlyList<SampleRequest> samples)
    {
        var errors = new Dictionary<string, string[]>();
        for (var i = 0; i < samples.Count; i++)
            if (samples[i].CollectedAt!.Value.UtcDateTime < kit.IssuedAtUtc)
                errors[$"samples[{i}].collectedAt"] = [$"Kit {kit.Code} was issued on {Shown(kit)}: a bottle of it cannot be filled before then. Check the date."];
        return errors;
    }

    public static ValidationProblem? ReceivedBeforeIssue(Kit kit, DateTimeOffset receivedAt) =>
        receivedAt.UtcDateTime < kit.IssuedAtUtc
            ? Problems.Field("receivedAt", $"Kit {kit.Code} was issued on {Shown(kit)}: it cannot have reached the lab before then. Check the date.")
            : null;

    private static string Shown(Kit kit) => kit.IssuedAtUtc.ToString("yyyy-MM-dd HH:mm 'UTC'", CultureInfo.InvariantCulture);
}
