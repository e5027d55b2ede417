using CommunityLead.Api.Features.Letters;
using System.Text.Json;
using CommunityLead.Api.Features.Letters.Layout;
using CommunityLead.Api.Infrastructure;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>The same content gives the same bytes, so a sent letter can be re-rendered and checked by its hash.</summary>
public class LetterReproducibilityTests
{
    [Theory]
    [InlineData("en-action")]
    [InlineData("es")]
    public void Render_SameContentTwice_BytesAreIdentical(string sample)
    {
        var first = new PdfLetterLayout().Render(LetterTextTests.Sample(sample));
        var second = new PdfLetterLayout().Render(LetterTextTests.Sample(sample));

        Assert.Equal(first, second);
    }

    [Fact]
    public void Render_ManyThreadsAtOnce_BytesAreIdentical()
    {
        var layout = new PdfLetterLayout();
        var reference = layout.Render(LetterSamples.EnglishActionLevel());

        var renders = new byte[16][];
        Parallel.For(0, renders.Length, i => renders[i] = layout.Render(LetterSamples.EnglishActionLevel()));

        Assert.All(renders, bytes => Assert.Equal(reference, bytes));
    }

    [Fact]
    public void Render_OneCharacterChanged_FileIdChangesToo()
    {
        var content = LetterSamples.EnglishActionLevel();
        var first = RenderedLetter.Of(content);
        var second = RenderedLetter.Of(content with { Recipient = ["Mario Lopez", .. content.Recipient.Skip(1)] });

        Assert.NotEqual(FileId(first.Bytes), FileId(second.Bytes));
    }

    [Fact]
    public void Render_Metadata_TitleAuthorAndDatesComeFromTheContent()
    {
        var letter = RenderedLetter.Of(LetterSamples.Spanish());

        Assert.Equal("Resultados de la prueba de su agua — Código del kit K7QM-4T2X", letter.Information.Title);
        Assert.Equal("Programa Comunitario de Análisis de Plomo", letter.Information.Author);
        // Midnight UTC of the letter's date, "14 de abril de 2026": never the clock.
        Assert.Equal("D:20260414000000+00'00'", letter.Information.CreationDate);
        Assert.Equal("D:20260414000000+00'00'", letter.Information.ModifiedDate);
    }

    [Fact]
    public void Render_ContentStoredBeforeGreetingsAndBrokenAxes_ReadsAndRendersWithoutThem()
    {
        // A letter recorded before these fields existed has none of them in its stored JSON; it must still render.
        var options = new JsonSerializerOptions();
        JsonSetup.Configure(options);
        var json = JsonSerializer.SerializeToNode(LetterSamples.EnglishActionLevel(), options)!.AsObject();
        foreach (var name in new[] { "greeting", "signature", "scaleNote" })
            Assert.True(json.Remove(name), name);
        foreach (var scale in json["scales"]!.AsArray())
            Assert.True(scale!.AsObject().Remove("breakAt"));

        var stored = json.Deserialize<LetterContent>(options)!;
        var letter = RenderedLetter.Of(stored);

        Assert.Null(stored.Greeting);
        Assert.Null(stored.Signature);
        Assert.All(stored.Scales, s => Assert.Null(s.BreakAt));
        Assert.DoesNotContain("Dear Maria Lopez", letter.Text);
        Assert.Contains("not medical advice", letter.Text);
    }

    static string FileId(byte[] pdf)
    {
        var text = System.Text.Encoding.Latin1.GetString(pdf);
        var at = text.LastIndexOf("/ID[<", StringComparison.Ordinal);
        Assert.True(at >= 0, "The trailer has no /ID.");
        return text.Substring(at + 5, 32);
    }
}
