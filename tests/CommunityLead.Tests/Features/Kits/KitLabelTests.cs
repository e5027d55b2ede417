using System.Net;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.Kits.Labels;
using CommunityLead.Tests.Features.LabResults;
using CommunityLead.Tests.Infrastructure;
using UglyToad.PdfPig;
using ZXing;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Kits;

public class KitLabelTests
{
    /// <summary>Rendered sheets and their PNGs, kept beside the test output for a person to look at.</summary>
    private static readonly string Folder = Path.Combine(AppContext.BaseDirectory, "artifacts", "labels");

    [Theory]
    [InlineData("letter-30", 612.0, 792.0)]
    [InlineData("a4-21", 595.3, 841.9)]
    public async Task Labels_RenderedAndScanned_GiveBackTheExactCodes(string stockName, double pageWidth, double pageHeight)
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var english = await SignUpAsync(coordinator, h => h["language"] = "en");
        var codes = new[] { await IssueKitAsync(coordinator, english), await IssueKitAsync(coordinator), await IssueKitAsync(coordinator, kind: "soil") };

        // Lower case and spaces, as typed: the sheet prints the canonical codes.
        var response = await coordinator.GetAsync($"/api/kits/labels?stock={stockName}&codes={string.Join(",%20", codes.Select(c => c.ToLowerInvariant()))}");
        await Expect(response, HttpStatusCode.OK);
        Assert.Equal("application/pdf", response.Content.Headers.ContentType!.MediaType);
        var pdf = await response.Content.ReadAsByteArrayAsync();

        using (var document = PdfDocument.Open(pdf))
        {
            var page = document.GetPage(1);
            Assert.Equal(pageWidth, page.Width, 0);
            Assert.Equal(pageHeight, page.Height, 0);
            var text = page.Text;
            foreach (var code in codes) Assert.Contains(code, text);
            Assert.Contains("First draw · Fifth liter · Flushed", text); // the English home has a lead service line
            Assert.Contains("Primera agua · Quinto litro", text);          // the fixture's home reads Spanish
            Assert.Contains("Tierra: zona de juegos", text);
        }

        var stock = LabelStock.All.Single(s => s.Name == stockName);
        var sheet = RenderedSheet.FirstPage(pdf, Folder, $"labels-{stockName}");
        for (var i = 0; i < codes.Length; i++)
        {
            var (x, y) = stock.Corner(i);
            var qrPart = stock.LabelWidth * 0.42;
            // Left part: the QR code; right part: the Code 128 barcode. Each decodes to the code exactly.
            Assert.Equal(codes[i], sheet.Decode(BarcodeFormat.QR_CODE, x, y, qrPart, stock.LabelHeight));
            Assert.Equal(codes[i], sheet.Decode(BarcodeFormat.CODE_128, x + qrPart - 4, y, stock.LabelWidth - qrPart + 4, stock.LabelHeight));
        }
    }

    [Fact]
    public async Task Labels_TyposUnknownKitsAndStocks_400NamingTheProblem()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        var code = await IssueKitAsync(coordinator);

        var mistyped = await ProblemAsync(coordinator, $"/api/kits/labels?codes={LabFixtures.Mistyped(code)}");
        Assert.Contains("check character", mistyped);
        Assert.Contains("No kit was issued", await ProblemAsync(coordinator, $"/api/kits/labels?codes={Uri.EscapeDataString(LabFixtures.NeverIssuedCode())}"));
        Assert.Contains("letter-30", await ProblemAsync(coordinator, $"/api/kits/labels?codes={code}&stock=letter-60"));
        Assert.Contains("at least one", await ProblemAsync(coordinator, "/api/kits/labels?codes="));
        var tooMany = string.Join(",", Enumerable.Repeat(code, KitLabels.MostCodes + 1));
        Assert.Contains("At most", await ProblemAsync(coordinator, $"/api/kits/labels?codes={tooMany}"));
    }

    private static async Task<string> ProblemAsync(HttpClient client, string path)
    {
        var response = await client.GetAsync(path);
        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        return await response.Content.ReadAsStringAsync();
    }
}
