using System.Text;
using System.Text.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Api.Features.LabResults;
using CommunityLead.Rules.Kits;
using CommunityLead.Tests.Infrastructure;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Options;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>
/// A CSV batch is read twice from its spooled file: checked, then, inside the store's transaction, read and checked
/// again a chunk at a time as it is written. The second reading must hand out exactly what the first passed, and
/// must refuse to go on when a kit has moved in between.
/// </summary>
public class SpooledResultsTests
{
    [Fact]
    public async Task SecondReading_SameRowsAsTheChecks_ThenRefusedOnceAKitClosedInBetween()
    {
        using var app = new CommunityLeadFactory();
        var (coordinator, lab) = (app.CreateClient(Roles.Coordinator), app.CreateClient(Roles.Lab));
        var (kept, closed) = (await ReceivedKitAsync(coordinator, lab), await ReceivedKitAsync(coordinator, lab));
        var spool = new MemoryStream(Encoding.UTF8.GetBytes(
            "sampleType,kitCode,bottle,analyte,value,unit,mdl,reportingLimit,expected,measured\n" +
            $"sample,{kept},first-draw,lead,12.4,ug/L,0.3,1.0,,\nsample,{closed},first-draw,lead,0.018,mg/L,0.0003,0.001,,\n" +
            $"sample,{kept},flushed,lead,3.1,ug/L,0.3,1.0,,\ncalibration-blank,,,lead,,ug/L,,,,0.04\n" +
            $"sample,{closed},flushed,lead,2.0,ug/L,0.3,1.0,,\n"));
        await using var scope = app.Services.CreateAsyncScope();
        var services = scope.ServiceProvider;
        var db = services.GetRequiredService<CommunityLeadDb>();
        var intake = new BatchIntakeContext(db, services.GetRequiredService<IOptions<LabIntakeOptions>>().Value,
            services.GetRequiredService<IOptions<JsonOptions>>().Value.SerializerOptions, services.GetRequiredService<TimeProvider>(),
            services.GetRequiredService<InterpretWithResults>(), services.GetRequiredService<InterpretationRepair>(), new Actor("partner-lab", Roles.Lab));
        var header = new BatchRequest("SPOOL-1", "EPA 200.8", AnalyzedAt, null, null, [], []);
        var problems = new BatchProblemList(10);
        var checker = new BatchChecker(db, intake.Options, intake.Clock);
        checker.Begin(header, problems);
        var passed = new List<CheckedResult>();
        await CsvBatchReader.ReadRowsAsync(spool, problems, async rows => passed.AddRange(await checker.AddResultsAsync(rows, default)), default);
        Assert.Equal(0, problems.Count);
        var results = new SpooledResults(spool, header, intake);

        var again = new List<CheckedResult>();
        await results.ForEachChunkAsync(chunk => { again.AddRange(chunk); return Task.CompletedTask; });
        // The same rows, normalised the same way (18 µg/L from 0.018 mg/L), in the file's order.
        Assert.Equal(Figures(passed), Figures(again));
        Assert.Equal([12.4, 18, 3.1, 2.0], again.Select(r => Math.Round(r.Value, 9)));

        await db.Kits.Where(k => k.Code == closed).ExecuteUpdateAsync(set => set.SetProperty(k => k.State, KitState.Closed));
        var changed = await Assert.ThrowsAsync<SpooledResults.ChangedException>(() => results.ForEachChunkAsync(_ => Task.CompletedTask));
        Assert.Contains($"Kit {closed} is closed", changed.Message);
    }

    private static string Figures(IEnumerable<CheckedResult> rows) => string.Join("; ", rows.Select(r =>
        $"{r.Row.Where} {r.Key} {r.Value} {r.Unit} {r.Mdl} {r.ReportingLimit} {r.CollectedAt:O} {JsonSerializer.Serialize(r.Holding)}"));
}
