namespace CommunityLead.Tests.Browser;

/// <summary>
/// A browser test: skipped, saying why, only where Debian's chromium is not installed. CI never skips it:
/// .ci/run installs chromium first (apt-get install chromium), and this project never downloads a browser.
/// </summary>
public sealed class ChromiumFactAttribute : FactAttribute
{
    public ChromiumFactAttribute()
    {
        if (BrowserApp.ChromiumPath is null)
            Skip = "chromium is not installed (apt-get install -y chromium); .ci/run installs it, so CI runs this test.";
    }
}
