namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// Settings of the "RateLimits" section. Limits are kept in each instance's memory: with several instances
/// behind a balancer each one counts on its own (deploy/README.md).
/// </summary>
public sealed class RateLimitOptions
{
    public const string Section = "RateLimits";

    /// <summary>Failed sign-ins from one client address in a window; then every sign-in from it waits (429).</summary>
    public int FailedSignInsPerAddress { get; set; } = 20;

    /// <summary>Failed sign-ins naming one key id, from any address: someone is guessing at that key's secret.</summary>
    public int FailedSignInsPerKeyId { get; set; } = 10;

    public TimeSpan FailedSignInWindow { get; set; } = TimeSpan.FromMinutes(5);

    /// <summary>POST /api/lab/batches per key in <see cref="Window"/>: a lab posts a few batches a day.</summary>
    public int LabBatchesPerKey { get; set; } = 30;

    /// <summary>POST /api/letters/batch per key in <see cref="Window"/>: each renders every letter due, so it is costly.</summary>
    public int LetterBatchesPerKey { get; set; } = 6;

    public TimeSpan Window { get; set; } = TimeSpan.FromMinutes(1);
}
