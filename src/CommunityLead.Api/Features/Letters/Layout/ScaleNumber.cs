using System.Globalization;
using CommunityLead.Rules.Households;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The numbers the layout writes itself: the scale's end and the level under each tick. The service runs with invariant
/// globalization, so the Spanish decimal comma is put in by hand.
/// </summary>
internal static class ScaleNumber
{
    public static string Format(double value, LetterLanguage language)
    {
        var text = value.ToString("0.##", CultureInfo.InvariantCulture);
        return language == LetterLanguage.Es ? text.Replace('.', ',') : text;
    }
}
