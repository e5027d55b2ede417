using System.Net;
using System.Net.Http.Headers;
using System.Text;
using System.Text.Json;
using CommunityLead.Api.Auth;

namespace CommunityLead.Tests.Infrastructure;

/// <summary>
/// curl sends "Accept: */*" (its default, from memory of curl's behaviour): such a client must read why a request
/// failed, not a bare status. RFC 9457 problem details with the RFC 9110 status reference.
/// </summary>
public class ProblemForAnyClientTests
{
    [Theory]
    [InlineData("*/*")]
    [InlineData("application/*")]
    [InlineData("application/json")]
    public async Task Problem_WrongContentTypeFromACurlLikeClient_Is415NamingWhatIsTaken(string accept)
    {
        using var app = new CommunityLeadFactory();
        var lab = app.CreateClient(Roles.Lab);
        using var request = new HttpRequestMessage(HttpMethod.Post, "/api/lab/batches")
        {
            Content = new StringContent("<batch/>", Encoding.UTF8, "application/xml"),
        };
        request.Headers.Accept.Add(MediaTypeWithQualityHeaderValue.Parse(accept));

        var response = await lab.SendAsync(request);

        Assert.Equal(HttpStatusCode.UnsupportedMediaType, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        using var problem = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        Assert.Contains("application/json", problem.RootElement.GetProperty("title").GetString());
        Assert.Contains("text/csv", problem.RootElement.GetProperty("title").GetString());
    }

    [Fact]
    public async Task Problem_UnknownRouteFromACurlLikeClient_Is404ProblemDetails()
    {
        using var app = new CommunityLeadFactory();
        var coordinator = app.CreateClient(Roles.Coordinator);
        using var request = new HttpRequestMessage(HttpMethod.Get, "/api/no-such-thing");
        request.Headers.Accept.Add(MediaTypeWithQualityHeaderValue.Parse("*/*"));

        var response = await coordinator.SendAsync(request);

        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
        using var problem = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        Assert.Equal(404, problem.RootElement.GetProperty("status").GetInt32());
        // RFC 9110 §15.5.5 is 404 Not Found.
        Assert.Equal("https://tools.ietf.org/html/rfc9110#section-15.5.5", problem.RootElement.GetProperty("type").GetString());
    }
}
