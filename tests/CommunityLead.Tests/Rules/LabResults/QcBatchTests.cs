using CommunityLead.Rules.LabResults;
using static CommunityLead.Tests.Rules.LabResults.Qc;

namespace CommunityLead.Tests.Rules.LabResults;

public class QcBatchTests
{
    private static QcSample[] Checks(int count, Analyte analyte = Analyte.Lead) =>
        [.. Enumerable.Range(0, count).Select(_ => CalibrationCheck(10.0, 10.0, analyte))];

    private static QcCheck Frequency(QcVerdict verdict, Analyte analyte) =>
        Assert.Single(verdict.Checks, c => c.Type is null && c.Analyte == analyte);

    private static QcVerdict Evaluate(IReadOnlyList<QcSample> qc, Dictionary<Analyte, int> counts) =>
        QcEvaluator.Evaluate(qc, counts, new Dictionary<Analyte, double> { [Analyte.Lead] = 1.0, [Analyte.Copper] = 0.02 }, DefaultWindows);

    // A calibration check after every 10 samples and at the end [published: EPA Methods 200.7/200.8]:
    // 10 samples → 1; 11 → 2 (after the 10th, and at the end); 25 → 3.
    [Theory]
    [InlineData(10, 1, 1, true)]
    [InlineData(11, 1, 2, false)]
    [InlineData(11, 2, 2, true)]
    [InlineData(25, 3, 3, true)]
    [InlineData(25, 2, 3, false)]
    [InlineData(1, 0, 1, false)]
    public void Frequency_ChecksPerTenSamples_RequiredIsCeiling(int samples, int run, int required, bool passed)
    {
        var verdict = Evaluate(Checks(run), new() { [Analyte.Lead] = samples });
        var check = Frequency(verdict, Analyte.Lead);
        Assert.Equal("calibration checks", check.Figure);
        Assert.Equal((double)run, check.Value);
        Assert.Equal((double)required, check.Low);
        Assert.Null(check.High);
        Assert.Equal(passed, check.Passed);
        Assert.Equal(passed, verdict.Passed);
        Assert.Equal(run + 1, verdict.Checks.Count);
    }

    [Fact]
    public void Frequency_TwelveSamplesOneCheck_DetailSaysWhatIsNeeded()
    {
        var check = Frequency(Evaluate(Checks(1), new() { [Analyte.Lead] = 12 }), Analyte.Lead);
        Assert.Equal("12 samples need at least 2 calibration checks (one per 10 samples); 1 was run", check.Detail);
    }

    [Fact]
    public void Frequency_CountsOnlyTheAnalytesOwnChecks()
    {
        var verdict = Evaluate(Checks(1, Analyte.Copper), new() { [Analyte.Lead] = 5, [Analyte.Copper] = 5 });
        Assert.False(Frequency(verdict, Analyte.Lead).Passed);
        Assert.True(Frequency(verdict, Analyte.Copper).Passed);
        Assert.False(verdict.Passed);
    }

    [Fact]
    public void Frequency_AnalyteWithoutSamples_HasNoFrequencyCheck()
    {
        var verdict = Evaluate(Checks(1), new() { [Analyte.Lead] = 3, [Analyte.Copper] = 0 });
        Assert.DoesNotContain(verdict.Checks, c => c.Analyte == Analyte.Copper);
        Assert.True(verdict.Passed);
    }

    [Fact]
    public void Verdict_OneCheckPerQcSampleInOrderThenFrequency()
    {
        QcSample[] qc = [CalibrationCheck(10.0, 10.3), Blank(0.02), FortifiedBlank(20, 17.2), Duplicate(12.0, 10.0), MatrixSpike(4.0, 10.0, 12.1)];
        var verdict = Evaluate(qc, new() { [Analyte.Lead] = 8 });
        Assert.Equal(
            new QcType?[] { QcType.CalibrationCheck, QcType.CalibrationBlank, QcType.FortifiedBlank, QcType.Duplicate, QcType.MatrixSpike, null },
            verdict.Checks.Select(c => c.Type));
        Assert.All(verdict.Checks, c => Assert.True(c.Passed, c.Detail));
        Assert.True(verdict.Passed);
    }

    [Fact]
    public void Verdict_OneFailedCheck_FailsBatch()
    {
        // Everything passes except the fortified blank at 84%.
        QcSample[] qc = [CalibrationCheck(10.0, 10.3), Blank(0.02), FortifiedBlank(20, 16.8), Duplicate(12.0, 10.0)];
        var verdict = Evaluate(qc, new() { [Analyte.Lead] = 8 });
        Assert.Equal(1, verdict.Checks.Count(c => !c.Passed));
        Assert.False(verdict.Passed);
    }

    [Fact]
    public void Verdict_NotEvaluatedDuplicate_DoesNotFailBatch()
    {
        var verdict = Evaluate([CalibrationCheck(10.0, 10.0), Duplicate(0.3, 0.9)], new() { [Analyte.Lead] = 4 });
        Assert.True(verdict.Passed);
    }
}
