using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.Interpretation;

/// <summary>
/// At start-up, then every <c>Interpretation:SweepInterval</c>, interprets kits left without the interpretation their
/// results call for (<see cref="InterpretationRepair"/>), so a store damaged before results and interpretation
/// shared one transaction is repaired too, and so is one written by an instance still running older code.
/// It belongs to no request, so no client can cancel it; stopping the service stops it between saves, and what it
/// did not reach is found again at the next start.
/// </summary>
public sealed class InterpretationSweep(IServiceScopeFactory scopes, IOptions<InterpretationOptions> options, TimeProvider clock,
    ILogger<InterpretationSweep> log) : BackgroundService
{
    protected override async Task ExecuteAsync(CancellationToken stoppingToken)
    {
        // Start-up goes on; the sweep runs beside it.
        await Task.Yield();
        var interval = options.Value.SweepInterval;
        // The first sweep reads the whole store. Later ones look for changed results only in batches that came into
        // effect since the previous sweep began, less one interval: a batch's time is set before its transaction
        // commits, so one that took long to commit is still looked at.
        DateTime? since = null;
        while (!stoppingToken.IsCancellationRequested)
        {
            var started = clock.GetUtcNow().UtcDateTime;
            if (await SweepOnceAsync(new RepairScope(EffectiveSinceUtc: since), stoppingToken)) since = started - interval;
            if (interval <= TimeSpan.Zero) return;
            try
            {
                await Task.Delay(interval, stoppingToken);
            }
            catch (OperationCanceledException)
            {
                return;
            }
        }
    }

    /// <summary>One sweep; false if it failed (logged) or was stopped, so the next one reads as widely again.</summary>
    public async Task<bool> SweepOnceAsync(RepairScope scope, CancellationToken ct)
    {
        try
        {
            await using var scoped = scopes.CreateAsyncScope();
            var repaired = await scoped.ServiceProvider.GetRequiredService<InterpretationRepair>().RepairAsync(scope, ct);
            if (repaired.Count > 0) log.LogWarning("The interpretation sweep repaired {Count} kits.", repaired.Count);
            return true;
        }
        catch (Exception) when (ct.IsCancellationRequested)
        {
            // Stopping: whatever this sweep did not save is found again at the next start.
            return false;
        }
        catch (Exception e)
        {
            // The sweep is the safety net: it must never stop the service. It tries again at the next interval.
            log.LogError(e, "The interpretation sweep failed; it runs again in {Interval}.", options.Value.SweepInterval);
            return false;
        }
    }
}
