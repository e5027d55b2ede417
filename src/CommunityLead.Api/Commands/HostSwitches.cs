namespace CommunityLead.Api.Commands;

/// <summary>
/// The words a command did not use must be host settings, as ASP.NET Core's command-line configuration reads
/// them (--urls http://..., --Key=value, /Key value, Key=value). Anything else is a mistake, such as "kyes list":
/// before this check the configuration silently ignored it and the service started instead.
/// </summary>
internal static class HostSwitches
{
    public static IEnumerable<string> Problems(IReadOnlyList<string> unmatched)
    {
        for (var i = 0; i < unmatched.Count; i++)
        {
            var word = unmatched[i];
            if (word.StartsWith("--", StringComparison.Ordinal) || word.StartsWith('/'))
            {
                if (word.Contains('=')) continue;
                if (i + 1 < unmatched.Count)
                {
                    i++; // its value
                    continue;
                }
                yield return $"'{word}' needs a value (--Setting value or --Setting=value).";
            }
            else if (word.StartsWith('-'))
            {
                yield return $"'{word}' is not an option of this command.";
            }
            else if (!word.Contains('='))
            {
                yield return $"'{word}' is not a command or argument this program knows.";
            }
        }
    }
}
