using CommunityLead.Rules.LabResults;

namespace CommunityLead.Tests.Rules.LabResults;

// Conversions from DOMAIN.md's units line [published]: for drinking water 1 ppb = 1 µg/L and 1 ppm = 1 mg/L;
// for soil 1 ppm = 1 mg/kg. 1 mg = 1000 µg.
public class UnitsTests
{
    private static double Factor(Analyte analyte, Matrix matrix, string unit)
    {
        Assert.True(Units.TryFactor(analyte, matrix, unit, out var factor, out var error), error);
        Assert.Null(error);
        return factor;
    }

    private static string Rejected(Analyte analyte, Matrix matrix, string? unit)
    {
        Assert.False(Units.TryFactor(analyte, matrix, unit, out _, out var error));
        Assert.NotNull(error);
        return error;
    }

    [Fact]
    public void NormalUnit_EachAnalyteAndMatrix_IsTheUnitItsLevelsUse()
    {
        Assert.Equal("\u00B5g/L", Analytes.NormalUnit(Analyte.Lead, Matrix.Water));
        Assert.Equal("mg/L", Analytes.NormalUnit(Analyte.Copper, Matrix.Water));
        Assert.Equal("mg/kg", Analytes.NormalUnit(Analyte.Lead, Matrix.Soil));
        Assert.Equal("mg/kg", Analytes.NormalUnit(Analyte.Copper, Matrix.Soil));
    }

    [Theory]
    [InlineData("\u00B5g/L", 1)]      // micro sign
    [InlineData("\u03BCg/L", 1)]      // Greek small mu
    [InlineData("\u039CG/L", 1)]      // Greek capital mu, as upper-cased text comes
    [InlineData("ug/L", 1)]
    [InlineData("UG/L", 1)]
    [InlineData(" ug/l ", 1)]
    [InlineData("ppb", 1)]
    [InlineData("PPB", 1)]
    [InlineData("mg/L", 1000)]
    [InlineData("MG/L", 1000)]
    [InlineData("ppm", 1000)]
    [InlineData("Ppm", 1000)]
    public void Factor_LeadInWater_EverySpellingGivesMicrogramsPerLiter(string unit, double expected) =>
        Assert.Equal(expected, Factor(Analyte.Lead, Matrix.Water, unit));

    [Theory]
    [InlineData("\u00B5g/L", 0.001)]
    [InlineData("\u03BCg/L", 0.001)]
    [InlineData("ug/L", 0.001)]
    [InlineData("ppb", 0.001)]
    [InlineData("mg/L", 1)]
    [InlineData("ppm", 1)]
    public void Factor_CopperInWater_EverySpellingGivesMilligramsPerLiter(string unit, double expected) =>
        Assert.Equal(expected, Factor(Analyte.Copper, Matrix.Water, unit));

    [Theory]
    [InlineData(Analyte.Lead, "mg/kg")]
    [InlineData(Analyte.Lead, "MG/KG")]
    [InlineData(Analyte.Lead, "ppm")]
    [InlineData(Analyte.Copper, " mg/kg ")]
    [InlineData(Analyte.Copper, "PPM")]
    public void Factor_Soil_PpmIsMilligramsPerKilogram(Analyte analyte, string unit) =>
        Assert.Equal(1, Factor(analyte, Matrix.Soil, unit));

    [Fact]
    public void Factor_LeadTwelvePointFourPpb_IsTwelvePointFourMicrograms() =>
        Assert.Equal(12.4, 12.4 * Factor(Analyte.Lead, Matrix.Water, "ppb"), 10);

    [Fact]
    public void Factor_LeadPointZeroOneTwoFourMilligrams_IsTwelvePointFourMicrograms() =>
        Assert.Equal(12.4, 0.0124 * Factor(Analyte.Lead, Matrix.Water, "mg/L"), 10);

    // 1300 µg/L copper is the 1.3 mg/L action level (40 CFR 141.80(c)) [published].
    [Fact]
    public void Factor_Copper1300Micrograms_IsOnePointThreeMilligrams() =>
        Assert.Equal(1.3, 1300 * Factor(Analyte.Copper, Matrix.Water, "µg/L"), 10);

    [Theory]
    [InlineData("mg/kg")]
    [InlineData("MG/KG")]
    public void Factor_SoilUnitForWater_IsRejected(string unit) =>
        Assert.Equal($"{unit} is a soil unit; this is a water sample", Rejected(Analyte.Lead, Matrix.Water, unit));

    [Theory]
    [InlineData("µg/L")]
    [InlineData("ug/L")]
    [InlineData("mg/L")]
    public void Factor_WaterUnitForSoil_IsRejected(string unit) =>
        Assert.Equal($"{unit} is a water unit; this is a soil sample", Rejected(Analyte.Lead, Matrix.Soil, unit));

    [Fact]
    public void Factor_UnknownWaterUnit_IsRejectedWithChoices() =>
        Assert.Equal("'g/L' is not a unit we accept; use µg/L, ug/L, ppb, mg/L or ppm", Rejected(Analyte.Lead, Matrix.Water, " g/L "));

    // ppb in soil would be µg/kg, which no soil level is written in: a slip more likely than a result.
    [Theory]
    [InlineData("ppb")]
    [InlineData("g/kg")]
    public void Factor_UnknownSoilUnit_IsRejectedWithChoices(string unit) =>
        Assert.Equal($"'{unit}' is not a unit we accept; use mg/kg or ppm", Rejected(Analyte.Lead, Matrix.Soil, unit));

    [Theory]
    [InlineData(null)]
    [InlineData("")]
    [InlineData("   ")]
    public void Factor_NoUnit_IsRejected(string? unit) =>
        Assert.StartsWith("No unit was given", Rejected(Analyte.Copper, Matrix.Water, unit));
}
