using System.Net;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.LabResults;

public class MdlEndpointTests
{
    [Fact]
    public async Task Mdl_WorkedExampleOfSevenReplicates_AboutOne()
    {
        using var app = new CommunityLeadFactory();
        var lab = app.CreateClient(Roles.Lab);

        // [published: Berthouex & Brown, Statistics for Environmental Engineers, 2002, Ex. 14.1]
        var mdl = await PostAsync(lab, "/api/lab/mdl", new { spiked = new[] { 2.5, 2.7, 2.2, 2.2, 3.1, 2.6, 2.8 } }, HttpStatusCode.OK);

        Assert.Equal(7, mdl["n"]!.GetValue<int>());
        // One-sided 99% t for n = 7 (6 degrees of freedom) is 3.143 [published: Wisconsin NR 252 table].
        Assert.Equal(3.143, mdl["t"]!.GetValue<double>(), 3);
        // s = 0.3237 (by hand: mean 18.1 / 7 = 2.5857, squared deviations sum 0.6286, / 6, square root);
        // MDL = 3.143 × 0.3237 = 1.017, "≈ 1.0" in the worked example.
        Assert.Equal(1.017, mdl["mdlSpiked"]!.GetValue<double>(), 3);
        Assert.Equal(1.0, mdl["mdl"]!.GetValue<double>(), 1);
        Assert.Null(mdl["mdlBlank"]);
    }

    [Fact]
    public async Task Mdl_FewerThanSevenSpiked_400NamingSpiked()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);

        var problem = await PostAsync(coordinator, "/api/lab/mdl", new { spiked = new[] { 2.5, 2.7, 2.2, 2.2, 3.1, 2.6 } },
            HttpStatusCode.BadRequest);

        Assert.Contains("at least 7", problem["errors"]!["spiked"]![0]!.GetValue<string>(), StringComparison.Ordinal);
    }
}
