using System.Net;
using System.Text.Json.Nodes;

namespace CommunityLead.Tests.Infrastructure.Fuzz;

/// <summary>
/// What the fuzzed requests were answered, kept so the database can be held against it afterwards: every 2xx
/// write and the rows it says it made, each at its own moment of the test clock (one second per case), so that a
/// row can be traced to the case that wrote it.
/// </summary>
public sealed class FuzzLedger
{
    private readonly Dictionary<FuzzRoute, int> accepted = [];

    public List<string> Failures { get; } = [];
    public HashSet<DateTime> WriteTimes { get; } = [];
    public HashSet<DateTime> MayWriteTimes { get; } = [];
    public int Households { get; private set; }
    public int Collections { get; private set; }
    public int Samples { get; private set; }
    public int Batches { get; private set; }
    public int Results { get; private set; }
    public int QcRows { get; private set; }

    public int Accepted(FuzzRoute route) => accepted.GetValueOrDefault(route);

    /// <summary>Every answer is a 2xx or a 4xx problem details; anything else is recorded with the request.</summary>
    public async Task RecordAsync(FuzzCase fuzz, HttpResponseMessage response, DateTime at)
    {
        var status = (int)response.StatusCode;
        var text = await response.Content.ReadAsStringAsync();
        if (status is >= 200 and < 300)
        {
            accepted[fuzz.Route] = Accepted(fuzz.Route) + 1;
            Count(fuzz.Route, response.StatusCode, text, at);
            return;
        }
        if (status is >= 400 and < 500 && IsProblem(response, text, status)) return;
        if (Failures.Count < 20) Failures.Add($"{status} for {fuzz}\n  → {(text.Length > 300 ? text[..300] : text)}");
        else Failures[^1] = $"… and more ({Failures.Count}+)";
    }

    public void Crashed(FuzzCase fuzz, Exception e)
    {
        if (Failures.Count < 20) Failures.Add($"exception for {fuzz}\n  → {e.GetType().Name}: {e.Message}");
    }

    private void Count(FuzzRoute route, HttpStatusCode status, string text, DateTime at)
    {
        switch (route)
        {
            case FuzzRoute.SignUp:
                Households++;
                WriteTimes.Add(at);
                break;
            case FuzzRoute.Collection:
                Collections++;
                Samples += JsonNode.Parse(text)!["samples"]!.AsArray().Count;
                WriteTimes.Add(at);
                break;
            case FuzzRoute.LabJson or FuzzRoute.LabCsv when status == HttpStatusCode.Created:
                var outcome = JsonNode.Parse(text)!;
                Batches++;
                Results += outcome["resultCount"]!.GetValue<int>();
                QcRows += outcome["qc"]!["checks"]!.AsArray().Count(c => c!["type"] is not null);
                WriteTimes.Add(at);
                break;
            case FuzzRoute.LabJson or FuzzRoute.LabCsv:
                // The same batch again: the original outcome, nothing written (a repair would be allowed to).
                MayWriteTimes.Add(at);
                break;
        }
    }

    private static bool IsProblem(HttpResponseMessage response, string text, int status)
    {
        if (response.Content.Headers.ContentType?.MediaType != "application/problem+json") return false;
        try
        {
            return JsonNode.Parse(text) is JsonObject problem && problem["status"]?.GetValue<int>() == status && problem["title"] is not null;
        }
        catch (System.Text.Json.JsonException)
        {
            return false;
        }
    }
}
