namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// Headers on every answer, errors included (they are added as the response starts, after any handler has
/// written it): browsers must not guess content types, send our URLs on as referrers, or frame our pages.
/// </summary>
public static class SecurityHeaders
{
    /// <summary>The API's answers and any page: nothing but our own files, no inline script, never in a frame.</summary>
    public const string Policy = "default-src 'self'; base-uri 'none'; form-action 'none'; object-src 'none'; frame-ancestors 'none'";

    /// <summary>
    /// Swagger UI still runs no inline script (its settings come from index.js), but it styles elements inline
    /// and draws its icons as data: images.
    /// </summary>
    public const string SwaggerPolicy = "default-src 'self'; script-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data:; " +
                                        "base-uri 'none'; form-action 'none'; object-src 'none'; frame-ancestors 'none'";

    /// <summary>One year, the figure OWASP's HTTP Strict Transport Security cheat sheet uses (common practice).</summary>
    public const string Hsts = "max-age=31536000";

    public static void UseSecurityHeaders(this WebApplication app) => app.Use(async (context, next) =>
    {
        context.Response.OnStarting(() =>
        {
            var headers = context.Response.Headers;
            headers.XContentTypeOptions = "nosniff";
            headers["Referrer-Policy"] = "no-referrer";
            headers.ContentSecurityPolicy = context.Request.Path.StartsWithSegments("/swagger") ? SwaggerPolicy : Policy;
            // Only over HTTPS (RFC 6797 §7.2: never on plain HTTP); behind a proxy, as a known proxy says.
            if (context.Request.IsHttps) headers.StrictTransportSecurity = Hsts;
            return Task.CompletedTask;
        });
        await next(context);
    });
}
