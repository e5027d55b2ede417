namespace CommunityLead.Rules.LabResults;

/// <summary>
/// Turns the units labs write into our stored units. For water 1 ppb = 1 µg/L and 1 ppm = 1 mg/L; for soil
/// 1 ppm = 1 mg/kg (DOMAIN.md, units line). ppb is not accepted for soil: it would mean µg/kg, which no
/// soil level is written in, so it is more likely a slip than a real soil result.
/// </summary>
public static class Units
{
    /// <summary>Micrograms per liter, written with U+00B5 MICRO SIGN.</summary>
    public const string MicrogramsPerLiter = "\u00B5g/L";
    public const string MilligramsPerLiter = "mg/L";
    public const string MilligramsPerKilogram = "mg/kg";

    private const string WaterChoices = "µg/L, ug/L, ppb, mg/L or ppm";
    private const string SoilChoices = "mg/kg or ppm";

    private enum Written { MicrogramsPerLiter, MilligramsPerLiter, MilligramsPerKilogram, Ppb, Ppm }

    public static bool TryFactor(Analyte analyte, Matrix matrix, string? unit, out double factor, out string? error)
    {
        factor = 0;
        var text = unit?.Trim() ?? "";
        var written = Recognize(text);
        var choices = matrix == Matrix.Soil ? SoilChoices : WaterChoices;
        error = (written, matrix) switch
        {
            _ when text.Length == 0 => $"No unit was given; use {choices}",
            (null, _) or (Written.Ppb, Matrix.Soil) => $"'{text}' is not a unit we accept; use {choices}",
            (Written.MilligramsPerKilogram, Matrix.Water) => $"{text} is a soil unit; this is a water sample",
            (Written.MicrogramsPerLiter or Written.MilligramsPerLiter, Matrix.Soil) => $"{text} is a water unit; this is a soil sample",
            _ => null,
        };
        if (error is not null) return false;

        // Soil is always stored in mg/kg, and ppm is mg/kg there, so every accepted soil unit has factor 1.
        if (matrix == Matrix.Soil)
        {
            factor = 1;
            return true;
        }
        var inMilligrams = written is Written.MilligramsPerLiter or Written.Ppm;
        factor = (analyte, inMilligrams) switch
        {
            (Analyte.Lead, true) => 1000,
            (Analyte.Copper, false) => 0.001,
            _ => 1,
        };
        return true;
    }

    private static Written? Recognize(string text)
    {
        // Both micro characters occur in the wild: U+00B5 from keyboards, U+03BC (Greek mu) from copied PDFs.
        // Lower-casing first also folds a capital Greek mu (U+039C) into U+03BC.
        var key = text.ToLowerInvariant().Replace('\u00B5', 'u').Replace('\u03BC', 'u');
        return key switch
        {
            "ug/l" => Written.MicrogramsPerLiter,
            "mg/l" => Written.MilligramsPerLiter,
            "mg/kg" => Written.MilligramsPerKilogram,
            "ppb" => Written.Ppb,
            "ppm" => Written.Ppm,
            _ => null,
        };
    }
}
