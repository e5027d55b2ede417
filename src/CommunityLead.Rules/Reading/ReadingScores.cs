namespace CommunityLead.Rules.Reading;

/// <summary>
/// How hard one text is to read in each language, as a reviewer sees it: English Flesch–Kincaid grade and Flesch
/// reading ease, Spanish Szigriszt-Pazos perspicuity and its INFLESZ band. Rounded to one decimal, so an exported
/// catalogue does not change with floating-point noise.
/// </summary>
public sealed record ReadingScores(double EnglishGrade, double EnglishReadingEase, double SpanishPerspicuity, InfleszBand SpanishBand)
{
    public static ReadingScores Of(string english, string spanish)
    {
        var perspicuity = SpanishReadability.Perspicuity(spanish);
        return new ReadingScores(Round(Readability.FleschKincaidGrade(english)), Round(Readability.FleschReadingEase(english)),
            Round(perspicuity), SpanishReadability.Band(perspicuity));
    }

    private static double Round(double value) => Math.Round(value, 1, MidpointRounding.AwayFromZero);
}
