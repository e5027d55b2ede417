using System.Diagnostics.Metrics;
using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Operations;

/// <summary>
/// What is waiting, read from the database when metrics are collected: open attention items by reason, and the
/// interpretation backlog (kits left analyzed with no interpretation; the start-up and periodic sweep works it off,
/// so anything but zero for long means trouble). Read at most every <see cref="Fresh"/>, however often scraped.
/// Made per service instance (IMeterFactory), so its callbacks end with the instance.
/// </summary>
public sealed class ServiceGauges
{
    public static readonly TimeSpan Fresh = TimeSpan.FromSeconds(10);

    private readonly IServiceScopeFactory scopes;
    private readonly TimeProvider clock;
    private readonly Lock gate = new();
    private (DateTimeOffset At, IReadOnlyList<(AttentionFlag Reason, int Count)> Open, int Backlog)? last;

    public ServiceGauges(IMeterFactory meters, IServiceScopeFactory scopes, TimeProvider clock)
    {
        (this.scopes, this.clock) = (scopes, clock);
        var meter = meters.Create(ServiceMetrics.Name, "1.0");
        meter.CreateObservableGauge("communitylead.attention.open", ReadOpen, "{item}",
            "Attention items waiting for a person, by reason.");
        meter.CreateObservableGauge("communitylead.interpretation.backlog", () => Read().Backlog, "{kit}",
            "Kits with every result in and no interpretation yet.");
    }

    private IEnumerable<Measurement<int>> ReadOpen() =>
        Read().Open.Select(o => new Measurement<int>(o.Count, new KeyValuePair<string, object?>("reason", KebabEnum.Name(o.Reason))));

    private (DateTimeOffset At, IReadOnlyList<(AttentionFlag Reason, int Count)> Open, int Backlog) Read()
    {
        lock (gate)
        {
            var now = clock.GetUtcNow();
            if (last is { } cached && now - cached.At < Fresh) return cached;
            using var scope = scopes.CreateScope();
            var db = scope.ServiceProvider.GetRequiredService<CommunityLeadDb>();
            var open = db.Attention.AsNoTracking().Where(a => a.ResolvedAtUtc == null)
                .GroupBy(a => a.Reason).Select(g => new { g.Key, Count = g.Count() }).ToList()
                .Select(g => (g.Key, g.Count)).ToList();
            var backlog = db.Kits.AsNoTracking().Count(k => k.State == KitState.Analyzed);
            last = (now, open, backlog);
            return last.Value;
        }
    }
}
