namespace CommunityLead.Rules.Reports;

/// <summary>
/// The 90th percentile of a set of results by the Lead and Copper Rule method, 40 CFR 141.80(c)(3) [published]:
/// rank ascending 1..n and take the result at rank 0.9·n. Informational only: a community program's homes are
/// not a compliance sample.
/// </summary>
public static class NinetiethPercentile
{
    /// <summary>
    /// Round up: the only rule of the four that always lands on a measured result (like the whole-number case) and
    /// never reports a lower percentile than the others, which suits a health department looking for lead [practice].
    /// </summary>
    public const NinetiethRounding DefaultRounding = NinetiethRounding.RoundUp;

    /// <summary>Below this many results the rank method is not used (../shared/DOMAIN.md §2).</summary>
    public const int FiveSamples = 5;

    /// <summary>
    /// Null for no results. Non-detects come in as whatever the caller decided (usually the reporting limit).
    /// <paramref name="fiveSampleRule"/>: with exactly 5 results, the mean of the two highest, as for systems
    /// serving 100 people or fewer [published]; off, 5 results go through the rank rule (4.5 → rounding).
    /// </summary>
    public static NinetiethResult? Compute(IReadOnlyList<double> values, NinetiethRounding rounding, bool fiveSampleRule = true)
    {
        ArgumentNullException.ThrowIfNull(values);
        if (!Enum.IsDefined(rounding))
            throw new ArgumentOutOfRangeException(nameof(rounding), rounding, "Unknown rounding rule.");
        var bad = values.Select((v, i) => (v, i)).FirstOrDefault(p => !double.IsFinite(p.v), (0, -1));
        if (bad.i >= 0)
            throw new ArgumentException($"Value {bad.i + 1} is {bad.v}, not a result the 90th percentile can use.", nameof(values));
        if (values.Count == 0)
            return null;

        var ranked = Ascending.Of(values);
        var n = ranked.Length;
        if (n < FiveSamples)
            return new(ranked[^1], n, $"the highest of {n} results (fewer than 5: the highest is used)");
        if (n == FiveSamples && fiveSampleRule)
            return new((ranked[3] + ranked[4]) / 2, n,
                "the mean of the two highest of 5 results (the rule for exactly 5 samples, 40 CFR 141.80(c)(3))");
        return ByRank(ranked, rounding);
    }

    // 0.9·n in tenths, in whole numbers, so 0.9 · 20 is exactly rank 18 and 0.9 · 25 exactly 22.5.
    private static NinetiethResult ByRank(double[] ranked, NinetiethRounding rounding)
    {
        var n = ranked.Length;
        int below = (int)(9L * n / 10), tenths = (int)(9L * n % 10);
        var position = $"0.9 × {n} = {below}{(tenths == 0 ? "" : $".{tenths}")}";
        if (tenths == 0)
            return new(At(ranked, below), n, $"the {Ordinal(below)} of {n} ranked results ({position}, 40 CFR 141.80(c)(3))");

        if (rounding == NinetiethRounding.Interpolate)
        {
            var value = At(ranked, below) + tenths / 10.0 * (At(ranked, below + 1) - At(ranked, below));
            return new(value, n, $"{tenths * 10} % of the way from the {Ordinal(below)} to the {Ordinal(below + 1)} " +
                $"of {n} ranked results ({position}; not whole, so interpolated)");
        }
        var rank = rounding switch
        {
            NinetiethRounding.RoundUp => below + 1,
            NinetiethRounding.RoundHalfToEven when tenths == 5 => below % 2 == 0 ? below : below + 1,
            _ => tenths >= 5 ? below + 1 : below,
        };
        var how = rounding switch
        {
            NinetiethRounding.RoundUp => "rounded up",
            NinetiethRounding.RoundHalfToEven => "rounded to the nearest rank, halves to even",
            _ => "rounded to the nearest rank, halves up",
        };
        return new(At(ranked, rank), n, $"the {Ordinal(rank)} of {n} ranked results ({position}; not whole, so {how})");
    }

    private static double At(double[] ranked, int rank) => ranked[rank - 1];

    private static string Ordinal(int k) => (k % 100) switch
    {
        11 or 12 or 13 => $"{k}th",
        _ => (k % 10) switch { 1 => $"{k}st", 2 => $"{k}nd", 3 => $"{k}rd", _ => $"{k}th" },
    };
}
