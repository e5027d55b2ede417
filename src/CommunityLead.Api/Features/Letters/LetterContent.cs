using CommunityLead.Rules.Households;

namespace CommunityLead.Api.Features.Letters;

public enum LetterKind
{
    /// <summary>Results that can be trusted, whatever they show.</summary>
    Results,
    /// <summary>The sample was not valid: please sample again. No numbers are judged.</summary>
    Retest,
    /// <summary>The lab corrected a result after an earlier letter.</summary>
    Corrected,
}

public enum PaperSize { Letter, A4 }

/// <summary>
/// Everything printed on one household letter, already worded in the letter's language. The layout only
/// places it; it decides no wording. Built by the composer from the interpretation and the program's settings.
/// </summary>
/// <param name="Greeting">"Dear Ana Quill," above the results; null in letters stored before letters had one.</param>
/// <param name="Signature">Who signs, after the closing line; null in letters stored before letters were signed.</param>
/// <param name="ScaleNote">One line under the scales saying how to read a broken bar; null when no bar is broken.</param>
/// <param name="OnlineLine">Where to see the result online, with "{secret}" where the kit's secret goes; null when the
/// household result page is off (and in letters stored before it existed).</param>
public sealed record LetterContent(
    LetterLanguage Language,
    LetterKind Kind,
    PaperSize Paper,
    ProgramBlock Program,
    string Date,
    IReadOnlyList<string> Recipient,
    string Title,
    IReadOnlyList<LabeledValue> KitFacts,
    ResultTable? Results,
    IReadOnlyList<LeadScale> Scales,
    LetterSection Meaning,
    LetterSection Steps,
    LetterSection Cautions,
    LetterSection WhoToCall,
    string Closing,
    string Footer,
    string? Greeting = null,
    LetterSignature? Signature = null,
    string? ScaleNote = null,
    string? OnlineLine = null)
{
    /// <summary>The kit's secret for <see cref="OnlineLine"/>, set before each rendering and never stored.</summary>
    [System.Text.Json.Serialization.JsonIgnore]
    public string? ResultSecret { get; init; }
}

/// <summary>The sender block: program name, postal address lines, and how to reach it.</summary>
public sealed record ProgramBlock(string Name, IReadOnlyList<string> AddressLines, IReadOnlyList<string> ContactLines);

public sealed record LabeledValue(string Label, string Value);

/// <param name="Headers">Column titles, e.g. Sample, Test, Result, Compared with.</param>
/// <param name="Note">A line under the table, e.g. which rule profile the levels come from.</param>
public sealed record ResultTable(IReadOnlyList<string> Headers, IReadOnlyList<IReadOnlyList<string>> Rows, string Note);

/// <summary>
/// A horizontal scale for one lead result, marked against the levels: people see at a glance where they stand.
/// Values in the same unit; <see cref="Maximum"/> is where the scale ends (the marker is clamped to it). Every
/// scale of one matrix in a letter has the same levels, end and break, so bars can be compared.
/// </summary>
/// <param name="BreakAt">
/// Where a broken axis breaks: drawn to size from 0 to here, then squeezed up to <see cref="Maximum"/>, so a result
/// far above every level does not crush the levels into the bar's first few millimetres. Null: to size throughout.
/// </param>
public sealed record LeadScale(string Label, double Value, string ValueText, IReadOnlyList<ScaleMark> Levels, double Maximum, string Unit,
    double? BreakAt = null);

public sealed record ScaleMark(double Value, string Label);

/// <summary>The sign-off after the closing line: "Sincerely," then the staff member's name and title.</summary>
public sealed record LetterSignature(string SignOff, string Name, string? Title);

/// <param name="Numbered">True for steps to follow (1., 2., ...); false for plain paragraphs.</param>
public sealed record LetterSection(string Heading, IReadOnlyList<string> Paragraphs, bool Numbered = false);

/// <summary>Turns letter content into a document. Our own interface, so the PDF engine could change.</summary>
public interface ILetterLayout
{
    /// <summary>The same content gives the same bytes, so a sent letter can be re-rendered and checked by hash.</summary>
    byte[] Render(LetterContent content) => Render(content, out _);

    /// <summary>As <see cref="Render(LetterContent)"/>, with the page count the layout dealt, so nobody parses the PDF again to learn it.</summary>
    byte[] Render(LetterContent content, out int pages);

    string ContentType { get; }
}
