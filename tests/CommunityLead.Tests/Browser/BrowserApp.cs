using System.Net;
using System.Net.Sockets;
using CommunityLead.Tests.Infrastructure;
using Deque.AxeCore.Playwright;
using Microsoft.Playwright;

namespace CommunityLead.Tests.Browser;

/// <summary>
/// The service on a real socket (Kestrel, not TestServer: a browser needs one) with its own database, and
/// Debian's chromium driven by Playwright. Each page visited is checked with axe and photographed.
/// </summary>
public sealed partial class BrowserApp : IAsyncDisposable
{
    private readonly List<string> consoleErrors = [];
    private IPlaywright? playwright;
    private IBrowser? browser;

    private BrowserApp(CommunityLeadFactory app, string address)
    {
        App = app;
        Address = address;
    }

    public CommunityLeadFactory App { get; }
    public string Address { get; }
    public IPage Page { get; private set; } = null!;
    public IBrowserContext Context { get; private set; } = null!;

    /// <summary>Errors the pages wrote to the console (a refused script or style under the CSP shows here).</summary>
    public IReadOnlyList<string> ConsoleErrors => consoleErrors;

    public static string? ChromiumPath { get; } = new[] { "/usr/bin/chromium", "/usr/bin/chromium-browser" }.FirstOrDefault(File.Exists);

    /// <summary>Where screenshots go: the test output's artifacts folder, or COMMUNITYLEAD_SCREENSHOTS.</summary>
    public static string ScreenshotFolder { get; } = Environment.GetEnvironmentVariable("COMMUNITYLEAD_SCREENSHOTS")
        ?? Path.Combine(AppContext.BaseDirectory, "artifacts", "screens");

    /// <param name="fixedClock">The service's clock, stopped at this time, for pages that type no time of their own;
    /// by default the service follows the real clock as the browser does.</param>
    public static async Task<BrowserApp> StartAsync(int width = 1280, int height = 900, Action<CommunityLeadFactory>? configure = null,
        DateTimeOffset? fixedClock = null)
    {
        var port = FreePort();
        // The browser stamps times from the real clock (a receipt "now"), so the service runs on it too: a clock stopped
        // at the test's start made a long run's receipts and analyses "in the future" once 15 minutes had passed.
        var app = new CommunityLeadFactory(now: fixedClock ?? DateTimeOffset.UtcNow);
        app.Clock.Running = fixedClock is null;
        configure?.Invoke(app);
        // On a loaded machine (the whole suite beside chromium) a page can take longer than Playwright's 5 s default
        // to show what a step waits for: every wait is on a condition, with room for a slow machine.
        Assertions.SetDefaultExpectTimeout(30_000);
        app.UseKestrel(port);
        app.StartServer();
        var session = new BrowserApp(app, $"http://localhost:{port}");
        session.playwright = await Playwright.CreateAsync();
        session.browser = await session.playwright.Chromium.LaunchAsync(new()
        {
            ExecutablePath = ChromiumPath,
            Args = ["--headless", "--no-sandbox", "--disable-gpu"],
        });
        await session.NewContextAsync(width, height);
        return session;
    }

    /// <summary>A fresh browser profile (empty session storage) of the given screen size.</summary>
    public async Task NewContextAsync(int width, int height, bool touch = false)
    {
        if (Context is not null) await Context.CloseAsync();
        Context = await browser!.NewContextAsync(new()
        {
            ViewportSize = new() { Width = width, Height = height },
            BaseURL = Address,
            AcceptDownloads = true,
            HasTouch = touch,
            Locale = "en-US",
            // Times typed into the pages' date fields are read in the browser's zone: UTC, as the tests type them.
            TimezoneId = "UTC",
        });
        Context.SetDefaultTimeout(60_000);
        Page = await Context.NewPageAsync();
        // A refusal the page expects (400, 412, 422) is logged by chromium as a failed load: not a page error.
        // Script errors, refused scripts or styles (CSP) and any 5xx still count.
        Page.Console += (_, message) =>
        {
            if (message.Type == "error" && !ExpectedRefusal().IsMatch(message.Text)) consoleErrors.Add($"{Page.Url}: {message.Text}");
        };
        Page.PageError += (_, error) => consoleErrors.Add($"{Page.Url}: {error}");
    }

    /// <summary>
    /// axe (WCAG 2.x A and AA rules) on the page as it is now: no serious or critical violation may remain.
    /// Then a full-page screenshot named after the step, for a person to look at.
    /// </summary>
    public async Task CheckAsync(string name)
    {
        var result = await Page.RunAxe();
        var bad = result.Violations.Where(v => v.Impact is "serious" or "critical")
            .Select(v => $"{v.Id} ({v.Impact}): {v.Help} at {string.Join(" | ", v.Nodes.Select(n => n.Html).Take(3))}")
            .ToList();
        Directory.CreateDirectory(ScreenshotFolder);
        await Page.ScreenshotAsync(new() { Path = Path.Combine(ScreenshotFolder, $"{name}.png"), FullPage = true });
        Assert.True(bad.Count == 0, $"{name}: axe found {string.Join("; ", bad)}");
        Assert.True(consoleErrors.Count == 0, $"{name}: console errors: {string.Join("; ", consoleErrors)}");
    }

    public async Task SignInAsync(string key)
    {
        // The form is drawn once the page's words are loaded and <html lang> is set: read the language only then. Read
        // at once, a slow page still said "en" (the file's own) and the key's Spanish label was never found.
        await Page.Locator("#sign-in").WaitForAsync();
        await Page.GetByLabel(LabelOfKey(await Page.EvaluateAsync<string>("document.documentElement.lang"))).FillAsync(key);
        await Page.Locator("#sign-in button[type=submit]").ClickAsync();
    }

    private static string LabelOfKey(string language) => language == "es" ? "Su clave" : "Your key";

    [System.Text.RegularExpressions.GeneratedRegex("^Failed to load resource: the server responded with a status of 4[0-9][0-9]")]
    private static partial System.Text.RegularExpressions.Regex ExpectedRefusal();

    private static int FreePort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }

    public async ValueTask DisposeAsync()
    {
        if (browser is not null) await browser.CloseAsync();
        playwright?.Dispose();
        await App.DisposeAsync();
    }
}
