using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The numbers the layout writes itself (the scale's end, the level under each tick), written the way the
/// letter's sentences write them (MessageWords: a decimal point in both languages, "1,200" / "1200"), so the
/// picture and the text never disagree.
/// </summary>
internal static class ScaleNumber
{
    public static string Format(double value, LetterLanguage language)
    {
        var amount = MessageWords.Amount(value, unit: "");
        return (language == LetterLanguage.Es ? amount.Es : amount.En).TrimEnd();
    }
}
