namespace CommunityLead.Rules.Calibration;

/// <summary>Figures from a handful of replicate readings.</summary>
public static class Replicates
{
    public static double Mean(IReadOnlyList<double> values) => values.Average();

    /// <summary>Sample standard deviation (n − 1); null for fewer than two readings.</summary>
    public static double? Sd(IReadOnlyList<double> values)
    {
        if (values.Count < 2) return null;
        var mean = values.Average();
        return Math.Sqrt(values.Sum(v => (v - mean) * (v - mean)) / (values.Count - 1));
    }

    /// <summary>Relative standard deviation in percent; null when it means nothing (one reading, mean ≤ 0).</summary>
    public static double? RsdPercent(IReadOnlyList<double> values) =>
        Sd(values) is { } sd && values.Average() is var mean && mean > 0 ? sd / mean * 100 : null;

    /// <summary>Recovery in percent: found ÷ expected × 100.</summary>
    public static double RecoveryPercent(double found, double expected) => found / expected * 100;
}
