using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Features.LabResults;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.BadInput;

namespace CommunityLead.Tests.Infrastructure.Fuzz;

/// <summary>
/// The inputs that once answered 500 (issue 12): numbers JSON can spell but a double cannot hold or a formula
/// turns into infinity, dates at the end of the calendar, a null where a bottle belongs. Each is a 400/422
/// naming the field, and nothing is stored.
/// </summary>
public sealed class ExtremeInputTests
{
    [Fact]
    public async Task JsonBatch_ValueBeyondDouble_400NamingValue()
    {
        using var app = new CommunityLeadFactory();
        var (lab, kit) = await ReceivedAsync(app);
        var before = FootprintOf(app);
        // 1e309 is valid JSON but above double.MaxValue (about 1.8e308): System.Text.Json reads it as Infinity.
        var body = Batch("X-INF", BothBottles(kit)).ToJsonString().Replace("12.4", "1e309", StringComparison.Ordinal);

        // A number JSON can spell but no double holds is refused as it is read, like a wrong type: 400, named by its path.
        await ExpectFieldError(await SendRaw(lab, HttpMethod.Post, "/api/lab/batches", body, "application/json"), "results[0].value");
        Assert.Equal(before, FootprintOf(app));
    }

    [Fact]
    public async Task JsonBatch_QcRecoveryBeyondDouble_422NamingTheQcRow()
    {
        using var app = new CommunityLeadFactory();
        var (lab, kit) = await ReceivedAsync(app);
        var before = FootprintOf(app);
        // measured / expected = 1e600: each figure is a double, the recovery is not.
        var batch = Batch("X-QC", BothBottles(kit), [Qc("calibration-blank", measured: 0.04), Qc("calibration-check", measured: 1e300, expected: 1e-300)]);

        var refused = await ExpectProblem(await SendJson(lab, HttpMethod.Post, "/api/lab/batches", batch), HttpStatusCode.UnprocessableEntity);

        Assert.Contains(refused["errors"]!.AsObject(), e => e.Key.StartsWith("/qc/1/", StringComparison.Ordinal));
        Assert.Equal(before, FootprintOf(app));
    }

    [Theory]
    [InlineData(1e308)]
    [InlineData(-1e308)]
    public async Task Mdl_ReplicatesNearDoubleLimit_400NamingSpiked(double extreme)
    {
        using var app = new CommunityLeadFactory();
        var lab = app.CreateClient(Roles.Lab);
        // The standard deviation of these squares each figure: 1e616 is infinity.
        var body = new JsonObject { ["spiked"] = new JsonArray(1.0, 2.0, 3.0, 4.0, 5.0, 6.0, extreme) };

        await ExpectFieldError(await SendJson(lab, HttpMethod.Post, "/api/lab/mdl", body), "spiked[6]");
    }

    [Theory]
    [InlineData("to=9999-12-31", "to")]
    [InlineData("from=0001-01-01", "from")]
    public async Task Summary_DateAtEndOfCalendar_400NamingIt(string query, string field)
    {
        using var app = new CommunityLeadFactory();
        var health = app.CreateClient(Roles.Health);

        await ExpectFieldError(await health.GetAsync($"/api/reports/summary?{query}"), field);
    }

    [Fact]
    public async Task Collection_NullBottle_400NamingIt()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var kit = await Fixtures.IssueKitAsync(coordinator);
        var before = Rows.Count(app);

        await ExpectFieldError(await SendJson(coordinator, HttpMethod.Post, $"/api/kits/{kit}/collection",
            JsonNode.Parse("""{"samples":[null]}""")!), "samples[0]");

        Assert.Equal(before, Rows.Count(app));
    }

    private static async Task<(HttpClient Lab, string Kit)> ReceivedAsync(CommunityLeadFactory app)
    {
        var lab = app.CreateClient(Roles.Lab);
        return (lab, await ReceivedKitAsync(app.CreateClient(Roles.Coordinator), lab));
    }
}
