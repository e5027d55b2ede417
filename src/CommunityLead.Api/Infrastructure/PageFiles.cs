using Microsoft.Extensions.FileProviders;

namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// The web pages: plain HTML, one style sheet and small script modules, kept beside the API each one calls and
/// served as files (no server-side rendering, no front-end build). They sign in with the same keys as any client
/// (the bearer header, the key held in the tab's session storage), so every rule of the API holds for them.
/// Served before authentication: the files themselves hold no data, only the API calls they make do.
/// </summary>
public static class PageFiles
{
    /// <summary>Where each folder of pages is served; listed by hand like the features in Program.cs.</summary>
    public static readonly IReadOnlyList<(string Url, string Folder)> Folders =
    [
        ("/ui", "Infrastructure/Pages"),
        ("/ui/today", "Features/Attention/Pages"),
        ("/ui/households", "Features/Households/Pages"),
        ("/ui/kits", "Features/Kits/Pages"),
        ("/ui/letters", "Features/Letters/Pages"),
        ("/ui/areas", "Features/Areas/Pages"),
        ("/ui/lab", "Features/LabResults/Pages"),
        ("/ui/result", "Features/Results/Pages"),
        ("/ui/health", "Features/Reports/Pages"),
    ];

    public static void UseCommunityLeadPages(this WebApplication app)
    {
        foreach (var (url, folder) in Folders)
        {
            var path = Path.Combine(app.Environment.ContentRootPath, folder);
            if (!Directory.Exists(path)) continue;
            var files = new PhysicalFileProvider(path);
            app.UseDefaultFiles(new DefaultFilesOptions { FileProvider = files, RequestPath = url });
            app.UseStaticFiles(new StaticFileOptions
            {
                FileProvider = files,
                RequestPath = url,
                // A page and its scripts change together on an upgrade: ask the server each time (ETag makes it cheap).
                OnPrepareResponse = c => c.Context.Response.Headers.CacheControl = "no-cache",
            });
        }
    }
}
