using CommunityLead.Rules.Households;
using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>The interpretation's messages, placed in the letter's sections in the order the interpreter gave them.</summary>
internal sealed record MessageSections(IReadOnlyList<string> Meaning, IReadOnlyList<string> Steps, IReadOnlyList<string> Cautions, string? Closing)
{
    private const string StepCodes = "step.";
    private const string CautionCodes = "care.";
    private const string ClosingCodes = "closing.";
    private const string ResultCodes = "result.";

    /// <summary>With many bottles (a sequential profile), the table already lists the low ones; only results that reach a level get a sentence.</summary>
    private static readonly string[] QuietResults = ["result.low", "result.not-detected", "result.measured"];

    /// <summary>
    /// step.* → numbered steps; care.* → cautions; closing.* → the closing line; everything else (summary, results,
    /// retest reasons, copper, soil, patterns, peaks, fifth liter, service line, well) → what it means. A text is
    /// printed once, wherever it first appears. A corrected-result letter opens with its own paragraph, which says
    /// what the interpretation's "corrected" message says, so that message is left out.
    /// </summary>
    public static MessageSections Sort(IReadOnlyList<Message> messages, LetterLanguage language, LetterKind kind)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        List<string> meaning = [], steps = [], cautions = [];
        string? closing = null;
        if (kind == LetterKind.Corrected) meaning.Add(Keep(LetterWords.Corrected.In(language)));

        var manyResults = messages.Count(m => m.Code.StartsWith(ResultCodes, StringComparison.Ordinal)) > LeadScales.MostScales;
        foreach (var message in messages)
        {
            if (kind == LetterKind.Corrected && message.Code == MessageCatalog.Corrected.Code) continue;
            if (manyResults && QuietResults.Contains(message.Code)) continue;
            var text = message.In(language);
            if (!seen.Add(text)) continue;
            if (message.Code.StartsWith(StepCodes, StringComparison.Ordinal)) steps.Add(text);
            else if (message.Code.StartsWith(CautionCodes, StringComparison.Ordinal)) cautions.Add(text);
            else if (message.Code.StartsWith(ClosingCodes, StringComparison.Ordinal)) closing ??= text;
            else meaning.Add(text);
        }
        return new MessageSections(meaning, steps, cautions, closing);

        string Keep(string text)
        {
            seen.Add(text);
            return text;
        }
    }
}
