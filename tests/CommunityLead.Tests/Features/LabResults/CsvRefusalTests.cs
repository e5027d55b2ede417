using System.Net;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>CSV problems are keyed by the file's line (header = line 1) and column, as the lab sees them in a spreadsheet.</summary>
public class CsvRefusalTests
{
    [Fact]
    public async Task CsvBatch_DecimalCommaUnknownColumnAndBadTimes_EveryLineNamedNothingWritten()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var csv = $"""
            sampleType;kitCode;bottle;analyte;value;unit;mdl;reportingLimit;acidifiedAt;colour;expected;measured
            sample;{kit};first-draw;lead;12.4;ug/L;0.3;1.0;;clear;;
            sample;{kit};flushed;lead;12,4;ug/L;0.3;1.0;;clear;;
            sample;{Mistyped(kit)};first-draw;copper;0.3;mg/L;0.002;0.005;;;;
            sample;{kit};first-draw;copper;0.3;mg/L;0.002;0.005;2026-04-03 09:00;;;
            calibration-check;;;lead;;ug/L;;;;;10,0;10.2
            blank;;;lead;;ug/L;;;;;;0.04
            """;
        var before = FootprintOf(app);

        var response = await PostCsvAsync(lab, Query("CSV-BAD-1", analyzedAt: "2026-04-08T14:30:00"), csv, bom: true);

        var refused = await ReadAsync(response, HttpStatusCode.UnprocessableEntity);
        var keys = ProblemKeys(refused);
        Assert.Equal(new HashSet<string>
        {
            "row 1/colour", "row 3/value", "row 4/kitCode", "row 5/acidifiedAt", "row 6/expected", "row 7/sampleType",
            "analyzedAt",
        }, keys);
        // One reason per unreadable cell: "12,4" is not also reported as a missing value.
        var errors = refused["errors"]!;
        Assert.Contains("decimal point", Assert.Single(errors["row 3/value"]!.AsArray())!.GetValue<string>(), StringComparison.Ordinal);
        Assert.Contains("'10,0'", Assert.Single(errors["row 6/expected"]!.AsArray())!.GetValue<string>(), StringComparison.Ordinal);
        var line3 = refused["problems"]!.AsArray().Single(p => p!["row"]?.GetValue<string>() == "row 3")!;
        Assert.Equal("value", line3["field"]!.GetValue<string>());
        Assert.Equal(before, FootprintOf(app));
        Assert.Equal("received", await KitStateAsync(coordinator, kit));
    }

    [Fact]
    public async Task CsvBatch_MissingBatchFieldsInQuery_422ForEachField()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(coordinator, lab);
        var before = FootprintOf(app);

        var response = await PostCsvAsync(lab, "method=EPA%20200.8&correction=maybe",
            $"kitCode,bottle,analyte,value,unit,mdl,reportingLimit\n{kit},first-draw,lead,12.4,ug/L,0.3,1.0\n");

        var keys = ProblemKeys(await ReadAsync(response, HttpStatusCode.UnprocessableEntity));
        Assert.Equal(new HashSet<string> { "batchId", "analyzedAt", "correction" }, keys);
        Assert.Equal(before, FootprintOf(app));
    }

    [Fact]
    public async Task CsvBatch_HeaderOnly_422AskingForResults()
    {
        using var app = new CommunityLeadFactory();
        var lab = app.CreateClient(Roles.Lab);

        var response = await PostCsvAsync(lab, Query("CSV-EMPTY"), "kitCode,bottle,analyte,value,unit,mdl,reportingLimit\n");

        Assert.Equal(new HashSet<string> { "results" }, ProblemKeys(await ReadAsync(response, HttpStatusCode.UnprocessableEntity)));
        Assert.Equal(0, app.WithDb(db => db.LabBatches.Count()));
    }
}

/// <summary>Two things a spreadsheet does to a lab's file, answered in the lab's terms.</summary>
public class CsvSpreadsheetHabitTests
{
    [Fact]
    public async Task Csv_ValueWrittenAsLessThanOne_PointsToTheQualifierColumn()
    {
        using var app = new CommunityLeadFactory();
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(app.CreateClient(Roles.Coordinator), lab);
        var csv = $"kitCode,bottle,analyte,value,unit,mdl,reportingLimit\n{kit},first-draw,lead,<1.0,ug/L,0.3,1.0\n{kit},flushed,lead,1.0,ug/L,0.3,1.0\n";

        var refused = await ReadAsync(await PostCsvAsync(lab, Query("CSV-LT-1"), csv), HttpStatusCode.UnprocessableEntity);

        var reason = Assert.Single(refused["errors"]!["row 2/value"]!.AsArray())!.GetValue<string>();
        Assert.Contains("qualifier column", reason, StringComparison.Ordinal);
        Assert.Contains("qualifier '<', value 1.0", reason, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Csv_RowOfDelimitersOnly_IsABlankRowNotAMissingKitCode()
    {
        using var app = new CommunityLeadFactory();
        var lab = app.CreateClient(Roles.Lab);
        var kit = await ReceivedKitAsync(app.CreateClient(Roles.Coordinator), lab);
        var csv = $"kitCode;bottle;analyte;value;unit;mdl;reportingLimit\n{kit};first-draw;lead;2.0;ug/L;0.3;1.0\n;;;;;;\n" +
                  $"{kit};flushed;lead;1.0;ug/L;0.3;1.0\n;;;;;;\n";

        var response = await PostCsvAsync(lab, Query("CSV-BLANK-1"), csv);

        Assert.True(response.StatusCode == HttpStatusCode.Created, await response.Content.ReadAsStringAsync());
        Assert.Equal(2, app.WithDb(db => db.LabResults.Count(r => r.KitCode == kit)));
    }
}

public class CsvStrayQuoteTests
{
    [Fact]
    public async Task Csv_StrayQuote_OnlyItsRowIsWrongAndLaterRowsAreStillChecked()
    {
        using var app = new CommunityLead.Tests.Infrastructure.CommunityLeadFactory();
        var flow = new CommunityLead.Tests.Features.Interpretation.ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        var csv = "kitCode,bottle,analyte,value,unit,mdl,reportingLimit\n" +
                  $"\"{code},first-draw,lead,2.5,ug/L,0.3,1.0\n" +
                  $"{code},flushed,lead,abc,ug/L,0.3,1.0\n";
        using var content = new System.Net.Http.StringContent(csv, System.Text.Encoding.UTF8, "text/csv");
        var response = await flow.Lab.PostAsync("/api/lab/batches?batchId=Q-1&method=EPA%20200.8&analyzedAt=2026-04-05T10:00:00Z", content);
        Assert.Equal(System.Net.HttpStatusCode.UnprocessableEntity, response.StatusCode);
        var body = await response.Content.ReadAsStringAsync();
        Assert.Contains("row 3/value", body);   // the row after the stray quote is still read and checked
    }
}
