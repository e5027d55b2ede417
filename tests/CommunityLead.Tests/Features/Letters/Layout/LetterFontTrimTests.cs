using System.Buffers.Binary;
using System.Text;
using CommunityLead.Api.Features.Letters.Layout;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>
/// The fonts a letter embeds lose their hinting and the metrics of glyphs they do not carry, nothing else: outlines
/// and the PDF's widths stay, so the letter looks the same (the letter tests read its text and places back).
/// </summary>
[Trait("Store", "Independent")]
public class LetterFontTrimTests
{
    [Fact]
    public void Trim_WholeFont_DropsTheHintingTablesKeepsTheRest()
    {
        var font = new LetterFontResolver().GetFont("LiberationSans-Regular")!;

        var trimmed = TrimmedFont.Trim(font);

        var before = Tags(font);
        var after = Tags(trimmed);
        Assert.Contains("fpgm", before);
        Assert.Equal(before.Except(["cvt ", "fpgm", "prep"]).Order(), after.Order());
        Assert.True(trimmed.Length < font.Length, $"{trimmed.Length} bytes, not fewer than {font.Length}");
    }

    [Fact]
    public void Trim_TrimmedFontAgain_GivesTheSameBytes()
    {
        // Read back and written again unchanged: the tables, offsets and glyph locations it writes are the ones it reads.
        var once = TrimmedFont.Trim(new LetterFontResolver().GetFont("LiberationSans-Bold")!);

        Assert.Equal(once, TrimmedFont.Trim(once));
    }

    [Fact]
    public void Trim_NotATrueTypeFont_LeavesItAlone()
    {
        byte[] notAFont = [.. Encoding.ASCII.GetBytes("OTTO"), 0, 0, 0, 0];

        Assert.Same(notAFont, TrimmedFont.Trim(notAFont));
    }

    [Theory]
    [InlineData("en")]
    [InlineData("es")]
    public void Render_Letter_IsUnderThirtyKilobytes(string language)
    {
        // The mailing's size target (README, Speed): a letter was 65 KB while its fonts kept their hinting.
        var content = language == "es" ? LetterSamples.Spanish() : LetterSamples.EnglishActionLevel();

        var pdf = new PdfLetterLayout().Render(content);

        Assert.InRange(pdf.Length, 1, 30 * 1024);
    }

    static List<string> Tags(byte[] font) =>
        [.. Enumerable.Range(0, BinaryPrimitives.ReadUInt16BigEndian(font.AsSpan(4)))
            .Select(i => Encoding.ASCII.GetString(font, 12 + 16 * i, 4))];
}
