using System.Diagnostics;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.Reports;
using CommunityLead.Tests.Infrastructure;
using Microsoft.Extensions.DependencyInjection;
using Xunit.Abstractions;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Reports;

public class ReportAttackerTests(ITestOutputHelper output)
{
    [Fact]
    public async Task Summary_EveryQueryTheRoleMaySend_NoHiddenSmallCountNarrowerThanTheSetting()
    {
        var clock = Stopwatch.StartNew();
        using var app = new CommunityLeadFactory();
        ReportStore.Seed(app);
        var options = new ReportOptions();
        var calendar = app.Services.GetRequiredService<CommunityLead.Api.Infrastructure.ProgramCalendar>();
        var kits = app.WithDb(db => ReportKits.LoadAsync(db, calendar, CancellationToken.None).GetAwaiter().GetResult());
        var tables = SummaryTables.Protect(kits, options);
        output.WriteLine($"protected in {clock.Elapsed.TotalSeconds:0.0} s");

        // Every query, answered by the service's own parse and look-up; a sample also over HTTP, to show they agree.
        var published = new Dictionary<PublishedCell, Cell>();
        var queries = ReportStore.EveryQuery().ToList();
        var answered = 0;
        var health = app.CreateClient(Roles.Health);
        foreach (var (query, i) in queries.Select((q, i) => (q, i)))
        {
            if (ReportStore.Answer(query, tables, options) is not { } report) continue;
            answered++;
            foreach (var (cell, count) in PublishedCells.Of(query, report))
                if (!published.TryAdd(cell, count))
                    Assert.True(published[cell] == count, $"{cell} differs between queries ({query})");
            if (i % 300 == 0)
            {
                var overHttp = await GetAsync(health, $"/api/reports/summary?{query}");
                Assert.Equal(report.Total.KitsIssued.Value, overHttp["total"]!["kitsIssued"]!["value"]?.GetValue<int?>());
                Assert.Equal(report.Rows.Count, overHttp["rows"]!.AsArray().Count);
            }
        }

        output.WriteLine($"answered in {clock.Elapsed.TotalSeconds:0.0} s");
        var t = options.SuppressionThreshold;
        int Truth(PublishedCell c) => kits.Count(k => KebabName(k.Kind) == c.Kind && PublishedCells.Months(c.Period).Contains(k.PeriodMonth % 100)
            && (c.Dimension.Length == 0 || ReportDimensions.All.Single(d => KebabName(d.Grouping) == c.Dimension).ValueOf(k) == c.Value)
            && PublishedCells.Leaves(c.Column).Contains(ReportDimensions.Leaf(k)));
        // The small counts never show, totals included (CMS cell size suppression policy: 1 to 10 hidden).
        Assert.DoesNotContain(published, p => p.Value.Value is >= 1 and var v && v <= t);

        foreach (var (cell, count) in published.Where(p => !p.Value.Suppressed))
            Assert.True(Truth(cell) == count.Value, $"{cell}: shown {count.Value}, truth {Truth(cell)}");
        var dimensions = ReportDimensions.All.Select((d, i) => (KebabName(d.Grouping), ReportDimensions.Values(kits)[i]))
            .ToDictionary(x => x.Item1, x => x.Item2);
        var protectedCells = published.Where(p => p.Value.Suppressed).Select(p => p.Key).Where(c => Truth(c) is >= 1 and var v && v <= t).ToList();
        Assert.Contains(protectedCells, c => c is { Dimension: "area", Value: ReportStore.SmallArea, Column: "issued" });

        // Water and soil share no published count, so each kind is its own program, solved on its own thread. Every
        // hidden small count is attacked; neighbours in (period, dimension, value) order come one after another, so
        // each solve starts from a basis close to its answer (GLOP keeps the last one).
        var attacks = new[] { "water", "soil" }.Select(kind => Task.Run(() =>
        {
            var attacker = new LinearAttacker([kind], dimensions);
            foreach (var (cell, count) in published.Where(p => p.Key.Kind == kind && !p.Value.Suppressed))
                attacker.Published(cell, count.Value!.Value);
            Assert.Equal(Google.OrTools.LinearSolver.Solver.ResultStatus.OPTIMAL, attacker.Feasible());
            return protectedCells.Where(c => c.Kind == kind)
                .OrderBy(c => c.Period, StringComparer.Ordinal).ThenBy(c => c.Dimension, StringComparer.Ordinal)
                .ThenBy(c => c.Value, StringComparer.Ordinal).ThenBy(c => c.Column, StringComparer.Ordinal)
                .Select(cell =>
                {
                    var (min, max) = attacker.Range(cell);
                    Assert.InRange(Truth(cell), min - 1e-6, max + 1e-6); // the attacker's program is right about the truth
                    return (Cell: cell, Range: max - min);
                }).ToList();
        })).ToList();
        var ranges = (await Task.WhenAll(attacks)).SelectMany(r => r).ToList();
        var attacked = ranges.Count;
        var (worst, narrowest) = ranges.MinBy(r => r.Range);
        output.WriteLine($"{queries.Count} queries sent ({answered} answered, the rest refused with 400); {published.Count} counts published, " +
            $"{published.Count(p => p.Value.Suppressed)} hidden; {attacked} of {protectedCells.Count} hidden counts from 1 to {t} attacked; " +
            $"narrowest range {narrowest:0.###} (setting {options.MinimumHiddenRange}) at {worst}; {clock.Elapsed.TotalSeconds:0.0} s");
        Assert.True(narrowest >= options.MinimumHiddenRange - 1e-6, $"{worst} narrowed to a range of {narrowest}");
    }

    private static string KebabName<T>(T value) where T : struct, Enum => CommunityLead.Api.Infrastructure.KebabEnum.Name(value);
}
