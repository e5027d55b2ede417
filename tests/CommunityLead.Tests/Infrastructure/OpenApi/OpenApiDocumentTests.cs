using System.Text.Json.Nodes;

namespace CommunityLead.Tests.Infrastructure.OpenApi;

/// <summary>
/// The document a lab's developer generates a client from: passed by two independent OpenAPI linters with no
/// error, and complete where the linters do not look (every operation named and summarised, file answers
/// typed, open operations open, schema names without namespaces).
/// </summary>
// Pages, the API description and the README are the same whichever store is behind them: the PostgreSQL run
// of .ci/run leaves these out (Store=Independent).
[Trait("Store", "Independent")]
public class OpenApiDocumentTests
{
    [Fact]
    public async Task ServedDocument_PassesRedoclyAndSpectralWithNoError()
    {
        var folder = await ServedDocument.LintersAsync();
        var document = await ServedDocument.WriteAsync(Path.Combine(Path.GetTempPath(), "communitylead-openapi-" + Guid.NewGuid().ToString("N")));

        // Redocly CLI, its "recommended" ruleset (redocly.yaml): exit 1 on any error, warnings allowed.
        var (redocly, redoclyOutput) = await ServedDocument.RunAsync(folder, Path.Combine(folder, "node_modules/.bin/redocly"), "lint", document, "--format=stylish");
        Assert.True(redocly == 0, redoclyOutput);
        // Spectral CLI with its "spectral:oas" ruleset (.spectral.yaml): exit 1 on any error.
        var (spectral, spectralOutput) = await ServedDocument.RunAsync(folder, Path.Combine(folder, "node_modules/.bin/spectral"), "lint", document,
            "--ruleset", ".spectral.yaml", "--fail-severity", "error");
        Assert.True(spectral == 0, spectralOutput);
    }

    [Fact]
    public async Task EveryOperation_HasAnIdASummaryAndWhatItAnswers()
    {
        var document = JsonNode.Parse(await ServedDocument.FetchAsync())!;
        var operations = document["paths"]!.AsObject()
            .SelectMany(path => path.Value!.AsObject().Select(op => (Route: $"{op.Key.ToUpperInvariant()} {path.Key}", Op: op.Value!)))
            .ToList();

        Assert.NotEmpty(operations);
        Assert.All(operations, o => Assert.False(string.IsNullOrWhiteSpace((string?)o.Op["operationId"]), $"{o.Route}: no operationId"));
        Assert.All(operations, o => Assert.False(string.IsNullOrWhiteSpace((string?)o.Op["summary"]), $"{o.Route}: no summary"));
        Assert.Equal(operations.Count, operations.Select(o => (string)o.Op["operationId"]!).Distinct().Count());
        Assert.All(operations, o => Assert.All(o.Op["responses"]!.AsObject().Where(r => r.Key.StartsWith('2') && r.Key != "204"),
            r => Assert.True(r.Value!["content"] is JsonObject { Count: > 0 }, $"{o.Route} {r.Key}: no content described")));
        Assert.All(document["components"]!["schemas"]!.AsObject(), s => Assert.DoesNotContain('.', s.Key));
    }

    [Fact]
    public async Task Document_SaysWhatTheHandWrittenPartsOfTheApiTake()
    {
        var document = JsonNode.Parse(await ServedDocument.FetchAsync())!;
        var paths = document["paths"]!;
        JsonNode Schema(JsonNode response) => document["components"]!["schemas"]![
            ((string)response["content"]!["application/problem+json"]!["schema"]!["$ref"]!).Split('/')[^1]]!;

        var health = paths["/health"]!["get"]!;
        Assert.Equal("{}", health["security"]![0]!.ToJsonString());
        Assert.NotNull(health["responses"]!["503"]);
        Assert.Null(health["responses"]!["401"]);

        var batch = paths["/api/lab/batches"]!["post"]!;
        Assert.Equal("string", (string?)batch["requestBody"]!["content"]!["text/csv"]!["schema"]!["type"]);
        var csvQuery = batch["parameters"]!.AsArray().Select(p => (string)p!["name"]!).ToList();
        Assert.Equal(["batchId", "method", "analyzedAt", "correction", "correctionReason"], csvQuery);
        Assert.NotNull(Schema(batch["responses"]!["422"]!)["properties"]!["problems"]);

        Assert.NotNull(Schema(paths["/api/kits/{code}/cancel"]!["post"]!["responses"]!["409"]!)["properties"]!["allowedActions"]);
        Assert.Null(paths["/api/kits"]!["get"]!["responses"]!["409"]);
        Assert.Equal("binary", (string?)paths["/api/letters/batch"]!["post"]!["responses"]!["200"]!["content"]!["application/zip"]!["schema"]!["format"]);

        var summary = paths["/api/reports/summary"]!["get"]!;
        Assert.NotNull(summary["responses"]!["200"]!["content"]!["application/json"]!["schema"]!["$ref"]);
        Assert.NotNull(summary["responses"]!["200"]!["content"]!["text/csv"]);
        Assert.Contains("groupBy", summary["parameters"]!.AsArray().Select(p => (string)p!["name"]!));

        var kitState = paths["/api/kits"]!["get"]!["parameters"]!.AsArray().Single(p => (string)p!["name"]! == "state")!;
        Assert.Equal("#/components/schemas/KitState", (string?)kitState["schema"]!["$ref"]);
        Assert.Contains("If-Match", paths["/api/households/{id}"]!["put"]!["parameters"]!.ToJsonString());
        Assert.NotNull(paths["/api/households/{id}"]!["get"]!["responses"]!["200"]!["headers"]!["ETag"]);
        Assert.NotNull(paths["/api/households"]!["post"]!["responses"]!["400"]);
    }
}
