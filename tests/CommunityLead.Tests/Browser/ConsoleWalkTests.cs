using System.Net.Http.Headers;
using System.Net.Http.Json;
using System.Text;
using System.Text.RegularExpressions;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.Kits.Labels;
using CommunityLead.Tests.Features.Kits;
using CommunityLead.Tests.Features.LabResults;
using Microsoft.Playwright;
using ZXing;
using static CommunityLead.Tests.Infrastructure.Fixtures;

namespace CommunityLead.Tests.Browser;

/// <summary>
/// The coordinator's and the lab's day in a real browser, against the service on a socket: sign-in, sign-up,
/// a stale edit, a kit and its label (scanned back from the PDF), receipt by "scanner", a refused and then an
/// accepted lab CSV, the urgent call on Today, the kit's page (interpretation, the held letter's words and PDF preview,
/// the letter printed, its words, downloaded again and marked sent), and the same pages again in Spanish.
/// </summary>
// Pages, the API description and the README are the same whichever store is behind them: the PostgreSQL run
// of .ci/run leaves these out (Store=Independent).
[Trait("Store", "Independent")]
public class ConsoleWalkTests
{
    [ChromiumFact]
    public async Task Console_CoordinatorAndLabDay_WorksByKeyboardInBothLanguages()
    {
        await using var browser = await BrowserApp.StartAsync();
        var page = browser.Page;
        var coordinatorKey = browser.App.CreateKey(Roles.Coordinator);
        var labKey = browser.App.CreateKey(Roles.Lab);
        using var coordinator = Client(browser, coordinatorKey);

        // Sign-in: the key lives in this tab's session storage only.
        await page.GotoAsync("/ui/households/");
        await browser.CheckAsync("01-sign-in-en");
        await browser.SignInAsync(coordinatorKey);
        await page.GetByRole(AriaRole.Button, new() { Name = "Sign up a household" }).ClickAsync();
        Assert.Equal(coordinatorKey, await page.EvaluateAsync<string>("sessionStorage.getItem('communitylead.key')"));
        Assert.Equal(0, await page.EvaluateAsync<int>("localStorage.length - (localStorage.getItem('communitylead.language') ? 1 : 0)"));
        Assert.Empty(await browser.Context.CookiesAsync());

        // Sign-up through the form, by label.
        await page.GetByLabel("Name").FillAsync("Odile Marsh");
        await page.GetByLabel("Phone").FillAsync("+1 (555) 010-2234");
        await page.GetByLabel("Street address").FillAsync("7 Heron Quay");
        await page.GetByLabel("City").FillAsync("Brindle Cove");
        await page.GetByLabel("Postal code").FillAsync("00017");
        await page.GetByLabel("Area code").FillAsync("harbour");
        await page.GetByLabel("Service line").SelectOptionAsync("lead");
        await page.GetByLabel("A child under 6 lives here").CheckAsync();
        await page.GetByLabel("Consent form version").FillAsync("2026-01");
        await page.GetByRole(AriaRole.Button, new() { Name = "Save" }).ClickAsync();
        await Expect(page.Locator("#form-status")).ToContainTextAsync("Signed up");
        await browser.CheckAsync("02-household-signed-up-en");

        // Someone else saves the same home meanwhile: our edit is refused and said so.
        var found = await GetAsync(coordinator, "/api/households?search=5550102234");
        var householdId = found["items"]![0]!["id"]!.GetValue<string>();
        var changed = Household(h => { h["name"] = "Odile Marsh-Ferrand"; h["address"]!["line1"] = "7 Heron Quay"; h["areaCode"] = "harbour"; });
        (await coordinator.PutAsJsonAsync($"/api/households/{householdId}", changed)).EnsureSuccessStatusCode();
        await page.GetByLabel("Email").FillAsync("odile@example.org");
        await page.GetByRole(AriaRole.Button, new() { Name = "Save" }).ClickAsync();
        await Expect(page.Locator("#form-status")).ToContainTextAsync("Someone changed this household meanwhile");
        await browser.CheckAsync("03-household-stale-en");
        await page.GetByRole(AriaRole.Button, new() { Name = "Load their change" }).ClickAsync();
        await Expect(page.GetByLabel("Name")).ToHaveValueAsync("Odile Marsh-Ferrand");

        // Found again by the phone number as a caller reads it out; then a kit for it.
        await page.GetByLabel("Find a household").FillAsync("555 0114");
        await page.GetByLabel("Find a household").PressAsync("Enter");
        await page.GetByRole(AriaRole.Link, new() { Name = "Issue a kit to Odile Marsh-Ferrand" }).ClickAsync();
        await page.GetByRole(AriaRole.Button, new() { Name = "Issue the kit" }).ClickAsync();
        await Expect(page.Locator("#issue-status")).ToContainTextAsync("is issued to Odile Marsh-Ferrand");
        var code = Regex.Match(await page.Locator("#issue-status").InnerTextAsync(), @"[0-9A-Z]{4}-[0-9A-Z]{4}-[0-9A-Z]").Value;

        // Its label, downloaded as the browser does, scanned back from the rendered PDF.
        var download = await page.RunAndWaitForDownloadAsync(() => page.GetByRole(AriaRole.Button, new() { Name = "Print its label" }).ClickAsync());
        var labelFile = Path.Combine(BrowserApp.ScreenshotFolder, "kit-label.pdf");
        await download.SaveAsAsync(labelFile);
        var sheet = RenderedSheet.FirstPage(await File.ReadAllBytesAsync(labelFile), BrowserApp.ScreenshotFolder, "kit-label");
        var stock = LabelStock.Letter30;
        Assert.Equal(code, sheet.Decode(BarcodeFormat.CODE_128, stock.Left + stock.LabelWidth * 0.38, stock.Top, stock.LabelWidth * 0.62, stock.LabelHeight));
        Assert.Equal(code, sheet.Decode(BarcodeFormat.QR_CODE, stock.Left, stock.Top, stock.LabelWidth * 0.42, stock.LabelHeight));

        // The household's collection form, typed in on the kit's page. The kit was issued on the real clock just now:
        // its bottles are dated from the issue the service recorded (to the second), never from the minute on the clock.
        var issued = DateTime.Parse((await GetAsync(coordinator, $"/api/kits/{code}"))["issuedAt"]!.GetValue<string>(),
            System.Globalization.CultureInfo.InvariantCulture, System.Globalization.DateTimeStyles.AdjustToUniversal | System.Globalization.DateTimeStyles.AssumeUniversal);
        // A datetime-local input holds its value normalized: whole minutes drop ":00" (HTML, valid normalized local date
        // and time string), and Playwright refuses a fill the input would not read back as typed.
        static string Typed(DateTime t) => t.ToString(t.Second == 0 ? "yyyy-MM-dd'T'HH:mm" : "yyyy-MM-dd'T'HH:mm:ss",
            System.Globalization.CultureInfo.InvariantCulture);
        await page.GetByRole(AriaRole.Link, new() { Name = "Open its page" }).ClickAsync();
        await page.GetByLabel("Water last used before the first draw").FillAsync(Typed(issued.AddSeconds(2).AddHours(-8)));
        await page.Locator("#c-first-at").FillAsync(Typed(issued.AddSeconds(2)));
        await page.GetByLabel("Tap", new() { Exact = true }).SelectOptionAsync("kitchen");
        await page.GetByLabel("Tap ran first (seconds)").FillAsync("120");
        await page.Locator("#c-flushed-at").FillAsync(Typed(issued.AddSeconds(30)));
        await page.GetByRole(AriaRole.Button, new() { Name = "Record the bottles" }).ClickAsync();
        await Expect(page.Locator("#status")).ToContainTextAsync("The bottles are recorded");
        await Expect(page.Locator("#kit-state")).ToHaveTextAsync("Collected");
        await Expect(page.Locator("#bottles")).ToContainTextAsync("water stood 8.0 h");
        await browser.CheckAsync("04-kit-collected-en");

        // Receipt by "scanner": a typo first, then the code, each followed by Enter.
        await page.GotoAsync("/ui/kits/");
        var scan = page.GetByLabel("Kit code").First;
        await scan.FocusAsync();
        await scan.PressSequentiallyAsync(LabFixtures.Mistyped(code));
        await scan.PressAsync("Enter");
        await Expect(page.Locator("#receipt-status")).ToContainTextAsync("check character");
        await scan.PressSequentiallyAsync(code.ToLowerInvariant());
        await scan.PressAsync("Enter");
        await Expect(page.Locator("#receipt-status")).ToHaveTextAsync($"Received {code}.");
        Assert.Equal("assertive", await page.Locator("#receipt-status").GetAttributeAsync("aria-live"));
        await browser.CheckAsync("04-kits-receipt-en");

        // The lab, in a tab of its own: a bad CSV first (its problems beside its rows), then the corrected one. The
        // analysis is dated a minute after the receipt and bottles the service recorded (typed to the minute, so never
        // before them, and never more than a minute ahead of the service's clock).
        var kit = await GetAsync(coordinator, $"/api/kits/{code}");
        var latest = kit["samples"]!.AsArray().Select(s => s!["collectedAt"]!.GetValue<string>()).Append(kit["receivedAt"]!.GetValue<string>())
            .Max(t => DateTimeOffset.Parse(t, System.Globalization.CultureInfo.InvariantCulture));
        var analyzed = latest.UtcDateTime.AddMinutes(1).ToString("yyyy-MM-dd'T'HH:mm", System.Globalization.CultureInfo.InvariantCulture);
        await browser.NewContextAsync(1280, 900);
        page = browser.Page;
        await page.GotoAsync("/ui/lab/");
        await browser.SignInAsync(labKey);
        await PostCsvAsync(page, "bad.csv", LabCsv(code, firstDraw: "12O", unit: "ug/L"), analyzed);
        await Expect(page.Locator("#problem-table")).ToContainTextAsync("Row 2");
        await Expect(page.Locator("#problem-table pre").First).ToContainTextAsync("12O");
        await Expect(page.Locator("#problem-table td:last-child").First).ToContainTextAsync("not a number");
        await browser.CheckAsync("05-lab-refused-en");
        await PostCsvAsync(page, "good.csv", LabCsv(code, firstDraw: "120", unit: "ug/L"), analyzed);
        await Expect(page.Locator("#status")).ToContainTextAsync("was received");
        await browser.CheckAsync("06-lab-accepted-en");

        // Back as the coordinator: the urgent kit on Today, one card with every reason, name and phone.
        await browser.NewContextAsync(1280, 900);
        page = browser.Page;
        await page.GotoAsync("/ui/today/");
        await browser.SignInAsync(coordinatorKey);
        var card = page.Locator("article.kit-card");
        await Expect(card).ToHaveCountAsync(1);
        await Expect(card).ToContainTextAsync("Odile Marsh-Ferrand");
        await Expect(card).ToContainTextAsync("Urgent result");
        await Expect(card.GetByRole(AriaRole.Link, new() { Name = "Call +1 555 0114" })).ToBeVisibleAsync();
        await browser.CheckAsync("07-today-en");

        // The kit's page from its card: what happened, the bottles, the result and what it means. While the urgent
        // item is open its letter is only a preview.
        await card.GetByRole(AriaRole.Link, new() { Name = code }).ClickAsync();
        await Expect(page.Locator("#kit-state")).ToHaveTextAsync("Interpreted");
        await Expect(page.Locator("#timeline")).ToContainTextAsync("Received");
        await Expect(page.Locator("#bottles")).ToContainTextAsync("water stood 8.0 h");
        await Expect(page.Locator("#results")).ToContainTextAsync("120");
        await Expect(page.Locator("#meaning .tag").First).ToHaveTextAsync("Urgent");
        await Expect(page.Locator("#letter-preview.held #letter-words section")).ToHaveCountAsync(4);
        var preview = await page.RunAndWaitForDownloadAsync(() => page.GetByRole(AriaRole.Button, new() { Name = "Print the letter (PDF)" }).ClickAsync());
        Assert.EndsWith("-preview.pdf", preview.SuggestedFilename);
        await Expect(page.Locator("#letter-status")).ToContainTextAsync("This is a preview");
        await Expect(page.Locator("#letters")).ToContainTextAsync("No letter printed yet.");
        await browser.CheckAsync("08-kit-held-en");

        // The call is made and noted on Today; the letter is then printed (recorded), its words shown, and marked sent.
        await page.GotoAsync("/ui/today/");
        await card.GetByLabel("What was done").FillAsync("Called; bottled water and a filter arranged.");
        await card.GetByRole(AriaRole.Button, new() { Name = "Resolve" }).ClickAsync();
        await Expect(page.Locator("#status")).ToContainTextAsync($"Kit {code}");
        await Expect(card).ToHaveCountAsync(0);
        await page.GotoAsync($"/ui/kits/kit/?code={code}");
        var letter = await page.RunAndWaitForDownloadAsync(() => page.GetByRole(AriaRole.Button, new() { Name = "Print the letter (PDF)" }).ClickAsync());
        var letterFile = Path.Combine(BrowserApp.ScreenshotFolder, "letter.pdf");
        await letter.SaveAsAsync(letterFile);
        Assert.StartsWith("%PDF", Encoding.ASCII.GetString((await File.ReadAllBytesAsync(letterFile))[..4]));
        await Expect(page.Locator("#letter-status")).ToContainTextAsync("recorded");
        await Expect(page.Locator("#letter-words section")).ToHaveCountAsync(4);
        await Expect(page.Locator("#letter-held")).ToBeHiddenAsync();
        var again = await page.RunAndWaitForDownloadAsync(() => page.GetByRole(AriaRole.Button, new() { NameRegex = new Regex("^PDF of letter [0-9]+$") }).ClickAsync());
        Assert.StartsWith($"letter-{code}-", again.SuggestedFilename);
        await page.GetByRole(AriaRole.Button, new() { Name = "Mark the letter sent" }).ClickAsync();
        await Expect(page.Locator("#kit-state")).ToHaveTextAsync("Letter sent");
        await Expect(page.Locator("#timeline")).ToContainTextAsync("Letter marked sent");
        await browser.CheckAsync("09-kit-letter-sent-en");

        // The same pages in Spanish.
        await page.GetByRole(AriaRole.Button, new() { Name = "Español" }).ClickAsync();
        await Expect(page.Locator("#kit-state")).ToHaveTextAsync("Carta enviada");
        Assert.Equal("es", await page.EvaluateAsync<string>("document.documentElement.lang"));
        await browser.CheckAsync("10-kit-es");
        await page.GotoAsync("/ui/kits/");
        await Expect(page.Locator("h1")).ToHaveTextAsync("Kits");
        await browser.CheckAsync("10-kits-es");
        await page.GotoAsync("/ui/today/");
        await Expect(page.Locator("h1")).ToHaveTextAsync("Hoy");
        await browser.CheckAsync("10-today-es");
        await page.GotoAsync($"/ui/households/?id={householdId}");
        await Expect(page.Locator("#form-title")).ToContainTextAsync("Editar");
        await browser.CheckAsync("11-households-es");

        // Signing out forgets the key.
        await page.GetByRole(AriaRole.Button, new() { Name = "Cerrar sesión" }).ClickAsync();
        await Expect(page.Locator("#sign-in")).ToBeVisibleAsync();
        Assert.Null(await page.EvaluateAsync<string?>("sessionStorage.getItem('communitylead.key')"));

        await page.GotoAsync("/ui/lab/");
        await browser.SignInAsync(labKey);
        await PostCsvAsync(page, "bad.csv", LabCsv(code, firstDraw: "12O", unit: "ug/L"), analyzed, batchId: "WALK-ES");
        await Expect(page.Locator("#problem-table")).ToContainTextAsync("Fila 2");
        // The reason is the service's, in English: marked so, and said so under the table.
        await Expect(page.Locator("#problem-table td:last-child [lang=en]").First).ToContainTextAsync("not a number");
        await Expect(page.Locator("#problems .english-only")).ToBeVisibleAsync();
        await browser.CheckAsync("12-lab-refused-es");
        await page.GotoAsync("/ui/");
        await browser.CheckAsync("13-home-es");
    }

    private static string LabCsv(string code, string firstDraw, string unit) => $"""
        sampleType,kitCode,bottle,analyte,value,unit,mdl,reportingLimit,expected,measured
        sample,{code},first-draw,lead,{firstDraw},{unit},0.3,1.0,,
        sample,{code},flushed,lead,4.1,{unit},0.3,1.0,,
        calibration-blank,,,lead,,ug/L,,,0,0.05
        calibration-check,,,lead,,ug/L,,,10,9.8
        """;

    private static async Task PostCsvAsync(IPage page, string name, string csv, string analyzedAt, string batchId = "WALK-1")
    {
        await page.GetByLabel(new Regex("CSV")).First.SetInputFilesAsync(new FilePayload { Name = name, MimeType = "text/csv", Buffer = Encoding.UTF8.GetBytes(csv) });
        await page.Locator("#batch-id").FillAsync(batchId);
        await page.Locator("#analyzed-at").FillAsync(analyzedAt);
        await page.Locator("#upload-form button[type=submit]").ClickAsync();
    }

    private static HttpClient Client(BrowserApp browser, string key) => new()
    {
        BaseAddress = new Uri(browser.Address),
        DefaultRequestHeaders = { Authorization = new AuthenticationHeaderValue("Bearer", key) },
    };

    private static ILocatorAssertions Expect(ILocator locator) => Assertions.Expect(locator);
}
