using CommunityLead.Api.Data;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.Reports;

/// <summary>
/// Decides the protected set again soon after the store changes (Reports:DecideInBackgroundEvery), so the health
/// department's next report finds it ready instead of waiting while every kit is read. A report still never gets a
/// set older than the store: if it comes first, it decides (ReportRelease), and this finds the work done.
/// </summary>
public sealed class ReportReleaseInBackground(IServiceScopeFactory scopes, ReportRelease release, IOptions<ReportOptions> options,
    ILogger<ReportReleaseInBackground> log) : BackgroundService
{
    protected override async Task ExecuteAsync(CancellationToken stoppingToken)
    {
        var every = options.Value.DecideInBackgroundEvery;
        if (every <= TimeSpan.Zero) return;
        using var timer = new PeriodicTimer(every);
        while (await timer.WaitForNextTickAsync(stoppingToken))
        {
            try
            {
                using var scope = scopes.CreateScope();
                await release.TablesAsync(scope.ServiceProvider.GetRequiredService<CommunityLeadDb>(), stoppingToken);
            }
            catch (Exception e) when (e is not OperationCanceledException)
            {
                // The next report decides for itself; nothing is lost by a look that failed.
                log.LogWarning(e, "Deciding the report's protected set in the background failed");
            }
        }
    }
}
