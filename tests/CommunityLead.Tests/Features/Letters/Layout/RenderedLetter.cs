using CommunityLead.Api.Features.Letters;
using UglyToad.PdfPig;
using UglyToad.PdfPig.Content;
using UglyToad.PdfPig.Core;
using UglyToad.PdfPig.DocumentLayoutAnalysis.TextExtractor;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>A straight line drawn on a page, in PDF coordinates (origin bottom-left, points).</summary>
public readonly record struct Segment(PdfPoint From, PdfPoint To, double Width = 0)
{
    public bool IsVertical => Math.Abs(From.X - To.X) < 0.01;
    public bool IsHorizontal => Math.Abs(From.Y - To.Y) < 0.01;
}

/// <summary>A rendered letter read back with PdfPig: what a reader would see, page by page.</summary>
public sealed class RenderedLetter
{
    public required byte[] Bytes { get; init; }
    public required IReadOnlyList<string> PageTexts { get; init; }
    public required IReadOnlyList<IReadOnlyList<Word>> PageWords { get; init; }
    public required IReadOnlyList<(double Width, double Height)> PageSizes { get; init; }
    public required DocumentInformation Information { get; init; }

    /// <summary>Every stroked straight segment on each page (ticks, rules, the marker's stroke, a break's "//").</summary>
    public required IReadOnlyList<IReadOnlyList<Segment>> PageLines { get; init; }

    /// <summary>The bounding box of every filled shape on each page (the scales' bands, the marker's triangle).</summary>
    public required IReadOnlyList<IReadOnlyList<PdfRectangle>> PageFills { get; init; }

    public string Text => string.Join("\n", PageTexts);

    /// <summary>Every word of the document in reading order, across pages.</summary>
    public IReadOnlyList<string> Tokens => Text.Split((char[])[' ', '\n', '\r', '\t'], StringSplitOptions.RemoveEmptyEntries);

    public static RenderedLetter Of(LetterContent content) => Read(new Api.Features.Letters.Layout.PdfLetterLayout().Render(content));

    public static RenderedLetter Read(byte[] bytes)
    {
        using var document = PdfDocument.Open(bytes);
        var pages = document.GetPages().ToList();
        return new RenderedLetter
        {
            Bytes = bytes,
            PageTexts = pages.Select(page => ContentOrderTextExtractor.GetText(page)).ToList(),
            PageWords = pages.Select(page => (IReadOnlyList<Word>)page.GetWords().ToList()).ToList(),
            PageSizes = pages.Select(page => (page.Width, page.Height)).ToList(),
            Information = document.Information,
            PageLines = pages.Select(page => (IReadOnlyList<Segment>)page.Paths.Where(path => path.IsStroked)
                .SelectMany(path => path.SelectMany(Segments).Select(s => s with { Width = Convert.ToDouble(path.LineWidth) })).ToList()).ToList(),
            PageFills = pages.Select(page => (IReadOnlyList<PdfRectangle>)page.Paths.Where(path => path.IsFilled)
                .Select(path => path.GetBoundingRectangle()).OfType<PdfRectangle>().ToList()).ToList(),
        };
    }

    /// <summary>A subpath's straight pieces, rectangles' sides included.</summary>
    static IEnumerable<Segment> Segments(PdfSubpath subpath)
    {
        PdfPoint? at = null, start = null;
        foreach (var command in subpath.Commands)
            switch (command)
            {
                case PdfSubpath.Move move:
                    (at, start) = (move.Location, move.Location);
                    break;
                case PdfSubpath.Line line:
                    yield return new Segment(line.From, line.To);
                    at = line.To;
                    break;
                case PdfSubpath.Close when at is { } from && start is { } to:
                    yield return new Segment(from, to);
                    at = to;
                    break;
            }
    }

    /// <summary>The words of one page as text lines (words sharing a baseline), top to bottom.</summary>
    public IReadOnlyList<(double Baseline, string Text, IReadOnlyList<Word> Words)> Lines(int page) =>
        [.. PageWords[page].GroupBy(w => Math.Round(w.Letters[0].StartBaseLine.Y, 1)).OrderByDescending(g => g.Key)
            .Select(g => (g.Key, string.Join(' ', g.OrderBy(w => w.BoundingBox.Left).Select(w => w.Text)), (IReadOnlyList<Word>)[.. g.OrderBy(w => w.BoundingBox.Left)]))];

    /// <summary>
    /// True when the text's words appear in this order in the letter. Gaps are allowed (a paragraph may continue
    /// after a page's footer), but only small ones, so words scattered over the letter don't count.
    /// </summary>
    public bool Says(string text, int maxGap = 40)
    {
        var wanted = text.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        var tokens = Tokens;
        for (var start = 0; start < tokens.Count; start++)
        {
            if (tokens[start] != wanted[0])
                continue;
            var (at, found) = (start, 1);
            for (var next = start + 1; found < wanted.Length && next < tokens.Count && next - at <= maxGap; next++)
                if (tokens[next] == wanted[found])
                    (at, found) = (next, found + 1);
            if (found == wanted.Length)
                return true;
        }
        return false;
    }

    /// <summary>Every piece of text the content asks to be printed (the layout adds only "page N of M").</summary>
    public static IEnumerable<string> PrintedTexts(LetterContent content)
    {
        yield return content.Program.Name;
        foreach (var line in content.Program.AddressLines.Concat(content.Program.ContactLines).Concat(content.Recipient))
            yield return line;
        yield return content.Date;
        yield return content.Title;
        if (content.Greeting is { } greeting)
            yield return greeting;
        foreach (var fact in content.KitFacts)
        {
            yield return fact.Label;
            yield return fact.Value;
        }
        if (content.Results is { } table)
        {
            foreach (var cell in table.Headers.Concat(table.Rows.SelectMany(row => row)))
                yield return cell;
            yield return table.Note;
        }
        foreach (var scale in content.Scales)
        {
            yield return scale.Label;
            yield return scale.ValueText;
            foreach (var level in scale.Levels)
                yield return level.Label;
        }
        foreach (var section in new[] { content.Meaning, content.Steps, content.Cautions, content.WhoToCall })
        {
            if (section.Paragraphs.Count > 0)
                yield return section.Heading;
            foreach (var paragraph in section.Paragraphs)
                yield return paragraph;
        }
        if (content.ScaleNote is { } note)
            yield return note;
        yield return content.Closing;
        if (content.Signature is { } signature)
        {
            yield return signature.SignOff;
            yield return signature.Name;
            if (signature.Title is { } title)
                yield return title;
        }
        yield return content.Footer;
    }
}
