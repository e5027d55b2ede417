using System.Security.Claims;
using System.Text.Encodings.Web;
using CommunityLead.Api.Infrastructure;
using Microsoft.AspNetCore.Authentication;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Auth;

/// <summary>
/// Reads "Authorization: Bearer &lt;key&gt;" and signs the request in as the key's label and role. Failed sign-ins
/// are logged (key id and client address, never the secret) and limited by <see cref="SignInThrottle"/>.
/// </summary>
public sealed partial class ApiKeyAuthenticationHandler(
    IOptionsMonitor<AuthenticationSchemeOptions> options, ILoggerFactory logger, UrlEncoder encoder,
    ApiKeyService keys, SignInThrottle throttle, IProblemDetailsService problems)
    : AuthenticationHandler<AuthenticationSchemeOptions>(options, logger, encoder)
{
    public const string SchemeName = "ApiKey";

    private TimeSpan? refusedFor;

    protected override async Task<AuthenticateResult> HandleAuthenticateAsync()
    {
        string? header = Request.Headers.Authorization;
        if (string.IsNullOrEmpty(header)) return AuthenticateResult.NoResult();
        var presented = header.StartsWith("Bearer ", StringComparison.OrdinalIgnoreCase) ? header["Bearer ".Length..].Trim() : null;
        var keyId = presented is null ? null : ApiKeyService.KeyIdOf(presented);
        var address = ClientAddress();

        refusedFor = throttle.Refusal(address, keyId);
        if (refusedFor is not null)
        {
            SignInRefused(Logger, address, keyId ?? "none");
            return AuthenticateResult.Fail("Too many failed sign-ins.");
        }
        var verified = presented is null ? null : await keys.VerifyAsync(presented, Context.RequestAborted);
        if (verified is null)
        {
            throttle.Failed(address, keyId);
            var reason = presented is null ? "not a Bearer header" : keyId is null ? "not a key" : "unknown or revoked key";
            SignInFailed(Logger, address, keyId ?? "none", reason);
            return AuthenticateResult.Fail(presented is null ? "Use 'Authorization: Bearer <key>'." : "Unknown or revoked key.");
        }
        var identity = new ClaimsIdentity(
            [new Claim(ClaimTypes.Name, verified.Label), new Claim(ClaimTypes.Role, verified.Role)], SchemeName);
        return AuthenticateResult.Success(new AuthenticationTicket(new ClaimsPrincipal(identity), SchemeName));
    }

    protected override Task HandleChallengeAsync(AuthenticationProperties properties) =>
        refusedFor is { } wait
            ? TooManyRequests.WriteAsync(Context, wait, "Too many failed sign-ins.",
                "Too many sign-ins with a wrong key came from this address or named this key. Check the key you send.")
            : WriteProblem(StatusCodes.Status401Unauthorized, "A valid API key is required.",
                "Send 'Authorization: Bearer <key>'. Keys are made with the service's 'keys create' command.");

    protected override Task HandleForbiddenAsync(AuthenticationProperties properties) =>
        WriteProblem(StatusCodes.Status403Forbidden, "This key's role may not do this.",
            $"The key's role is '{Context.User.FindFirstValue(ClaimTypes.Role)}'.");

    /// <summary>The connection's address, or the client's as a known proxy forwarded it (ForwardingSetup).</summary>
    private string ClientAddress() =>
        Context.Connection.RemoteIpAddress is { } ip ? (ip.IsIPv4MappedToIPv6 ? ip.MapToIPv4() : ip).ToString() : "unknown";

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

    [LoggerMessage(EventId = 4010, Level = LogLevel.Warning, Message = "Failed sign-in from {ClientAddress}, key id {KeyId}: {Reason}.")]
    private static partial void SignInFailed(ILogger logger, string clientAddress, string keyId, string reason);

    // The failures that led here were each logged; a client that keeps trying shows in these.
    [LoggerMessage(EventId = 4290, Level = LogLevel.Information, Message = "Sign-in refused from {ClientAddress}, key id {KeyId}: too many failed sign-ins.")]
    private static partial void SignInRefused(ILogger logger, string clientAddress, string keyId);
}
