using System.Globalization;
using System.Threading.RateLimiting;

namespace CommunityLead.Api.Infrastructure;

/// <summary>The one way a limit says no: 429 problem details with Retry-After in whole seconds.</summary>
public static class TooManyRequests
{
    public static TimeSpan RetryAfter(RateLimitLease lease, TimeSpan fallback) =>
        lease.TryGetMetadata(MetadataName.RetryAfter, out var wait) && wait > TimeSpan.Zero ? wait : fallback;

    /// <summary>"1 minute", "5 minutes", "90 seconds": a window as a person says it.</summary>
    public static string Describe(TimeSpan window) =>
        window.TotalMinutes is var minutes && minutes == Math.Floor(minutes) && minutes >= 1
            ? (minutes == 1 ? "minute" : $"{minutes:0} minutes")
            : $"{Math.Ceiling(window.TotalSeconds):0} seconds";

    public static Task WriteAsync(HttpContext context, TimeSpan retryAfter, string title, string detail)
    {
        var seconds = Math.Max(1, (int)Math.Ceiling(retryAfter.TotalSeconds));
        context.Response.StatusCode = StatusCodes.Status429TooManyRequests;
        context.Response.Headers.RetryAfter = seconds.ToString(CultureInfo.InvariantCulture);
        return context.RequestServices.GetRequiredService<IProblemDetailsService>().WriteAsync(new ProblemDetailsContext
        {
            HttpContext = context,
            ProblemDetails =
            {
                Status = StatusCodes.Status429TooManyRequests, Title = title,
                Detail = $"{detail} Try again in {seconds} s.",
                Extensions = { ["retryAfterSeconds"] = seconds },
            },
        }).AsTask();
    }
}
