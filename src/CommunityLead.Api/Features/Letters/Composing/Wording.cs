using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>Picks the letter's language out of text kept in both (a <see cref="Phrase"/> or an interpretation's message).</summary>
internal static class Wording
{
    public static string In(this Phrase phrase, LetterLanguage language) => language == LetterLanguage.Es ? phrase.Es : phrase.En;

    public static string In(this Message message, LetterLanguage language) => language == LetterLanguage.Es ? message.Es : message.En;
}
