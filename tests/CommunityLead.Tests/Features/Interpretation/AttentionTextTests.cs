using System.Net;
using System.Text.Json.Nodes;
using CommunityLead.Api.Features.Interpretation;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;
using CommunityLead.Tests.Data;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Features.LabResults.LabFixtures;
using static CommunityLead.Tests.Infrastructure.Fixtures;
using KitOutcome = CommunityLead.Rules.Interpretation.Interpretation;

namespace CommunityLead.Tests.Features.Interpretation;

/// <summary>The attention line is stored in a column of its own length, whatever the results and reasons behind it.</summary>
public class AttentionTextTests
{
    private static readonly int Limit = StoreModel.MaxLength("AttentionItem.Detail");

    private static KitOutcome Outcome(IReadOnlyList<Finding> findings, IReadOnlyList<ValidityIssue> validity) =>
        new(Band.Urgent, "profile", 1, findings, null, null, validity, [], []);

    private static List<ValidityIssue> Reasons(int count, Func<int, string> reason) =>
        [.. Enumerable.Range(1, count).Select(i => new ValidityIssue(ValidityIssueCode.CollectionInvalid, reason(i)))];

    [Fact]
    public void AttentionText_WorstCases_FitTheDetailColumn()
    {
        // The largest figure a result can hold (intake refuses what would not stay finite), with the longest unit and
        // analyte name; and more retest reasons than fit, each as long as a stored collection flag can be.
        var finding = new Finding(BottleType.Soil, null, SoilLocation.PlayArea, Analyte.Copper, double.MaxValue, Units.MilligramsPerKilogram,
            false, Band.Urgent, 1, "meaning");
        var flagLength = StoreModel.MaxLength("KitFlag.Message");
        var outcome = Outcome([finding], Reasons(40, i => $"{i:00} {new string('r', flagLength - 3)}")) with
        {
            // Implausible results of every kind, each with the largest figures: more than the line holds.
            Implausible = [.. Enum.GetValues<ImplausibleReason>().SelectMany(reason => Enumerable.Repeat(new ImplausibleResult(reason,
                BottleType.Sequential, int.MaxValue, SoilLocation.DripLine, Analyte.Copper, -double.MaxValue, Units.MilligramsPerKilogram,
                double.MaxValue, double.MaxValue, true, double.MaxValue), 10))],
        };

        foreach (var flag in Enum.GetValues<AttentionFlag>())
            Assert.InRange(AttentionText.For(flag, outcome).Length, 1, Limit);
    }

    [Fact]
    public void AttentionText_ManyRetestReasons_ShowsWhatFitsAndCountsTheRest()
    {
        var reasons = Reasons(30, p => $"The sequential bottle {p} was recorded as collected before the water was last used.");

        var text = AttentionText.For(AttentionFlag.RetestNeeded, Outcome([], reasons));

        Assert.StartsWith($"The sample needs to be taken again: {reasons[0].Reason} {reasons[1].Reason}", text);
        Assert.Matches(@" \(And \d+ more on the kit's interpretation\.\)$", text);
        Assert.InRange(text.Length, Limit - 100, Limit);
    }

    [Fact]
    public void AttentionText_FewRetestReasons_AllShown() =>
        Assert.Equal("The sample needs to be taken again: One. Two.",
            AttentionText.For(AttentionFlag.RetestNeeded, Outcome([], Reasons(2, i => i == 1 ? "One." : "Two."))));

    [Fact]
    public async Task Interpretation_SequentialKitWithAReasonPerBottle_StoredWithAnAttentionLineThatFits()
    {
        // Each bottle's water "last used" after it was collected: a distinct reason per bottle, more than the line holds.
        // On PostgreSQL this interpretation used to fail (value too long) after the results were stored.
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var positions = Enumerable.Range(1, 12).ToList();
        var collection = new
        {
            samples = positions.Select(p => new
            {
                bottle = "sequential", position = p, volumeMl = 125, collectedAt = $"2026-04-03T06:{p:00}:00+00:00",
                waterLastUsedAt = "2026-04-03T07:00:00+00:00",
            }),
        };
        var kit = await ReceivedKitAsync(flow.Coordinator, flow.Lab, kind: "water-sequential", collection: collection);
        JsonObject[] rows = [.. positions.Select(p => { var row = Result(kit, "sequential", 1.5 + p * 0.1); row["position"] = p; return row; })];

        await PostBatchAsync(flow.Lab, Batch("SEQ-1", rows, [.. LeadQc(), Qc("calibration-check", measured: 9.8, expected: 10.0)]), HttpStatusCode.Created);

        Assert.Equal("interpreted", await KitStateAsync(flow.Coordinator, kit));
        Assert.Equal(12, (await flow.InterpretationAsync(kit))["validity"]!.AsArray().Count);
        var item = Assert.Single(await GetArrayAsync(flow.Coordinator, "/api/attention"), a => a!["kitCode"]!.GetValue<string>() == kit)!;
        Assert.Equal("retest-needed", item["reason"]!.GetValue<string>());
        Assert.InRange(item["detail"]!.GetValue<string>().Length, 1, Limit);
        Assert.EndsWith("more on the kit's interpretation.)", item["detail"]!.GetValue<string>());
    }

    [Fact]
    public void AttentionText_ImplausibleLead_SaysWhichResultWhyAndThatTheLetterWaits()
    {
        // "2.0 ppm" read as mg/L: 2,000 µg/L against the 1,000 µg/L default (common practice, our choice).
        var result = new ImplausibleResult(ImplausibleReason.AboveTapWaterRange, BottleType.FirstDraw, null, null, Analyte.Lead, 2000,
            Units.MicrogramsPerLiter, 1000);

        var text = AttentionText.For(AttentionFlag.Implausible, Outcome([], []) with { Implausible = [result] });

        Assert.Equal("Lead 2,000 µg/L in the first draw is above 1,000 µg/L, far more than tap water usually holds: check the lab's " +
            "unit (ppm vs ppb). The letter waits until this item is resolved with a note.", text);
    }

    [Fact]
    public void AttentionText_FlushedFarAboveFirstDraw_NamesBothFiguresAndTheActionLevel()
    {
        var result = new ImplausibleResult(ImplausibleReason.FlushedFarAboveFirstDraw, BottleType.Flushed, null, null, Analyte.Lead, 25,
            Units.MicrogramsPerLiter, 10, FirstDraw: 1, FirstDrawBelowReportingLimit: true, Factor: 10);

        var text = AttentionText.For(AttentionFlag.Implausible, Outcome([], []) with { Implausible = [result] });

        Assert.StartsWith("Lead 25 µg/L in the flushed sample is more than 10 times the first draw (below 1 µg/L) and at or above " +
            "the action level (10 µg/L): check with the household and the lab that the bottles were not swapped.", text);
        Assert.EndsWith(AttentionText.HeldLetter, text);
    }
}
