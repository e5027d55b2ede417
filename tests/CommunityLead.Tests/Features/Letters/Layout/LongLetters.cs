using CommunityLead.Api.Features.Letters;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>Contents longer than any real letter, to push pagination past its ordinary two pages.</summary>
public static class LongLetters
{
    /// <summary>Each section's paragraphs three times over, each copy told apart by a number.</summary>
    public static LetterContent ThreeTimesAsLong(LetterContent content) => content with
    {
        Meaning = Tripled(content.Meaning),
        Steps = Tripled(content.Steps),
        Cautions = Tripled(content.Cautions),
        WhoToCall = Tripled(content.WhoToCall),
    };

    static LetterSection Tripled(LetterSection section) => section with
    {
        Paragraphs = [.. Enumerable.Range(1, 3).SelectMany(copy => section.Paragraphs.Select(p => $"({copy}) {p}"))],
    };

    /// <summary>A results table of many bottles, each row two lines high, its first and last words unique to it.</summary>
    public static LetterContent WithManyRows(LetterContent content, int rows) => content with
    {
        Results = content.Results! with
        {
            Rows = [.. Enumerable.Range(1, rows).Select(n => (IReadOnlyList<string>)
                [$"Bottle B{n:00}: kitchen tap at the back of the house, the water after standing all night without use E{n:00}", "Lead", $"{n}.5 µg/L", "Action level 10 µg/L"])],
        },
    };
}
