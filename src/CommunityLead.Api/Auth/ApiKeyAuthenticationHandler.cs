using System.Security.Claims;
using System.Text.Encodings.Web;
using Microsoft.AspNetCore.Authentication;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Auth;

/// <summary>Reads "Authorization: Bearer &lt;key&gt;" and signs the request in as the key's label and role.</summary>
public sealed class ApiKeyAuthenticationHandler(
    IOptionsMonitor<AuthenticationSchemeOptions> options, ILoggerFactory logger, UrlEncoder encoder,
    ApiKeyService keys, IProblemDetailsService problems)
    : AuthenticationHandler<AuthenticationSchemeOptions>(options, logger, encoder)
{
    public const string SchemeName = "ApiKey";

    protected override async Task<AuthenticateResult> HandleAuthenticateAsync()
    {
        string? header = Request.Headers.Authorization;
        if (string.IsNullOrEmpty(header)) return AuthenticateResult.NoResult();
        if (!header.StartsWith("Bearer ", StringComparison.OrdinalIgnoreCase))
            return AuthenticateResult.Fail("Use 'Authorization: Bearer <key>'.");
        var verified = await keys.VerifyAsync(header["Bearer ".Length..].Trim(), Context.RequestAborted);
        if (verified is null) return AuthenticateResult.Fail("Unknown or revoked key.");
        var identity = new ClaimsIdentity(
            [new Claim(ClaimTypes.Name, verified.Label), new Claim(ClaimTypes.Role, verified.Role)], SchemeName);
        return AuthenticateResult.Success(new AuthenticationTicket(new ClaimsPrincipal(identity), SchemeName));
    }

    protected override Task HandleChallengeAsync(AuthenticationProperties properties) =>
        WriteProblem(StatusCodes.Status401Unauthorized, "A valid API key is required.",
            "Send 'Authorization: Bearer <key>'. Keys are made with the service's 'keys create' command.");

    protected override Task HandleForbiddenAsync(AuthenticationProperties properties) =>
        WriteProblem(StatusCodes.Status403Forbidden, "This key's role may not do this.",
            $"The key's role is '{Context.User.FindFirstValue(ClaimTypes.Role)}'.");

    private async Task WriteProblem(int status, string title, string detail)
    {
        Response.StatusCode = status;
        if (status == StatusCodes.Status401Unauthorized) Response.Headers.WWWAuthenticate = "Bearer";
        await problems.WriteAsync(new ProblemDetailsContext
        {
            HttpContext = Context,
            ProblemDetails = { Status = status, Title = title, Detail = detail },
        });
    }
}
