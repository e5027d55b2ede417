using System.Threading.RateLimiting;
using CommunityLead.Api.Infrastructure;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Auth;

/// <summary>
/// Counts failed sign-ins per client address and per key id; past the limit, every sign-in from that address
/// or naming that key id waits out the window (429), a correct key included, so guessing gains nothing by
/// going faster. The rate limiter middleware cannot do this: it takes its permit before the request runs,
/// and whether a sign-in fails is known only after the key was checked. Its limiters can, used directly.
/// </summary>
public sealed class SignInThrottle : IDisposable
{
    private readonly PartitionedRateLimiter<string> addresses;
    private readonly PartitionedRateLimiter<string> keyIds;

    public SignInThrottle(IOptions<RateLimitOptions> options)
    {
        var settings = options.Value;
        Window = settings.FailedSignInWindow;
        addresses = Failures(settings.FailedSignInsPerAddress, Window);
        keyIds = Failures(settings.FailedSignInsPerKeyId, Window);
    }

    public TimeSpan Window { get; }

    /// <summary>How long to wait, if this address or key id used up its failures; null when it may try.</summary>
    public TimeSpan? Refusal(string address, string? keyId)
    {
        // Asking for no permit reports whether any is left, without using one.
        using var byAddress = addresses.AttemptAcquire(address, 0);
        if (!byAddress.IsAcquired) return TooManyRequests.RetryAfter(byAddress, Window);
        if (keyId is null) return null;
        using var byKey = keyIds.AttemptAcquire(keyId, 0);
        return byKey.IsAcquired ? null : TooManyRequests.RetryAfter(byKey, Window);
    }

    public void Failed(string address, string? keyId)
    {
        // A fixed window's permits come back only when the window ends, not when the lease is disposed.
        addresses.AttemptAcquire(address).Dispose();
        if (keyId is not null) keyIds.AttemptAcquire(keyId).Dispose();
    }

    public void Dispose()
    {
        addresses.Dispose();
        keyIds.Dispose();
    }

    private static PartitionedRateLimiter<string> Failures(int limit, TimeSpan window) =>
        PartitionedRateLimiter.Create<string, string>(key => RateLimitPartition.GetFixedWindowLimiter(key,
            _ => new FixedWindowRateLimiterOptions { PermitLimit = limit, Window = window, QueueLimit = 0 }));
}
