using System.Text.Json;
using CommunityLead.Api.Infrastructure;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>Reads an application/json batch from the request stream without buffering it whole.</summary>
public static class JsonBatchReader
{
    public static async Task<ParsedBatch> ReadAsync(Stream body, JsonSerializerOptions options, BatchProblemList problems, CancellationToken ct)
    {
        var request = await JsonSerializer.DeserializeAsync<BatchRequest>(body, options, ct)
            ?? throw new JsonException("The body is empty.");
        var results = (request.Results ?? []).Select((r, i) => (r ?? Empty.Result) with { Where = $"/results/{i}" }).ToList();
        var qc = (request.Qc ?? []).Select((q, i) => (q ?? Empty.Qc) with { Where = $"/qc/{i}" }).ToList();
        return new ParsedBatch(request with { Results = results, Qc = qc }, "json", problems);
    }

    private static class Empty
    {
        public static readonly ResultRow Result = new(null, null, null, null, null, null, null, null, null, null, null, null, null);
        public static readonly QcRow Qc = new(null, null, null, null, null, null, null, null);
    }
}
