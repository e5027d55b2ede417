using System.Net;
using System.Net.Http.Json;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>A batch with any bad row is refused whole: 422 naming every problem, and not one row written.</summary>
public class BatchRefusalTests
{
    [Theory]
    [InlineData("unknown kit", "/results/0/kitCode", "No kit")]
    [InlineData("mistyped kit code", "/results/0/kitCode", "mistyped")]
    [InlineData("kit only issued", "/results/0/kitCode", "is issued")]
    [InlineData("bottle not recorded", "/results/0/bottle", "no fifth-liter bottle")]
    [InlineData("unknown analyte", "/results/0/analyte", "'zinc'")]
    [InlineData("water unit for soil", "/results/0/unit", "water unit")]
    [InlineData("negative value", "/results/0/value", "zero or more")]
    [InlineData("mdl above reporting limit", "/results/0/mdl", "above the reporting limit")]
    [InlineData("no reporting limit", "/results/0/reportingLimit", "required")]
    [InlineData("duplicate row", "/results/2/analyte", "already reported at /results/0")]
    [InlineData("'<' not at the limit", "/results/0/value", "must be the reporting limit")]
    [InlineData("analysis time without offset", "analyzedAt", "UTC offset")]
    [InlineData("acid time without offset", "/results/0/acidifiedAt", "UTC offset")]
    [InlineData("acidified after analysis", "/results/0/acidifiedAt", "after the batch was analyzed")]
    // At least 16 h between acid and analysis [from memory: EPA Methods 200.7/200.8 §8.3]; 19:30Z − 03:45Z = 15 h 45 min.
    [InlineData("analyzed too soon after acid", "/results/0/acidifiedAt", "analyzed 15 h 45 min after acid was added; wait at least 16 h")]
    [InlineData("unknown QC type", "/qc/0/type", "calibration-check")]
    public async Task JsonBatch_OneBadRow_422NamingItAndNothingWritten(string problem, string key, string reason)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var soilKit = await ReceivedKitAsync(coordinator, lab, kind: "soil");
        var issuedKit = await IssueKitAsync(coordinator);
        var batch = Batch("BAD-1", BothBottles(kit));
        var first = batch["results"]![0]!.AsObject();
        switch (problem)
        {
            case "unknown kit": first["kitCode"] = NeverIssuedCode(); break;
            case "mistyped kit code": first["kitCode"] = Mistyped(kit); break;
            case "kit only issued": first["kitCode"] = issuedKit; break;
            case "bottle not recorded": first["bottle"] = "fifth-liter"; break;
            case "unknown analyte": first["analyte"] = "zinc"; break;
            case "water unit for soil":
                batch["results"]![0] = Result(soilKit, "soil", 520, unit: "ug/L");
                batch["results"]![0]!["location"] = "play-area";
                break;
            case "negative value": first["value"] = -0.5; break;
            case "mdl above reporting limit": first["mdl"] = 2.0; break;
            case "no reporting limit": first.Remove("reportingLimit"); break;
            case "duplicate row": batch["results"]!.AsArray().Add(Result(kit, "first-draw", 11.9)); break;
            case "'<' not at the limit": (first["qualifier"], first["value"]) = ("<", 0.5); break;
            case "analysis time without offset": batch["analyzedAt"] = "2026-04-08T14:30:00"; break;
            case "acid time without offset": first["acidifiedAt"] = "2026-04-03T09:00:00"; break;
            case "acidified after analysis": first["acidifiedAt"] = "2026-04-09T09:00:00+00:00"; break;
            case "analyzed too soon after acid": first["acidifiedAt"] = "2026-04-08T03:45:00+00:00"; break;
            case "unknown QC type": batch["qc"]![0]!["type"] = "spike"; break;
        }
        var before = FootprintOf(app);

        var refused = await PostBatchAsync(lab, batch, HttpStatusCode.UnprocessableEntity);

        var keys = ProblemKeys(refused);
        Assert.Equal([key], keys);
        Assert.Contains(reason, refused["errors"]![key]![0]!.GetValue<string>(), StringComparison.OrdinalIgnoreCase);
        Assert.Equal(before, FootprintOf(app));
        Assert.Equal("received", await KitStateAsync(coordinator, kit));
    }

    [Fact]
    public async Task JsonBatch_ResultsForAClosedKit_422SayingItTakesNoMoreAndWhatToDo()
    {
        using var app = new CommunityLeadFactory();
        var (coordinator, lab) = (app.CreateClient(Roles.Coordinator), app.CreateClient(Roles.Lab));
        var kit = await ReceivedKitAsync(coordinator, lab);
        app.WithDb(db =>
        {
            foreach (var k in db.Kits.Where(k => k.Code == kit)) k.State = CommunityLead.Rules.Kits.KitState.Closed;
            return db.SaveChanges();
        });

        var refused = await PostBatchAsync(lab, Batch("LATE-1", BothBottles(kit)), HttpStatusCode.UnprocessableEntity);

        var reason = refused["errors"]!["/results/0/kitCode"]![0]!.GetValue<string>();
        Assert.Contains("is closed and takes no more results", reason, StringComparison.Ordinal);
        Assert.Contains("replacement kit", reason, StringComparison.Ordinal);
    }

    [Fact]
    public async Task JsonBatch_AnalyzedExactly16HoursAfterAcid_IsAccepted()
    {
        // The wait is "at least 16 h" [from memory: EPA Methods 200.7/200.8 §8.3]: exactly 16 h is enough.
        using var app = new CommunityLeadFactory();
        var (coordinator, lab) = (app.CreateClient(Roles.Coordinator), app.CreateClient(Roles.Lab));
        var kit = await ReceivedKitAsync(coordinator, lab);
        var batch = Batch("WAIT-16", BothBottles(kit));
        batch["results"]![0]!["acidifiedAt"] = "2026-04-08T03:30:00+00:00"; // analysis at 19:30Z

        await PostBatchAsync(lab, batch, HttpStatusCode.Created);
    }

    [Fact]
    public async Task JsonBatch_ManyBadRows_EveryProblemInOne422()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var soilKit = await ReceivedKitAsync(coordinator, lab, kind: "soil");
        var issuedKit = await IssueKitAsync(coordinator);
        var soilWithWaterUnit = Result(soilKit, "soil", 520, unit: "ug/L");
        soilWithWaterUnit["location"] = "play-area";
        var belowLimit = Result(kit, "flushed", 0.5, analyte: "copper", unit: "mg/L", mdl: 0.002, reportingLimit: 0.005);
        belowLimit["qualifier"] = "<";
        var noLimit = Result(kit, "first-draw", 0.3, analyte: "copper", unit: "mg/L", mdl: 0.002);
        noLimit.Remove("reportingLimit");
        var lateAcid = Result(kit, "flushed", 3.1);
        lateAcid["acidifiedAt"] = "2026-04-03 09:00";
        var batch = Batch("BAD-MANY",
        [
            Result(NeverIssuedCode(), "first-draw", 1),              // 0
            Result(Mistyped(kit), "first-draw", 1),                  // 1
            Result(issuedKit, "first-draw", 1),                      // 2
            Result(kit, "fifth-liter", 1),                           // 3
            Result(kit, "first-draw", 1, analyte: "zinc"),           // 4
            soilWithWaterUnit,                                       // 5
            Result(kit, "first-draw", 12.4),                         // 6 fine on its own
            Result(kit, "first-draw", 12.4),                         // 7 duplicate of 6
            Result(kit, "flushed", -1, analyte: "copper", unit: "mg/L", mdl: 0.002, reportingLimit: 0.005), // 8
            Result(kit, "first-draw", 2, analyte: "copper", unit: "mg/L", mdl: 0.01, reportingLimit: 0.005), // 9
            noLimit,                                                 // 10
            belowLimit,                                              // 11
            lateAcid,                                                // 12
        ],
        [Qc("calibration-check", measured: 10.2, expected: 10.0, unit: "furlongs")]);
        var before = FootprintOf(app);

        var refused = await PostBatchAsync(lab, batch, HttpStatusCode.UnprocessableEntity);

        var expected = new HashSet<string>
        {
            "/results/0/kitCode", "/results/1/kitCode", "/results/2/kitCode", "/results/3/bottle", "/results/4/analyte",
            "/results/5/unit", "/results/7/analyte", "/results/8/value", "/results/9/mdl", "/results/10/reportingLimit",
            "/results/11/value", "/results/12/acidifiedAt", "/qc/0/unit",
        };
        Assert.Equal(expected, ProblemKeys(refused));
        Assert.Equal(13, refused["problems"]!.AsArray().Count);
        Assert.Equal(before, FootprintOf(app));
    }

    [Fact]
    public async Task JsonBatch_NoResultsAndNoBatchFields_422ForEachField()
    {
        using var app = new CommunityLeadFactory();
        var lab = app.CreateClient(Roles.Lab);
        var before = FootprintOf(app);

        var response = await lab.PostAsJsonAsync("/api/lab/batches", new JsonObject { ["results"] = new JsonArray() });

        var keys = ProblemKeys(await ReadAsync(response, HttpStatusCode.UnprocessableEntity));
        Assert.Equal(["analyzedAt", "batchId", "method", "results"], keys.Order(StringComparer.Ordinal));
        Assert.Equal(before, FootprintOf(app));
    }

    [Theory]
    [InlineData("value", "/results/0/value")]
    [InlineData("replicates", "/results/0/replicates")]
    [InlineData("qc measured", "/qc/1/measured")]
    public async Task JsonBatch_FigureTooLargeToConvert_422NamingItAndNothingWritten(string figure, string key)
    {
        // 1e306 mg/L is a finite number, but × 1000 to µg/L it is not: stored or written as JSON it used to be a 500.
        using var app = new CommunityLeadFactory();
        var (coordinator, lab) = (app.CreateClient(Roles.Coordinator), app.CreateClient(Roles.Lab));
        var kit = await ReceivedKitAsync(coordinator, lab);
        var batch = Batch("HUGE-1", BothBottles(kit));
        var first = batch["results"]![0]!.AsObject();
        (first["unit"], first["value"], first["mdl"], first["reportingLimit"]) = ("mg/L", 0.0124, 0.0003, 0.001);
        switch (figure)
        {
            case "value": first["value"] = 1e306; break;
            case "replicates": first["replicates"] = new JsonArray(0.0124, 1e306); break;
            default: (batch["qc"]![1]!["unit"], batch["qc"]![1]!["measured"]) = ("mg/L", 1e306); break;
        }
        var before = FootprintOf(app);

        var refused = await PostBatchAsync(lab, batch, HttpStatusCode.UnprocessableEntity);

        Assert.Equal([key], ProblemKeys(refused));
        Assert.Contains("too large to convert", refused["errors"]![key]![0]!.GetValue<string>());
        Assert.Equal(before, FootprintOf(app));
    }
}
