using System.Net;
using System.Text.Json.Nodes;
using Microsoft.AspNetCore.Hosting;
using Npgsql;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>/health is what a load balancer asks before sending an instance work.</summary>
public class HealthTests
{
    [Fact]
    public async Task Health_DatabaseReachable_200Ok()
    {
        using var app = new CommunityLeadFactory();
        var response = await app.CreateClient().GetAsync("/health");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var body = JsonNode.Parse(await response.Content.ReadAsStringAsync())!;
        Assert.Equal("ok", body["status"]!.GetValue<string>());
    }

    [Fact]
    public async Task Health_DatabaseUnreachable_503NamingNoServerOrFile()
    {
        using var app = new CommunityLeadFactory();
        var missing = TestStore.IsPostgres
            ? new NpgsqlConnectionStringBuilder(app.ConnectionString) { Database = "cl_never_created" }.ConnectionString
            : "Data Source=/cl-never-created/x.db";
        using var broken = app.WithWebHostBuilder(b =>
        {
            b.UseSetting("Database:MigrateOnStartup", "false");
            b.UseSetting("ConnectionStrings:CommunityLead", missing);
        });

        var response = await broken.CreateClient().GetAsync("/health");

        Assert.Equal(HttpStatusCode.ServiceUnavailable, response.StatusCode);
        var text = await response.Content.ReadAsStringAsync();
        Assert.Equal("unavailable", JsonNode.Parse(text)!["status"]!.GetValue<string>());
        Assert.DoesNotContain("cl-never-created", text);
        Assert.DoesNotContain("cl_never_created", text);
        Assert.False(Directory.Exists("/cl-never-created"), "a health check must not create the database");
    }
}
