using System.Security.Claims;
using System.Threading.RateLimiting;
using Microsoft.AspNetCore.RateLimiting;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// Per-key limits on the two costly posts, with ASP.NET Core's rate limiter. It runs after authorization, so only
/// a signed-in key with the right role uses up its allowance, and each key (by its label) has its own.
/// </summary>
public static class RateLimitSetup
{
    public const string LabBatches = "lab-batches";
    public const string LetterBatches = "letter-batches";

    public static void AddCommunityLeadRateLimits(this IServiceCollection services) =>
        services.AddRateLimiter(options =>
        {
            options.RejectionStatusCode = StatusCodes.Status429TooManyRequests;
            options.AddPolicy(LabBatches, context => PerKey(context, s => s.LabBatchesPerKey));
            options.AddPolicy(LetterBatches, context => PerKey(context, s => s.LetterBatchesPerKey));
            options.OnRejected = (rejected, _) =>
            {
                var settings = Settings(rejected.HttpContext);
                var (limit, what) = rejected.HttpContext.GetEndpoint()?.Metadata.GetMetadata<EnableRateLimitingAttribute>()?.PolicyName == LabBatches
                    ? (settings.LabBatchesPerKey, "Lab batches")
                    : (settings.LetterBatchesPerKey, "Letter batches");
                return new ValueTask(TooManyRequests.WriteAsync(rejected.HttpContext,
                    TooManyRequests.RetryAfter(rejected.Lease, settings.Window),
                    "Too many requests from this key.",
                    $"{what} posted with one key: at most {limit} per {TooManyRequests.Describe(settings.Window)}. " +
                    "This request was not read, and nothing of it was stored."));
            };
        });

    private static RateLimitPartition<string> PerKey(HttpContext context, Func<RateLimitOptions, int> limit)
    {
        var settings = Settings(context);
        return RateLimitPartition.GetFixedWindowLimiter(context.User.FindFirstValue(ClaimTypes.Name) ?? "",
            _ => new FixedWindowRateLimiterOptions { PermitLimit = limit(settings), Window = settings.Window, QueueLimit = 0 });
    }

    private static RateLimitOptions Settings(HttpContext context) =>
        context.RequestServices.GetRequiredService<IOptions<RateLimitOptions>>().Value;
}
