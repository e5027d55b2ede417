using System.Diagnostics;
using System.Net;
using System.Text;
using System.Text.Json.Nodes;
using CommunityLead.Api.Auth;
using CommunityLead.Tests.Infrastructure;
using Xunit.Abstractions;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>
/// However large a bad batch, the work and the answer stay bounded: the 422 lists the first problems only
/// (LabIntake:MaxProblemsListed), each once, with the exact total and a note that the list is cut.
/// </summary>
public sealed class BadBatchBoundsTests(ITestOutputHelper output)
{
    [Fact]
    public async Task CsvBatch_TenMegabytesOfBadRows_SmallAnswerWithExactCount()
    {
        using var app = new CommunityLeadFactory();
        var lab = app.CreateClient(Roles.Lab);
        var mistyped = Mistyped(NeverIssuedCode());
        // Each row has two problems: its value is no number (found while reading) and its code's check character is wrong.
        var csv = new StringBuilder("sampleType,kitCode,bottle,analyte,value,unit,mdl,reportingLimit\n");
        var rows = 0;
        while (csv.Length < 10 * 1024 * 1024)
        {
            csv.Append("sample,").Append(mistyped).Append(",first-draw,lead,n").Append(rows % 1000).Append(",ug/L,0.3,1.0\n");
            rows++;
        }
        var before = FootprintOf(app);
        var timer = Stopwatch.StartNew();

        var response = await PostCsvAsync(lab, Query("BIG-BAD-1"), csv.ToString());

        var body = await response.Content.ReadAsStringAsync();
        output.WriteLine($"{csv.Length:N0} bytes, {rows:N0} rows: {(int)response.StatusCode} in {timer.Elapsed.TotalSeconds:0.0} s, answer {body.Length:N0} bytes");
        var refused = await ReadAsync(response, HttpStatusCode.UnprocessableEntity);
        Assert.True(body.Length < 100_000, $"The answer is {body.Length:N0} bytes.");
        Assert.Equal(2 * rows, refused["problemCount"]!.GetValue<int>());
        Assert.Equal(200, refused["problemsListed"]!.GetValue<int>());
        Assert.Equal(200, refused["problems"]!.AsArray().Count);
        Assert.Contains("first 200", refused["note"]!.GetValue<string>(), StringComparison.Ordinal);
        Assert.Equal(before, FootprintOf(app));
    }

    [Fact]
    public async Task CsvBatch_MoreProblemsThanTheSetting_FirstOnesListedOnceInFileOrder()
    {
        using var app = new CommunityLeadFactory { Settings = { ["LabIntake:MaxProblemsListed"] = "3" } };
        var lab = app.CreateClient(Roles.Lab);
        var csv = "sampleType,kitCode,bottle,analyte,value,unit,mdl,reportingLimit\n" +
            string.Concat(Enumerable.Range(0, 5).Select(i => $"sample,{NeverIssuedCode()},first-draw,lead,1{i},ug/L,0.3,1.0\n"));

        var refused = await ReadAsync(await PostCsvAsync(lab, Query("CUT-1"), csv), HttpStatusCode.UnprocessableEntity);

        Assert.Equal(5, refused["problemCount"]!.GetValue<int>());
        var problems = refused["problems"]!.AsArray();
        Assert.Equal(["row 2", "row 3", "row 4"], problems.Select(p => p!["row"]!.GetValue<string>()));
        // The reason is said once, in errors under the problem's key; problems gives the order and the parts.
        Assert.All(problems, p => Assert.Null(p!["reason"]));
        var errors = refused["errors"]!.AsObject();
        Assert.Equal(["row 2/kitCode", "row 3/kitCode", "row 4/kitCode"], errors.Select(e => e.Key));
        Assert.Equal(problems.Select(p => p!["key"]!.GetValue<string>()), errors.Select(e => e.Key));
        Assert.Contains("5", refused["note"]!.GetValue<string>(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task JsonBatch_FewProblems_AllListedWithoutNote()
    {
        using var app = new CommunityLeadFactory();
        var lab = app.CreateClient(Roles.Lab);

        var refused = await PostBatchAsync(lab, Batch("FEW-1", [Result(NeverIssuedCode(), "first-draw", 1.0)]), HttpStatusCode.UnprocessableEntity);

        Assert.Equal(1, refused["problemCount"]!.GetValue<int>());
        Assert.Equal(1, refused["problemsListed"]!.GetValue<int>());
        Assert.Null(refused["note"]);
        Assert.Equal("/results/0/kitCode", refused["problems"]![0]!["key"]!.GetValue<string>());
    }
}
