namespace CommunityLead.Api.Features.Results;

/// <summary>
/// Settings of the "ResultAccess" section: the household result page. Off unless both are set; then each new
/// letter prints where to look and the kit's secret, and POST /api/results answers.
/// </summary>
public sealed class ResultAccessOptions
{
    public const string Section = "ResultAccess";

    /// <summary>
    /// The key the per-kit secrets are derived from (HMAC-SHA256 of the kit code), at least 32 characters. The same on
    /// every instance; changing it makes every printed secret stop working.
    /// </summary>
    public string? SecretKey { get; set; }

    /// <summary>The page's address as printed on the letter, like https://tapcheck.example.org/ui/result/.</summary>
    public string? PageAddress { get; set; }

    /// <summary>Lookups (right or wrong) from one client address per <see cref="Window"/>: enough to mistype a few times.</summary>
    public int LookupsPerAddress { get; set; } = 10;

    public TimeSpan Window { get; set; } = TimeSpan.FromMinutes(15);

    public bool Enabled => !string.IsNullOrEmpty(SecretKey) && !string.IsNullOrEmpty(PageAddress);
}
