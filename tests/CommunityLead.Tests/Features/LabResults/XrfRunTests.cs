using System.Net;
using System.Text.Json;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.LabResults;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>Soil batches with the XRF's reference soil and repeat readings, in CSV; and batches without a run hash as before.</summary>
public class XrfRunTests
{
    [Fact]
    public async Task CsvSoilBatch_ReferenceSoilLowAndRepeatsApart_HeldWithBothFigures()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab, kind: "soil");
        // Reference: 1,000 and 1,040 average 1,020 of a certified 1,400 mg/kg, 72.9 % (window 80–120 % [memory]).
        // Repeats of the play-area cup: 754 ± 6 and 790 ± 6 are 36 / √72 = 4.2 combined σ apart (at most 2 [practice]).
        var csv = string.Join('\n',
            "sampleType,kitCode,bottle,location,analyte,value,unit,mdl,reportingLimit,uncertainty,expected,measured,reference,certifiedUncertainty",
            $"sample,{kit},soil,play-area,lead,770,mg/kg,12,20,6,,,,",
            $"sample,{kit},soil,garden,lead,180,mg/kg,12,20,5,,,,",
            "calibration-blank,,,,lead,,mg/kg,,,,,4,,",
            "calibration-check,,,,lead,,mg/kg,,,,500,489,,",
            "xrf-reference,,,,lead,,mg/kg,,,20,1400,1000,Reference soil A,10",
            "xrf-reference,,,,lead,,mg/kg,,,20,1400,1040,Reference soil A,10",
            $"xrf-repeat,{kit},,play-area,lead,,mg/kg,,,6,,754,,",
            $"xrf-repeat,{kit},,play-area,lead,,mg/kg,,,6,,790,,") + "\n";

        var outcome = await ReadAsync(await PostCsvAsync(lab, Query("XRF-RUN-1", method: "EPA 6200"), csv), HttpStatusCode.Created);

        Assert.Equal("held", outcome["status"]!.GetValue<string>());
        var checks = outcome["qc"]!["checks"]!.AsArray().Select(c => c!.AsObject()).ToList();
        var reference = Assert.Single(checks, c => c["figure"]!.GetValue<string>() == "reference soil recovery %");
        Assert.Equal(72.857, reference["value"]!.GetValue<double>(), 3);
        Assert.False(reference["passed"]!.GetValue<bool>());
        var repeat = Assert.Single(checks, c => c["figure"]!.GetValue<string>() == "repeat agreement (σ)");
        Assert.Equal(4.243, repeat["value"]!.GetValue<double>(), 3);
        Assert.Contains($"{kit} play-area", repeat["detail"]!.GetValue<string>(), StringComparison.Ordinal);
        Assert.Equal("received", await KitStateAsync(coordinator, kit));
    }

    [Fact]
    public void ContentHash_BatchWithoutARun_WritesNoneOfTheRunsFields()
    {
        // Batches posted before the run blocks existed must hash as they did, or a lab's retry would look like new content.
        var json = new JsonSerializerOptions(JsonSerializerDefaults.Web);
        CommunityLead.Api.Infrastructure.JsonSetup.Configure(json);
        var request = new BatchRequest("B-1", "EPA 200.8", "2026-04-08T14:30:00-05:00", null, null,
            [new ResultRow("K", "first-draw", null, null, "lead", 3.2, "ug/L", null, 0.3, 1.0, null, null, null)],
            [new QcRow("calibration-check", "lead", 10, 10.1, null, null, null, "ug/L")]);

        var written = JsonSerializer.Serialize(request, json);

        Assert.DoesNotContain("\"run\"", written, StringComparison.Ordinal);
        Assert.DoesNotContain("intensities", written, StringComparison.Ordinal);
        Assert.DoesNotContain("runOrder", written, StringComparison.Ordinal);
        Assert.Equal(BatchIntake.ContentHash(request, json), BatchIntake.ContentHash(request with { Run = null }, json));
    }
}
