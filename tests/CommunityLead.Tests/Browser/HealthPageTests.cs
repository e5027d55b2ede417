using CommunityLead.Api.Auth;
using CommunityLead.Tests.Features.Reports;
using Microsoft.Playwright;

namespace CommunityLead.Tests.Browser;

// Pages, the API description and the README are the same whichever store is behind them: the PostgreSQL run
// of .ci/run leaves these out (Store=Independent).
[Trait("Store", "Independent")]
public class HealthPageTests
{
    [ChromiumFact]
    public async Task HealthPage_SuppressedArea_ShownAsHiddenInTableAndChartOnATablet()
    {
        await using var browser = await BrowserApp.StartAsync(width: 820, height: 1180);
        TwoAreas.Seed(browser.App);
        var page = browser.Page;
        await page.GotoAsync("/ui/health/");
        await browser.SignInAsync(browser.App.CreateKey(Roles.Health));

        var ridge = page.Locator("#tables tr", new() { HasText = "ridge" });
        await Assertions.Expect(ridge).ToContainTextAsync("hidden");
        await Assertions.Expect(page.Locator("#bands-chart svg")).ToContainTextAsync("hidden: too few homes");
        await Assertions.Expect(page.Locator("#share-chart svg")).ToBeVisibleAsync();
        await browser.CheckAsync("20-health-en");

        await page.GetByRole(AriaRole.Button, new() { Name = "Español" }).ClickAsync();
        await Assertions.Expect(page.Locator("#bands-chart svg")).ToContainTextAsync("oculto: pocos hogares");
        await Assertions.Expect(page.Locator("#tables tr", new() { HasText = "ridge" })).ToContainTextAsync("oculto");
        await browser.CheckAsync("21-health-es");

        var csv = await page.RunAndWaitForDownloadAsync(() => page.GetByRole(AriaRole.Button, new() { Name = "Descargar CSV" }).ClickAsync());
        Assert.Equal("health-summary.csv", csv.SuggestedFilename);
    }
}
