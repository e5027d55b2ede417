using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>The results table: one row per finding, in the interpretation's order, and the profile it was judged by.</summary>
internal static class ResultRows
{
    private const string NoLevel = "—";

    public static ResultTable? Table(IReadOnlyList<Finding> findings, LetterLevels levels, string profileName, LetterLanguage language)
    {
        if (findings.Count == 0) return null;
        var rows = findings.Select(f => (IReadOnlyList<string>)
        [
            SampleWords.Sample(f).In(language),
            SampleWords.Metal(f.Analyte).In(language),
            SampleWords.Result(f).In(language),
            ComparedWith(f, levels)?.In(language) ?? NoLevel,
        ]).ToList();
        return new ResultTable([.. LetterWords.TableHeaders.Select(h => h.In(language))], rows,
            LetterWords.TableNote(profileName).In(language));
    }

    private static Phrase? ComparedWith(Finding f, LetterLevels levels)
    {
        if (f.LevelValue is not { } level) return null;
        if (f.Bottle == BottleType.Soil)
            return f.Soil is { } comparison ? SampleWords.SoilComparedWith(comparison, level, f.Unit, f.ScreeningLevel) : null;
        if (f.Band == Band.Urgent && levels.Of(f.Analyte).Action is { } action)
            return SampleWords.UrgentLevels(action, level, f.Unit);
        return SampleWords.Level(Name(f, level, levels.Of(f.Analyte)), level, f.Unit);
    }

    /// <summary>
    /// The kind of level a water finding was compared with, found by its value among the kit's levels. A low or
    /// not-detected finding was compared with the lowest level in effect; if its kind is unknown it is called so.
    /// </summary>
    public static Phrase Name(Finding f, double level, WaterLevels levels)
    {
        bool Is(double? candidate) => candidate is { } c && Math.Abs(c - level) <= Math.Abs(c) * 1e-9;
        if (f.Band == Band.Urgent && Is(levels.Urgent)) return SampleWords.UrgentLevel;
        if (Is(levels.Action)) return SampleWords.ActionLevel;
        if (Is(levels.Caution)) return SampleWords.CautionLevel;
        if (Is(levels.Taste)) return SampleWords.TasteLevel;
        return SampleWords.LowestLevel;
    }
}
