using System.IO.Compression;
using System.Net;
using System.Net.Http.Json;
using System.Text.Json.Nodes;
using CommunityLead.Tests.Features.Interpretation;
using CommunityLead.Tests.Infrastructure;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Features.Letters;

public class LetterWorkflowTests
{
    private static async Task<(byte[] Pdf, HttpResponseMessage Response)> LetterAsync(HttpClient client, string code, string? lang = null)
    {
        var response = await client.GetAsync($"/api/kits/{code}/letter{(lang is null ? "" : $"?lang={lang}")}");
        await Expect(response, HttpStatusCode.OK);
        Assert.Equal("application/pdf", response.Content.Headers.ContentType!.MediaType);
        return (await response.Content.ReadAsByteArrayAsync(), response);
    }

    [Fact]
    public async Task Letter_ActionLevelWithYoungChild_ShowsValuesLevelProfileContactsAndCautions()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync(h => { h["childUnder6"] = true; h["language"] = "en"; h["name"] = "Perpetua Nettleford"; });
        await flow.PostLeadAsync(code, firstDraw: 12.4, flushed: 3.1);
        var other = await flow.ReceivedKitAsync(h => h["name"] = "Isidore Ivesby");
        await flow.PostLeadAsync(other, firstDraw: 2.2, flushed: 1.1);

        var letter = LetterPdfText.Read((await LetterAsync(flow.Coordinator, code)).Pdf);
        Assert.InRange(letter.Pages, 1, 2);
        var text = letter.Flat;
        Assert.Contains("Perpetua Nettleford", text);
        Assert.Contains("Dear Perpetua Nettleford,", text);
        Assert.Contains("Sincerely, Dana Whitfield Program Coordinator", text); // the signer, from the Letters settings
        Assert.DoesNotContain("Isidore Ivesby", text);        // no data of another household
        Assert.Contains(code, text);
        Assert.Contains("12.4 µg/L", text);
        Assert.Contains("3.1 µg/L", text);
        Assert.Contains("10 µg/L", text);                     // the US LCRI action level (89 FR 86418)
        Assert.Contains("Lead and Copper Rule Improvements", text, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("Tallow County Health Department", text); // from the Letters settings
        Assert.Contains("+1 555 0140", text);
        Assert.Contains("not medical advice", text, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("doctor", text, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("?g/L", text);                  // µ rendered, not replaced by "?"
        Assert.DoesNotContain('\uFFFD', letter.Text);
    }

    [Fact]
    public async Task Letter_SpanishHousehold_InSpanishUnlessAskedOtherwise()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync(h => h["language"] = "es");
        await flow.PostLeadAsync(code, firstDraw: 4.0, flushed: 1.2);

        var spanish = LetterPdfText.Read((await LetterAsync(flow.Coordinator, code)).Pdf).Flat;
        Assert.Contains("plomo", spanish);
        Assert.Contains("consejo médico", spanish);
        Assert.Contains("Hola, ", spanish);
        Assert.Contains("Atentamente, Dana Whitfield Coordinación del programa", spanish);
        Assert.DoesNotContain("not medical advice", spanish, StringComparison.OrdinalIgnoreCase);
        // The levels' source is named in the letter's language (the us-lcri profile's "nameEs").
        Assert.Contains("Mejoras a la Regla sobre el Plomo y el Cobre", spanish);
        Assert.DoesNotContain("Lead and Copper Rule Improvements", spanish);
        var english = LetterPdfText.Read((await LetterAsync(flow.Coordinator, code, "en")).Pdf).Flat;
        Assert.Contains("not medical advice", english, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("Lead and Copper Rule Improvements", english);
        var bad = await flow.Coordinator.GetAsync($"/api/kits/{code}/letter?lang=fr");
        Assert.Equal(HttpStatusCode.BadRequest, bad.StatusCode);
    }

    [Fact]
    public async Task Letter_ConfirmedSent_KitLetterSentAndDaysFromCollectionKept()
    {
        using var app = new CommunityLeadFactory(); // clock 2026-04-10; collected 2026-04-03
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        await flow.PostLeadAsync(code, firstDraw: 2.0, flushed: 1.0);
        var (_, response) = await LetterAsync(flow.Coordinator, code);
        var letterId = int.Parse(response.Headers.GetValues("X-Letter-Id").Single());

        var sent = await PostAsync(flow.Coordinator, $"/api/kits/{code}/letter/sent", new { letterId }, HttpStatusCode.OK);
        Assert.Equal(7, sent["daysFromCollection"]!.GetValue<int>());
        Assert.Equal("letter-sent", (await GetAsync(flow.Coordinator, $"/api/kits/{code}"))["state"]!.GetValue<string>());
    }

    [Fact]
    public async Task Letter_NotRenderedYet_CannotBeMarkedSent()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        await flow.PostLeadAsync(code, firstDraw: 2.0, flushed: 1.0);
        await PostAsync(flow.Coordinator, $"/api/kits/{code}/letter/sent", new { }, HttpStatusCode.Conflict);
        Assert.Equal("interpreted", (await GetAsync(flow.Coordinator, $"/api/kits/{code}"))["state"]!.GetValue<string>());
    }

    [Fact]
    public async Task Letter_StoredLetter_RendersAgainByteIdentical()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        await flow.PostLeadAsync(code, firstDraw: 6.0, flushed: 1.0);
        var (pdf, response) = await LetterAsync(flow.Coordinator, code);
        var id = response.Headers.GetValues("X-Letter-Id").Single();

        var again = await flow.Coordinator.GetAsync($"/api/letters/{id}");
        Assert.Equal(pdf, await again.Content.ReadAsByteArrayAsync());
        Assert.Equal("true", again.Headers.GetValues("X-Letter-Identical").Single());
        var listed = JsonNode.Parse(await flow.Coordinator.GetStringAsync($"/api/kits/{code}/letters"))!.AsArray();
        Assert.Single(listed);
        Assert.Equal("us-lcri", listed[0]!["profileId"]!.GetValue<string>());
    }

    [Fact]
    public async Task Letter_NoResultsYet_409()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var code = await flow.ReceivedKitAsync();
        var response = await flow.Coordinator.GetAsync($"/api/kits/{code}/letter");
        Assert.Equal(HttpStatusCode.Conflict, response.StatusCode);
    }

    [Fact]
    public async Task LetterBatch_EveryReadyKit_OnePdfEachManifestAndCombinedPrintFile()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        var codes = new List<string>();
        for (var i = 0; i < 3; i++)
        {
            var code = await flow.ReceivedKitAsync();
            await flow.PostLeadAsync(code, firstDraw: 2.0 + i * 6, flushed: 1.0);
            codes.Add(code);
        }
        var notReady = await flow.ReceivedKitAsync();

        var response = await flow.Coordinator.PostAsync("/api/letters/batch?combined=true", null);
        await Expect(response, HttpStatusCode.OK);
        Assert.Equal("application/zip", response.Content.Headers.ContentType!.MediaType);
        using var zip = new ZipArchive(new MemoryStream(await response.Content.ReadAsByteArrayAsync()));
        var letters = zip.Entries.Where(e => e.FullName.StartsWith("letters/")).Select(e => e.Name).ToList();
        Assert.Equal(3, letters.Count);
        Assert.All(codes, c => Assert.Contains(letters, n => n.Contains(c)));
        Assert.DoesNotContain(letters, n => n.Contains(notReady));
        Assert.NotNull(zip.GetEntry("manifest.csv"));
        using var combined = new MemoryStream();
        await zip.GetEntry("all-letters.pdf")!.Open().CopyToAsync(combined);
        Assert.True(LetterPdfText.Read(combined.ToArray()).Pages >= 3);
        // Issuing is not sending: the kits wait for confirmation.
        Assert.All(codes, c => Assert.Equal("interpreted",
            app.WithDb(db => db.Kits.Single(k => k.Code == c).State.ToString().ToLowerInvariant())));
    }

    [Fact]
    public async Task LetterBatch_RenderedOnEveryCore_EachFileMatchesItsManifestHashAndPagesAndComesOutTheSameTwice()
    {
        using var app = new CommunityLeadFactory();
        var flow = new ResultsFlow(app);
        for (var i = 0; i < 8; i++)
            await flow.PostLeadAsync(await flow.ReceivedKitAsync(), firstDraw: 1.0 + i * 4, flushed: 1.0);

        async Task<Dictionary<string, (byte[] Pdf, string[] Row)>> Batch()
        {
            var response = await flow.Coordinator.PostAsync("/api/letters/batch", null);
            await Expect(response, HttpStatusCode.OK);
            using var zip = new ZipArchive(new MemoryStream(await response.Content.ReadAsByteArrayAsync()));
            using var manifest = new StreamReader(zip.GetEntry("manifest.csv")!.Open());
            var rows = (await manifest.ReadToEndAsync()).Split('\n', StringSplitOptions.RemoveEmptyEntries).Skip(1)
                .Select(line => line.Split(',')).ToDictionary(r => r[0]);
            return zip.Entries.Where(e => e.FullName.StartsWith("letters/")).ToDictionary(
                e => rows.Keys.Single(code => e.Name.Contains(code)),
                e => { using var pdf = new MemoryStream(); e.Open().CopyTo(pdf); return (pdf.ToArray(), rows[rows.Keys.Single(code => e.Name.Contains(code))]); });
        }

        var first = await Batch();
        var second = await Batch();

        Assert.Equal(8, first.Count);
        foreach (var (code, (pdf, row)) in first)
        {
            // manifest: kitCode,letterId,kind,language,pages,sha256,status,reason
            Assert.Equal(Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(pdf)), row[5]);
            Assert.Equal(LetterPdfText.Read(pdf).Pages, int.Parse(row[4]));
            Assert.Equal(pdf, second[code].Pdf);
            Assert.Equal(row[1], second[code].Row[1]);
        }
    }

    [Theory]
    // 01:30 UTC on 11 April 2026 is 20:30 on 10 April in Chicago (CDT, UTC−5; IANA tz database, from memory).
    [InlineData("America/Chicago", "10 de abril de 2026", 7)]
    [InlineData("UTC", "11 de abril de 2026", 8)]
    public async Task Letter_IssuedInTheEvening_DatedAndCountedInTheProgramsTimeZone(string zone, string dated, int days)
    {
        using var app = new CommunityLeadFactory(now: new DateTimeOffset(2026, 4, 11, 1, 30, 0, TimeSpan.Zero));
        app.Settings["Program:TimeZone"] = zone;
        var flow = new ResultsFlow(app); // collected 2026-04-03; the household reads Spanish
        var code = await flow.ReceivedKitAsync();
        await flow.PostLeadAsync(code, firstDraw: 2.0, flushed: 1.0);

        var (pdf, response) = await LetterAsync(flow.Coordinator, code);
        var letterId = int.Parse(response.Headers.GetValues("X-Letter-Id").Single());
        var sent = await PostAsync(flow.Coordinator, $"/api/kits/{code}/letter/sent", new { letterId }, HttpStatusCode.OK);

        Assert.Contains(dated, LetterPdfText.Read(pdf).Text.Replace("\n", " "), StringComparison.Ordinal);
        Assert.Equal(days, sent["daysFromCollection"]!.GetValue<int>());
    }
}
