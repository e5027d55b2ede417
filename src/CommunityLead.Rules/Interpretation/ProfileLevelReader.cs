using System.Text.Json;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

/// <summary>Reads one entry of a profile's levels[] and checks what can be checked on the level alone.</summary>
internal static class ProfileLevelReader
{
    /// <summary>How sure a value is, as in the shared domain reference.</summary>
    public static readonly IReadOnlyList<string> Markers = ["published", "memory", "practice"];

    private static readonly IReadOnlyList<string> Fields =
    [
        "analyte", "matrix", "kind", "value", "unit", "meaning", "source", "marker",
        "appliesTo", "onlyWithOtherLeadSource", "effectiveFrom", "effectiveUntil",
    ];

    public static ProfileLevel Read(string fileName, int index, JsonElement element)
    {
        var level = new ProfileObject(fileName, $"levels[{index}]", element, Fields);
        var analyte = level.Choice<Analyte>("analyte");
        var matrix = level.Choice<Matrix>("matrix");
        var kind = level.Choice<LevelKind>("kind");
        CheckKindFitsMatrix(level, kind, matrix);

        var value = level.Number("value");
        if (!double.IsFinite(value) || value <= 0) throw level.Problem("value", $"must be a number above zero, not {value}");
        var unit = level.Text("unit");
        var normal = Analytes.NormalUnit(analyte, matrix);
        if (unit != normal) throw level.Problem("unit", UnitProblem(unit, normal, analyte, matrix));

        var meaning = level.Text("meaning");
        var source = level.Text("source");
        var marker = level.Text("marker");
        if (!Markers.Contains(marker))
            throw level.Problem("marker", $"\"{marker}\" is not one we know; use one of {string.Join(", ", Markers)}");

        var appliesTo = level.Choices<SoilLocation>("appliesTo");
        if (matrix == Matrix.Water && appliesTo is not null)
            throw level.Problem("appliesTo", "is for soil levels only; a water level applies to every tap");
        if (matrix == Matrix.Water && level.Has("onlyWithOtherLeadSource"))
            throw level.Problem("onlyWithOtherLeadSource", "is for soil screening levels only");
        var otherSource = level.Flag("onlyWithOtherLeadSource");

        var from = level.Date("effectiveFrom");
        var until = level.Date("effectiveUntil");
        if (from > until)
            throw level.Problem("effectiveFrom", $"{from:yyyy-MM-dd} is after effectiveUntil {until:yyyy-MM-dd}");

        return new ProfileLevel(analyte, matrix, kind, value, unit, meaning, source, marker, appliesTo, otherSource, from, until);
    }

    // Action levels and aesthetic levels are written for drinking water; soil has hazard and screening levels.
    // An advisory (a stricter level a program warns at) fits either.
    private static void CheckKindFitsMatrix(ProfileObject level, LevelKind kind, Matrix matrix)
    {
        var fits = matrix == Matrix.Soil
            ? kind is LevelKind.SoilLevel or LevelKind.Advisory
            : kind is not LevelKind.SoilLevel;
        if (!fits)
            throw level.Problem("kind", $"{ProfileNames.Of(kind)} does not fit {ProfileNames.Of(matrix)}; " +
                $"use one of {string.Join(", ", KindsFor(matrix).Select(ProfileNames.Of))}");
    }

    private static IEnumerable<LevelKind> KindsFor(Matrix matrix) => matrix == Matrix.Soil
        ? [LevelKind.SoilLevel, LevelKind.Advisory]
        : Enum.GetValues<LevelKind>().Where(k => k != LevelKind.SoilLevel);

    private static string UnitProblem(string unit, string normal, Analyte analyte, Matrix matrix)
    {
        var problem = $"\"{unit}\" is not the unit {ProfileNames.Of(analyte)} in {ProfileNames.Of(matrix)} is kept in; write exactly \"{normal}\"";
        // Levels are compared with stored results without conversion, so even a look-alike micro sign must not pass.
        return normal.Contains('\u00B5') ? problem + " (µ is U+00B5 MICRO SIGN)" : problem;
    }
}
