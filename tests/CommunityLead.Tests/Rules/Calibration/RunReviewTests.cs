using CommunityLead.Rules.Calibration;
using CommunityLead.Rules.LabResults;

namespace CommunityLead.Tests.Rules.Calibration;

/// <summary>The lab's run judged by the service: every window at its default (QcWindows, DOMAIN.md §8).</summary>
public class RunReviewTests
{
    private static readonly QcWindows Windows = new();

    // A straight curve: 50 counts of blank plus 5,000 counts per µg/L, read in triplicate.
    private static StandardReading Standard(double c, double spread = 0.01) =>
        new(c, [50 + 5000 * c * (1 - spread), 50 + 5000 * c, 50 + 5000 * c * (1 + spread)]);

    private static RunCalibration Straight(params double[] blanks) =>
        new(Analyte.Lead, "208Pb", null, [new(0, [38, 50, 62]), Standard(1), Standard(10), Standard(100)], blanks);

    private static RunSample Sample(string label, double reported, double? readsAs = null, int? order = null, bool censored = false) =>
        new(label, Analyte.Lead, reported, censored, 0.3, 1.0,
            readsAs is { } c ? [50 + 5000 * c * 0.99, 50 + 5000 * c, 50 + 5000 * c * 1.01] : null, order);

    private static RunInput Run(RunCalibration? calibration, IReadOnlyList<RunSample> samples, IReadOnlyList<RunQcPoint>? sequence = null,
        IReadOnlyList<ReferenceSoil>? references = null, IReadOnlyList<RepeatReadings>? repeats = null) =>
        new(calibration is null ? [] : [calibration], samples, sequence ?? [], references ?? [], repeats ?? []);

    private static QcCheck Only(RunReview review, string figure) => Assert.Single(review.Checks, c => c.Figure == figure);

    [Fact]
    public void Evaluate_StraightCurveAndConsistentSamples_PassesWithEveryFigure()
    {
        var review = RunReview.Evaluate(Run(Straight(), [Sample("K1 first-draw", 12.4, readsAs: 12.4)]), Windows);

        Assert.All(review.Checks, c => Assert.True(c.Passed, c.Detail));
        Assert.Equal(1, Only(review, "correlation r").Value!.Value, 6);
        Assert.Equal(3, review.Checks.Count(c => c.Figure == "back-calculated %"));
        Assert.Equal(5000, Only(review, "calibration slope").Value!.Value, 6);
        Assert.Equal(0, Only(review, "computed vs reported %").Value!.Value, 6);
        Assert.Equal(12.4, Assert.Single(review.Curves).Computed[0].Concentration, 6);
    }

    [Fact]
    public void Evaluate_CurveBendingOver_FailsCorrelationAndBackCalculation()
    {
        // I = 50 + 5000·c − 22·c²: 22 % low at 100 µg/L, like a detector saturating. Over 0, 1, 10, 50, 100 µg/L
        // r = 0.982 (below 0.995 [memory: Standard Methods 3020]) and the low standards read back far off.
        static StandardReading Bent(double c) => new(c, [50 + 5000 * c - 22 * c * c]);
        var calibration = new RunCalibration(Analyte.Lead, null, null, [Bent(0), Bent(1), Bent(10), Bent(50), Bent(100)], []);

        var review = RunReview.Evaluate(Run(calibration, []), Windows);

        var r = Only(review, "correlation r");
        Assert.False(r.Passed);
        Assert.InRange(r.Value!.Value, 0.97, 0.99);
        Assert.Contains(review.Checks, c => c.Figure == "back-calculated %" && !c.Passed);
    }

    [Fact]
    public void Evaluate_LowestStandardAt125Percent_PassesOnlyBecauseItIsTheLowest()
    {
        // The 1 µg/L standard reads as 1.25: outside ±10 %, inside the lowest standard's ±30 % [practice].
        var calibration = new RunCalibration(Analyte.Lead, null, null,
            [new(0, [50]), new(1, [50 + 6250]), new(10, [50 + 50_000]), new(100, [50 + 500_000])], []);

        var back = RunReview.Evaluate(Run(calibration, []), Windows).Checks.Where(c => c.Figure == "back-calculated %").ToList();

        Assert.Equal((70.0, 130.0), (back[0].Low!.Value, back[0].High!.Value));
        Assert.True(back[0].Passed, back[0].Detail);
        Assert.Equal((90.0, 110.0), (back[1].Low!.Value, back[1].High!.Value));
    }

    [Fact]
    public void Evaluate_SampleAboveTheHighestStandard_FailsAndSaysDiluteAndAnalyseAgain()
    {
        var review = RunReview.Evaluate(Run(Straight(), [Sample("K9 first-draw", 240, readsAs: 240)]), Windows);

        var range = Only(review, "calibrated range");
        Assert.False(range.Passed);
        Assert.Equal(100, range.High);
        Assert.Contains("K9 first-draw", range.Detail, StringComparison.Ordinal);
        Assert.Contains("above the calibrated range: dilute and analyse again", range.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_SampleBetweenDetectionLimitAndLowestStandard_IsAnEstimateThatPasses()
    {
        var review = RunReview.Evaluate(Run(Straight(), [Sample("K2 flushed", 0.6)]), Windows);

        var range = Only(review, "calibrated range");
        Assert.True(range.Passed);
        Assert.Contains("an estimate (J)", range.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_ReportedValueFarFromTheLabsOwnIntensities_FailsNamingTheSample()
    {
        // The intensities read 8.0 µg/L through the curve; the lab reported 12.4: |8 − 12.4| / 12.4 = 35.5 % > 10 %.
        var review = RunReview.Evaluate(Run(Straight(), [Sample("K3 first-draw", 12.4, readsAs: 8.0)]), Windows);

        var compare = Only(review, "computed vs reported %");
        Assert.False(compare.Passed);
        Assert.Equal(35.4839, compare.Value!.Value, 3);
        Assert.StartsWith("K3 first-draw", compare.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_CensoredResultWhoseIntensitiesReadAboveTheReportingLimit_Fails()
    {
        var review = RunReview.Evaluate(Run(Straight(), [Sample("K4 flushed", 0.5, readsAs: 3.0, censored: true)]), Windows);

        Assert.False(Only(review, "computed vs reported %").Passed);
    }

    [Fact]
    public void Evaluate_ReplicatesSpreadBelowTheQuantitationLimit_AreNotJudged()
    {
        // Blank SD 10 counts → LOQ = 10·10/5000 = 0.02 µg/L. A 0.01 µg/L sample is below it, a 5 µg/L one is judged.
        var blanks = new double[] { 40, 50, 60, 50, 40, 60, 50 };
        var noisy = new RunSample("K5 first-draw", Analyte.Lead, 5, false, 0.3, 1.0, [50 + 20_000, 50 + 25_000, 50 + 30_000], null);
        var review = RunReview.Evaluate(Run(Straight(blanks), [noisy]), Windows);

        var rsd = review.Checks.Single(c => c.Figure == "replicate RSD %" && c.Detail.Contains("K5", StringComparison.Ordinal));
        Assert.False(rsd.Passed);
        // s = 5,000 counts over a mean of 25,050: 19.96 %, over 10 % [practice].
        Assert.Equal(19.960, rsd.Value!.Value, 3);
        var blankStandard = review.Checks.First(c => c.Figure == "replicate RSD %");
        Assert.StartsWith("Not judged", blankStandard.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_BlanksNoisierThanTheReportingLimitAllows_FailTheDetectionLimit()
    {
        // Blanks 0, 4000, 1000, 5000, 200: s = √(21,232,000 / 4) = 2,303.9 counts → LOD = 3 · 2303.9 / 5000 = 1.38 µg/L,
        // above the reporting limit of 1.0 [published: IUPAC 3·s definition].
        var review = RunReview.Evaluate(Run(Straight(0, 4000, 1000, 5000, 200), [Sample("K6 first-draw", 5)]), Windows);

        var lod = Only(review, "detection limit from blanks");
        Assert.False(lod.Passed);
        // The window's top is the lower of the reporting limit (1.0) and 2 × the MDL (0.6) [our default].
        Assert.Equal(0.6, lod.High!.Value, 12);
        Assert.Equal(1.3824, lod.Value!.Value, 3);
        Assert.Contains("above the reporting limit", lod.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_ElevenSamplesBetweenChecksAndNoneAtTheEnd_FailsSpacing()
    {
        // One check after every 10 samples and at the end [published: EPA Methods 200.7/200.8].
        var samples = Enumerable.Range(2, 11).Select(p => Sample($"K{p}", 5, order: p)).ToList();
        var review = RunReview.Evaluate(Run(null, samples, [new(QcType.CalibrationCheck, Analyte.Lead, 1, 10, 10)]), Windows);

        var spacing = Only(review, "check-standard spacing");
        Assert.False(spacing.Passed);
        Assert.Equal(11, spacing.Value);
        Assert.Contains("no check after the last sample", spacing.Detail, StringComparison.Ordinal);
    }

    [Fact]
    public void Evaluate_TenSamplesThenACheck_PassesSpacing()
    {
        var samples = Enumerable.Range(2, 10).Select(p => Sample($"K{p}", 5, order: p)).ToList();
        var review = RunReview.Evaluate(Run(null, samples,
            [new(QcType.CalibrationCheck, Analyte.Lead, 1, 10, 10), new(QcType.CalibrationCheck, Analyte.Lead, 12, 10, 10.1)]), Windows);

        Assert.True(Only(review, "check-standard spacing").Passed);
    }

    [Fact]
    public void Evaluate_BlanksRisingThroughTheRun_FailDrift()
    {
        // 0.05 → 0.85 µg/L: a drift of 0.8, beyond 0.5 × the reporting limit of 1.0 [our default].
        RunQcPoint Blank(int at, double value) => new(QcType.CalibrationBlank, Analyte.Lead, at, null, value);
        var review = RunReview.Evaluate(Run(null, [Sample("K1", 5, order: 3)],
            [new(QcType.CalibrationCheck, Analyte.Lead, 1, 10, 10), Blank(2, 0.05), new(QcType.CalibrationCheck, Analyte.Lead, 4, 10, 10), Blank(5, 0.85)]), Windows);

        var drift = Only(review, "blank drift");
        Assert.False(drift.Passed);
        Assert.Equal(0.8, drift.Value!.Value, 9);
    }

    [Fact]
    public void Evaluate_ReferenceSoilAndRepeats_JudgedByRecoveryAndCombinedSigma()
    {
        // 1,120 / 1,400 = 80 % passes (window 80–120 % [memory]); 1,000 / 1,400 = 71.4 % fails.
        // Repeats 754 ± 6 and 790 ± 6 differ by 36 / √72 = 4.24 σ, more than 2 [practice]; 754 ± 6 and 760 ± 6 by 0.71 σ.
        var review = RunReview.Evaluate(Run(null, [],
            references: [new("Reference A", 1400, 10, [new(1100, 20), new(1140, 20)]), new("Reference B", 1400, 10, [new(1000, 20)])],
            repeats: [new("K1 drip-line", [new(754, 6), new(790, 6)]), new("K2 garden", [new(754, 6), new(760, 6)])]), Windows);

        var references = review.Checks.Where(c => c.Figure == "reference soil recovery %").ToList();
        Assert.Equal((80.0, true), (Math.Round(references[0].Value!.Value, 9), references[0].Passed));
        Assert.False(references[1].Passed);
        var repeats = review.Checks.Where(c => c.Figure == "repeat agreement (σ)").ToList();
        Assert.Equal(4.2426, repeats[0].Value!.Value, 3);
        Assert.False(repeats[0].Passed);
        Assert.True(repeats[1].Passed);
    }

    [Fact]
    public void Extend_AnyRunFailure_FailsTheBatchVerdict()
    {
        var review = RunReview.Evaluate(Run(Straight(), [Sample("K9", 240, readsAs: 240)]), Windows);
        var passing = new QcVerdict(true, []);

        var verdict = review.Extend(passing);

        Assert.False(verdict.Passed);
        Assert.Equal(review.Checks.Count, verdict.Checks.Count);
    }
}
