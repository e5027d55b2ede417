using System.Net;
using System.Net.Http.Json;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>
/// The NUL character is refused where text enters. SQLite would store it and PostgreSQL would fail on it
/// with a 500, so without the check the same request behaves differently on the two stores.
/// </summary>
public class NulTextTests
{
    [Fact]
    public async Task SignUp_NameWithNul_400NamingTheFieldAndNothingStored()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);

        var response = await coordinator.PostAsJsonAsync("/api/households", Household(h => h["name"] = "Marisol\u0000 Quennell"));

        var problem = await ReadAsync(response, HttpStatusCode.BadRequest);
        Assert.Contains("NUL", problem["errors"]!["name"]![0]!.GetValue<string>());
        Assert.Equal(0, app.WithDb(db => db.Households.Count()));
    }

    [Fact]
    public async Task SignUp_NumberWhereTextBelongs_StillSaysUseText()
    {
        using var app = new CommunityLeadFactory();
        var response = await app.CreateClient(Roles.Coordinator).PostAsJsonAsync("/api/households", Household(h => h["name"] = 42));
        var problem = await ReadAsync(response, HttpStatusCode.BadRequest);
        Assert.Equal("Use text in double quotes.", problem["errors"]!["name"]![0]!.GetValue<string>());
    }

    [Fact]
    public async Task Search_QueryWithNul_400NamingTheParameter()
    {
        using var app = new CommunityLeadFactory();
        var response = await app.CreateClient(Roles.Coordinator).GetAsync("/api/households?search=Quen%00nell");
        var problem = await ReadAsync(response, HttpStatusCode.BadRequest);
        Assert.Contains("NUL", problem["errors"]!["search"]![0]!.GetValue<string>());
    }

    [Fact]
    public async Task CsvBatch_CellWithNul_422NamingRowAndColumnAndNothingStored()
    {
        using var app = new CommunityLeadFactory();
        var (coordinator, lab) = (app.CreateClient(Roles.Coordinator), app.CreateClient(Roles.Lab));
        var kit = await ReceivedKitAsync(coordinator, lab);
        var csv = $"kitCode,bottle,analyte,value,unit,mdl,reportingLimit\n{kit},first-draw,lead,12.4,ug/L\u0000,0.3,1.0\n";

        var problem = await ReadAsync(await PostCsvAsync(lab, Query("NUL-1"), csv), HttpStatusCode.UnprocessableEntity);

        var messages = problem["errors"]!["row 2/unit"]!.AsArray().Select(m => m!.GetValue<string>());
        Assert.Contains(messages, m => m.Contains("NUL"));
        Assert.Equal(0, app.WithDb(db => db.LabBatches.Count()));
    }
}
