using System.Net.Http.Headers;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.Results;
using CommunityLead.Tests.Auth;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Playwright;

namespace CommunityLead.Tests.Browser;

// Pages, the API description and the README are the same whichever store is behind them: the PostgreSQL run
// of .ci/run leaves these out (Store=Independent).
[Trait("Store", "Independent")]
public class ResultPageTests
{
    [ChromiumFact]
    public async Task ResultPage_OnAPhone_CodeAndSecretShowTheLetterWordsAndItsPdf()
    {
        await using var browser = await BrowserApp.StartAsync(width: 390, height: 844, configure: app =>
        {
            app.Settings["ResultAccess:SecretKey"] = "test-only-key-for-result-secrets-0123456789";
            app.Settings["ResultAccess:PageAddress"] = "https://tapcheck.example.org/ui/result/";
        });
        await browser.NewContextAsync(390, 844, touch: true);
        using var coordinator = new HttpClient { BaseAddress = new Uri(browser.Address) };
        coordinator.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", browser.App.CreateKey(Roles.Coordinator));
        var (code, _) = await new RouteSetup(browser.App, coordinator).LetterAsync();
        var secret = browser.App.Services.GetRequiredService<ResultSecrets>().For(code);
        var page = browser.Page;

        await page.GotoAsync("/ui/result/");
        await browser.CheckAsync("30-result-phone-en");
        await page.GetByLabel("Kit code").FillAsync(code);
        await page.GetByLabel("Secret code").FillAsync("AAAAA-AAAAA");
        await page.GetByRole(AriaRole.Button, new() { Name = "Show my result" }).ClickAsync();
        await Assertions.Expect(page.Locator("#status")).ToContainTextAsync("No result matches these codes");

        await page.GetByLabel("Secret code").FillAsync(secret.ToLowerInvariant());
        await page.GetByRole(AriaRole.Button, new() { Name = "Show my result" }).ClickAsync();
        // The fixture's household reads Spanish: its result is in Spanish, whatever the page's own language.
        await Assertions.Expect(page.Locator("#result")).ToHaveAttributeAsync("lang", "es");
        await Assertions.Expect(page.Locator("#result h2")).ToBeFocusedAsync();
        await Assertions.Expect(page.Locator("#result section h3")).ToHaveCountAsync(4);
        Assert.DoesNotContain("[object", await page.Locator("#result").InnerTextAsync());
        await browser.CheckAsync("31-result-phone-shown-en");
        var letter = await page.RunAndWaitForDownloadAsync(() => page.GetByRole(AriaRole.Button, new() { Name = "Download my letter (PDF)" }).ClickAsync());
        Assert.Equal($"letter-{code}.pdf", letter.SuggestedFilename);
        // The page's width fits the phone: nothing wider than the screen but the scrollable table.
        Assert.True(await page.EvaluateAsync<bool>("document.documentElement.scrollWidth <= window.innerWidth"));

        await page.GetByRole(AriaRole.Button, new() { Name = "Español" }).ClickAsync();
        await page.GetByLabel("Código del kit").FillAsync(code);
        await page.GetByLabel("Clave de la carta").FillAsync(secret);
        await page.GetByRole(AriaRole.Button, new() { Name = "Ver mi resultado" }).ClickAsync();
        await Assertions.Expect(page.Locator("#result")).ToBeVisibleAsync();
        await browser.CheckAsync("32-result-phone-shown-es");

        // The narrowest common phone: the result table stacks, every cell (the 4th, "Comparado con", too) inside the
        // screen, with its column's title beside it, and nothing to scroll sideways.
        await page.SetViewportSizeAsync(360, 780);
        Assert.True(await page.EvaluateAsync<bool>(
            "[...document.querySelectorAll('#result td')].every(c => c.getBoundingClientRect().right <= window.innerWidth + 0.5)"));
        Assert.True(await page.EvaluateAsync<bool>(
            "[...document.querySelectorAll('#result .table-wrap')].every(w => w.scrollWidth <= w.clientWidth)"));
        Assert.Equal("Comparado con", await page.Locator("#result td").Nth(3).GetAttributeAsync("data-label"));
        await browser.CheckAsync("33-result-phone-360-es");
    }
}
