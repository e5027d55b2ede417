using CommunityLead.LabClient.Api;
using Microsoft.Kiota.Abstractions.Authentication;
using Microsoft.Kiota.Http.HttpClientLibrary;

namespace CommunityLead.LabClient;

/// <summary>
/// The generated client, pointed at one service with one API key. The key goes in the Authorization header of
/// every request to that service's host only, never into a URL or a log.
/// </summary>
public static class LabConnection
{
    public static CommunityLeadApi Open(Uri service, string key, HttpClient? http = null)
    {
        var auth = new BaseBearerTokenAuthenticationProvider(new StaticKey(key, service.Host));
        var adapter = new HttpClientRequestAdapter(auth, httpClient: http ?? new HttpClient()) { BaseUrl = service.ToString().TrimEnd('/') };
        return new CommunityLeadApi(adapter);
    }

    private sealed class StaticKey(string key, string host) : IAccessTokenProvider
    {
        public AllowedHostsValidator AllowedHostsValidator { get; } = new([host]);

        public Task<string> GetAuthorizationTokenAsync(Uri uri, Dictionary<string, object>? additionalAuthenticationContext = null,
            CancellationToken cancellationToken = default) =>
            Task.FromResult(AllowedHostsValidator.IsUrlHostValid(uri) ? key : string.Empty);
    }
}
