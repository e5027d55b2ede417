using MathNet.Numerics.Distributions;
using MathNet.Numerics.Statistics;

namespace CommunityLead.Rules.LabResults;

/// <summary>
/// The method detection limit of 40 CFR 136 Appendix B, Revision 2: the lowest result that can be told apart
/// from method blanks with 99% confidence. MDL_s = t(n−1, 0.99)·s over the spiked replicates, MDL_b from the
/// method blanks, MDL = the larger [published definition; procedure details memory].
/// </summary>
public static class MethodDetectionLimit
{
    /// <summary>Appendix B asks for at least seven spiked samples [published] and seven method blanks [memory].</summary>
    public const int MinimumReplicates = 7;

    /// <summary>From this many blanks on, MDL_b is read off the ranked blanks rather than assuming a normal spread.</summary>
    public const int BlanksForPercentile = 100;

    private const double Confidence = 0.99;

    public static MdlResult Compute(IReadOnlyList<double> spiked, IReadOnlyList<double> blanks)
    {
        Require(spiked, nameof(spiked), "spiked replicates", allowNone: false);
        Require(blanks, nameof(blanks), "method blanks", allowNone: true);

        var t = OneSidedT(spiked.Count - 1);
        var mdlSpiked = t * Spread(spiked);
        double? mdlBlank = blanks.Count switch
        {
            0 => null,
            < BlanksForPercentile => FromBlankSpread(blanks),
            _ => NinetyNinthPercentile(blanks),
        };
        return new MdlResult(mdlSpiked, mdlBlank, Math.Max(mdlSpiked, mdlBlank ?? double.NegativeInfinity), t, spiked.Count);
    }

    /// <summary>The one-sided 99% Student t quantile: 3.143 for 6 degrees of freedom (7 replicates).</summary>
    public static double OneSidedT(int degreesOfFreedom) => StudentT.InvCDF(0, 1, degreesOfFreedom, Confidence);

    /// <summary>
    /// Mean plus t·s of the blanks. A negative mean is taken as zero (Appendix B), so blanks that read below
    /// zero cannot pull the limit under their own spread. Equal blanks have s = 0, leaving the mean.
    /// </summary>
    private static double FromBlankSpread(IReadOnlyList<double> blanks) =>
        Math.Max(blanks.Mean(), 0) + OneSidedT(blanks.Count - 1) * Spread(blanks);

    /// <summary>Sample standard deviation (n − 1); exactly zero for equal values, which the running sums can miss by 1e-17.</summary>
    private static double Spread(IReadOnlyList<double> values) =>
        values.All(v => v == values[0]) ? 0 : values.StandardDeviation();

    /// <summary>
    /// Ranks the blanks from lowest to highest and takes the one at rank 0.99·n rounded to the nearest whole
    /// number, halves up (Appendix B's example, from memory: 164 blanks → 162.36 → the 162nd). Halves go up
    /// because Appendix B asks for a level "no less than" the 99th percentile.
    /// </summary>
    private static double NinetyNinthPercentile(IReadOnlyList<double> blanks)
    {
        var ranked = blanks.Order().ToArray();
        var rank = (int)Math.Round(Confidence * ranked.Length, MidpointRounding.AwayFromZero);
        return ranked[Math.Clamp(rank, 1, ranked.Length) - 1];
    }

    private static void Require(IReadOnlyList<double> values, string parameter, string what, bool allowNone)
    {
        ArgumentNullException.ThrowIfNull(values, parameter);
        if (!(allowNone && values.Count == 0) && values.Count < MinimumReplicates)
            throw new ArgumentException(
                $"The MDL needs at least {MinimumReplicates} {what} (40 CFR 136 Appendix B); got {values.Count}.", parameter);
        var bad = values.Select((v, i) => (v, i)).FirstOrDefault(p => !double.IsFinite(p.v), (0, -1));
        if (bad.i >= 0)
            throw new ArgumentException($"Value {bad.i + 1} of the {what} is {bad.v}, not a number the MDL can use.", parameter);
    }
}
