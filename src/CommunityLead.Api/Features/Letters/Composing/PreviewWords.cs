using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>
/// The banner across every page of a letter that is not released yet (LetterRelease). Read by the coordinator, but
/// written in the letter's language too, so a preview printed by mistake says so to whoever holds it.
/// </summary>
public static class PreviewWords
{
    private static readonly Phrase Banner = new(
        "Preview — not yet released: a coordinator must check this result and call the household first. Do not mail.",
        "Vista previa — aún no autorizada: un coordinador debe revisar este resultado y llamar primero al hogar. No la envíe.");

    private static readonly Phrase Mark = new("PREVIEW", "VISTA PREVIA");

    public static string For(LetterLanguage language) => Banner.In(language);

    /// <summary>The one word printed faintly across the page.</summary>
    public static string Watermark(LetterLanguage language) => Mark.In(language);
}
