using System.IO.Compression;
using System.Net.Http.Headers;
using System.Text.RegularExpressions;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Rules.Kits;
using CommunityLead.Tests.Auth;
using Microsoft.Playwright;

namespace CommunityLead.Tests.Browser;

/// <summary>
/// The coordinator's desk pages beside the day's walk: the letter batch and marking letters sent (a mailing longer
/// than one page of the kit list), a held lab batch released with a reason, the area list, a held letter's words on
/// its kit page, and an issued kit's collection form; each read by axe in both languages, on a laptop and on a phone,
/// with the service's English-only words marked and said so on the Spanish pages.
/// </summary>
// Pages, the API description and the README are the same whichever store is behind them: the PostgreSQL run
// of .ci/run leaves these out (Store=Independent).
[Trait("Store", "Independent")]
public class CoordinatorPagesTests
{
    // RouteSetup dates its bottles, receipts and analyses in early April 2026: the service's clock stands after them.
    private static readonly DateTimeOffset Clock = new(2026, 4, 10, 12, 0, 0, TimeSpan.Zero);

    [ChromiumFact]
    public async Task LettersBatchesAndAreas_WorkInBothLanguagesOnLaptopAndPhone()
    {
        await using var browser = await BrowserApp.StartAsync(fixedClock: Clock);
        var key = browser.App.CreateKey(Roles.Coordinator);
        using var coordinator = new HttpClient { BaseAddress = new Uri(browser.Address) };
        coordinator.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", key);
        var setup = new RouteSetup(browser.App, coordinator);
        var (ready, _) = await setup.LetterAsync();
        var held = await setup.InterpretedKitAsync(firstDrawLead: 150);
        var batch = await setup.BatchAsync(calibrationMeasured: 15);
        var issued = await setup.KitAsync();

        // Every page first as it reads, in English and Spanish, on a laptop and on a phone.
        foreach (var (width, height, screen) in new[] { (1280, 900, "laptop"), (375, 812, "phone") })
        {
            await browser.NewContextAsync(width, height, touch: screen == "phone");
            var page = browser.Page;
            await page.GotoAsync("/ui/letters/");
            await browser.SignInAsync(key);
            foreach (var language in new[] { "en", "es" })
            {
                var spanish = language == "es";
                await page.GotoAsync($"/ui/letters/?lang={language}");
                await Expect(page.Locator($"tr[data-code='{held}']")).ToBeVisibleAsync();
                await browser.CheckAsync($"40-letters-{screen}-{language}");
                await FitsAsync(page, $"{screen} {language}");
                await page.GotoAsync($"/ui/lab/batches/?lang={language}");
                await Expect(page.Locator("article.kit-card")).ToHaveCountAsync(1);
                await Expect(page.Locator("nav a[aria-current=page]")).ToHaveAttributeAsync("href", "/ui/lab/batches/");
                // The QC table's names in the page's language; the service's English details said so on the Spanish page.
                await Expect(page.Locator("article.kit-card tr.failed td").First)
                    .ToHaveTextAsync(spanish ? "Verificación de calibración · Plomo · recuperación %" : "Calibration check · Lead · recovery %");
                await Expect(page.Locator("article.kit-card tr.failed td [lang=en]")).ToHaveCountAsync(1);
                await Expect(page.Locator("article.kit-card .english-only")).ToHaveCountAsync(spanish ? 1 : 0);
                await browser.CheckAsync($"41-batches-{screen}-{language}");
                await FitsAsync(page, $"{screen} {language}");
                await page.GotoAsync($"/ui/areas/?lang={language}");
                await Expect(page.Locator("#areas tbody tr")).ToHaveCountAsync(browser.App.Areas.Length);
                await browser.CheckAsync($"42-areas-{screen}-{language}");
                await FitsAsync(page, $"{screen} {language}");
                await page.GotoAsync($"/ui/kits/kit/?lang={language}&code={held}");
                await Expect(page.Locator("#results td").First).ToBeVisibleAsync();
                // The held letter's words, as for any letter, marked as not released; the page is under Kits.
                await Expect(page.Locator("#letter-preview.held #letter-words section")).ToHaveCountAsync(4);
                await Expect(page.Locator("#letter-held")).ToContainTextAsync(spanish ? "Retenida, no autorizada" : "Held, not released");
                await Expect(page.Locator("nav a[aria-current=true]")).ToHaveAttributeAsync("href", "/ui/kits/");
                await Expect(page.Locator("#results .english-only")).ToHaveCountAsync(spanish ? 1 : 0);
                await browser.CheckAsync($"43-kit-held-{screen}-{language}");
                await FitsAsync(page, $"{screen} {language}");
                await page.GotoAsync($"/ui/kits/kit/?lang={language}&code={issued}");
                await Expect(page.Locator("#collection-form")).ToBeVisibleAsync();
                await browser.CheckAsync($"43-kit-issued-{screen}-{language}");
                if (!spanish) continue;
                // The urgent kit's reason on Today is the service's sentence: marked English, said so once.
                await page.GotoAsync("/ui/today/?lang=es");
                await Expect(page.Locator("article.kit-card [lang=en]").First).ToBeVisibleAsync();
                await Expect(page.Locator("main .english-only")).ToHaveCountAsync(1);
                await browser.CheckAsync($"46-today-{screen}-es");
            }
        }

        // The mailing, on the laptop in English: the ZIP with one PDF to print; the held kit has no tick box.
        await browser.NewContextAsync(1280, 900);
        var desk = browser.Page;
        await desk.GotoAsync("/ui/letters/?lang=en");
        await browser.SignInAsync(key);
        Assert.Equal(0, await desk.Locator($"tr[data-code='{held}'] input[type=checkbox]").CountAsync());
        var zip = await desk.RunAndWaitForDownloadAsync(() => desk.GetByRole(AriaRole.Button, new() { Name = "Download the batch (ZIP)" }).ClickAsync());
        using (var archive = new ZipArchive(File.OpenRead(await zip.PathAsync())))
        {
            Assert.Contains(archive.Entries, e => e.FullName == "all-letters.pdf");
            Assert.Contains(archive.Entries, e => e.FullName == "manifest.csv");
        }
        await desk.GetByLabel($"Letter for kit {ready} is in the mail").CheckAsync();
        await desk.GetByRole(AriaRole.Button, new() { Name = "Mark the ticked letters sent" }).ClickAsync();
        await Expect(desk.Locator("#status")).ToHaveTextAsync("1 of 1 letter(s) marked sent.");
        await Expect(desk.Locator($"tr[data-code='{ready}'] .outcome")).ToHaveTextAsync("Letter sent");
        await browser.CheckAsync("44-letters-marked-en");

        // The collection form sent empty: refused, said in place, nothing recorded.
        await desk.GotoAsync($"/ui/kits/kit/?code={issued}");
        await desk.GetByRole(AriaRole.Button, new() { Name = "Record the bottles" }).ClickAsync();
        await Expect(desk.Locator("#collection-status")).ToContainTextAsync("First draw:");
        await Expect(desk.Locator("#collection-status")).ToContainTextAsync("Flushed:");
        await browser.CheckAsync("44-kit-collection-refused-en");
        await desk.ReloadAsync();
        await Expect(desk.Locator("#kit-state")).ToHaveTextAsync("Issued");

        // The held batch: every QC figure and its window, the failed one marked; released with a reason.
        await desk.GotoAsync("/ui/lab/batches/");
        var held1 = desk.Locator("article.kit-card");
        await Expect(held1.Locator("tr.failed")).ToHaveCountAsync(1);
        await Expect(held1).ToContainTextAsync(batch);
        await held1.GetByLabel("Why you release it").FillAsync("The lab re-ran the check standard; its sheet is on file.");
        await held1.GetByRole(AriaRole.Button, new() { Name = "Release the batch" }).ClickAsync();
        await Expect(desk.Locator("#status")).ToContainTextAsync($"Batch {batch} version 1 is released");
        await desk.ReloadAsync();
        await Expect(desk.Locator("#status")).ToHaveTextAsync("No batch is held.");

        // Areas: one added, one made inactive; a bad code is refused, named.
        await desk.GotoAsync("/ui/areas/");
        await desk.GetByLabel("Code", new() { Exact = true }).FillAsync("hill top");
        await desk.GetByLabel("Name", new() { Exact = true }).FillAsync("Hilltop");
        await desk.GetByRole(AriaRole.Button, new() { Name = "Add the area" }).ClickAsync();
        await Expect(desk.Locator("#add-status")).ToContainTextAsync("letters, digits or dashes");
        await desk.GetByLabel("Code", new() { Exact = true }).FillAsync("hilltop");
        await desk.GetByRole(AriaRole.Button, new() { Name = "Add the area" }).ClickAsync();
        await Expect(desk.Locator("#add-status")).ToHaveTextAsync("Area hilltop (Hilltop) is added.");
        await Expect(desk.Locator("#areas tbody tr")).ToHaveCountAsync(browser.App.Areas.Length + 1);
        await desk.GetByLabel("Area north is active").UncheckAsync();
        await desk.GetByRole(AriaRole.Button, new() { Name = "Save area north" }).ClickAsync();
        await Expect(desk.Locator("#areas")).ToContainTextAsync("new sign-ups can no longer choose it");
        await browser.CheckAsync("45-areas-changed-en");
        var areas = await coordinator.GetStringAsync("/api/areas");
        Assert.Matches(new Regex("\"code\":\"north\",\"name\":\"[^\"]+\",\"active\":false"), areas);

        // A mailing longer than one page of the kit list (200 at most, KitQueries): every kit is listed. The kits are put
        // in the database: 201 sign-ups through the API would take most of this test's time.
        var home = browser.App.WithDb(db => db.Kits.Where(k => k.Code == held).Select(k => k.HouseholdId).Single());
        browser.App.WithDb(db =>
        {
            db.Kits.AddRange(Enumerable.Range(1, 201).Select(i => new Kit
            {
                Code = KitCode.NewCode(), Kind = KitKind.Water, State = KitState.Interpreted, HouseholdId = home,
                IssuedAtUtc = Clock.UtcDateTime, UpdatedAtUtc = Clock.UtcDateTime.AddMinutes(i),
            }));
            return db.SaveChanges();
        });
        var waiting = browser.App.WithDb(db => db.Kits.Count(k => k.State == KitState.Interpreted));
        await desk.GotoAsync("/ui/letters/");
        await Expect(desk.Locator("#ready tbody tr")).ToHaveCountAsync(waiting);
        await Expect(desk.Locator("#status")).ToHaveTextAsync($"{waiting} kit(s) waiting; 1 held.");
        Assert.True(waiting > 200, $"{waiting} kits: not more than one page");
    }

    /// <summary>Nothing wider than the screen: long codes wrap, wide tables stack.</summary>
    private static async Task FitsAsync(IPage page, string what) =>
        Assert.True(await page.EvaluateAsync<bool>("document.documentElement.scrollWidth <= window.innerWidth"), $"{page.Url} ({what}): wider than the screen");

    private static ILocatorAssertions Expect(ILocator locator) => Assertions.Expect(locator);
}
