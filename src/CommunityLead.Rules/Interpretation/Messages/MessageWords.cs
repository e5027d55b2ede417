using System.Globalization;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Rules.Interpretation;

/// <summary>
/// The values messages are filled with, written for each language. Numbers use a decimal point in both
/// languages: most Spanish-speaking households in the US write numbers the Mexican and US way (1.3, not 1,3).
/// Thousands: "1,200" in English; Spanish leaves four digits together ("1200") and puts a no-break space in
/// longer numbers ("12 500"), as the RAE recommends, so a comma is never mistaken for a decimal sign.
/// </summary>
public static class MessageWords
{
    public static Phrase Metal(Analyte analyte) => analyte switch
    {
        Analyte.Lead => new("lead", "plomo"),
        _ => new("copper", "cobre"),
    };

    /// <summary>The bottle as the subject a result line starts with ("The first bottle had 12 µg/L of lead in it.").</summary>
    public static Phrase Bottle(BottleType bottle, int? position) => bottle switch
    {
        BottleType.FirstDraw => new("The first bottle", "La primera botella"),
        BottleType.FifthLiter => new("The fifth liter", "El quinto litro"),
        BottleType.Flushed => new("The bottle taken after running the tap", "La botella que llenó después de dejar correr el agua"),
        BottleType.Sequential => new($"Bottle {position}", $"La botella {position}"),
        _ => new("The sample", "La muestra"),
    };

    /// <summary>
    /// Where a soil sample was taken, as the phrase that follows "soil" in English ("Soil from the play area had
    /// ...") and "la muestra de tierra tomada" in Spanish. A sample with no place recorded is "from your yard".
    /// </summary>
    public static Phrase Location(SoilLocation? location) => location switch
    {
        SoilLocation.PlayArea => new("from the play area", "en la zona de juegos"),
        SoilLocation.Garden => new("from the garden", "en el huerto o jardín"),
        SoilLocation.DripLine => new("from under the edge of the roof", "bajo el borde del techo"),
        SoilLocation.Yard => new("from the yard", "en el patio"),
        _ => new("from your yard", "en su terreno"),
    };

    public static Phrase Amount(double value, string unit) => new($"{Number(value, En)} {unit}", $"{Number(value, Es)} {unit}");

    public static Phrase Litres(double litres)
    {
        var number = Number(litres, En);
        return new($"{number} {(number == "1" ? "liter" : "liters")}", $"{Number(litres, Es)} {(number == "1" ? "litro" : "litros")}");
    }

    /// <summary>Pipe length in metres, with feet beside it for US readers.</summary>
    public static Phrase Metres(double metres)
    {
        var feet = Math.Round(metres * 3.28084);
        var (m, ft) = (Number(metres, En), Number(feet, En));
        return new($"{m} {(m == "1" ? "meter" : "meters")} ({ft} {(ft == "1" ? "foot" : "feet")})",
            $"{Number(metres, Es)} {(m == "1" ? "metro" : "metros")} ({Number(feet, Es)} {(ft == "1" ? "pie" : "pies")})");
    }

    public static Phrase Count(int position) => new(position.ToString(CultureInfo.InvariantCulture), position.ToString(CultureInfo.InvariantCulture));

    private const bool En = true;
    private const bool Es = false;

    /// <summary>Three significant digits below 100 (12.3, 1.3, 0.0123); whole numbers from 100 up (1,200).</summary>
    private static string Number(double value, bool english)
    {
        var rounded = Math.Abs(value) >= 100 ? Math.Round(value) : RoundSignificant(value, 3);
        var text = rounded.ToString("#,0.######", CultureInfo.InvariantCulture);
        if (english) return text;
        return Math.Abs(rounded) >= 10_000 ? text.Replace(',', '\u00A0') : text.Replace(",", "");
    }

    private static double RoundSignificant(double value, int digits)
    {
        if (value == 0) return 0;
        var scale = Math.Pow(10, digits - 1 - (int)Math.Floor(Math.Log10(Math.Abs(value))));
        return Math.Round(value * scale) / scale;
    }
}
