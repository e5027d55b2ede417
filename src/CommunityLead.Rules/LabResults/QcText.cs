using System.Globalization;

namespace CommunityLead.Rules.LabResults;

/// <summary>Numbers in QC details, rounded for people: recoveries to 0.1%, amounts to 4 significant figures.</summary>
internal static class QcText
{
    private static readonly CultureInfo Invariant = CultureInfo.InvariantCulture;

    public static string Percent(double value) => value.ToString("0.0", Invariant) + "%";

    public static string Percent0(double value) => value.ToString("0.##", Invariant) + "%";

    public static string Window(double low, double high) =>
        $"{low.ToString("0.##", Invariant)}–{high.ToString("0.##", Invariant)}%";

    public static string Amount(double value)
    {
        if (value == 0 || !double.IsFinite(value)) return value.ToString(Invariant);
        var decimals = Math.Clamp(3 - (int)Math.Floor(Math.Log10(Math.Abs(value))), 0, 15);
        return Math.Round(value, decimals).ToString("0.###############", Invariant);
    }

    /// <summary>Joins what is missing into one phrase, or null when nothing is.</summary>
    public static string? Missing(params (bool IsMissing, string What)[] items)
    {
        var missing = items.Where(i => i.IsMissing).Select(i => i.What).ToList();
        return missing.Count switch
        {
            0 => null,
            1 => missing[0] + " is missing",
            _ => string.Join(", ", missing[..^1]) + " and " + missing[^1] + " are missing",
        };
    }
}
