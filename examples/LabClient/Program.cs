using System.Text.Json;
using CommunityLead.LabClient;
using CommunityLead.LabClient.Api.Models;
using Microsoft.Kiota.Abstractions;
using Microsoft.Kiota.Abstractions.Serialization;

// lab-client post <batch.json>     post a JSON batch; prints its verdict, or every problem of a refused batch
// lab-client batch <batchId>       a batch's verdict and QC figures
// lab-client kit <code>            a kit as the lab sees it
// The service's address and the lab's key come from COMMUNITYLEAD_URL and COMMUNITYLEAD_KEY, so the key is never
// typed on a command line that the shell's history keeps.
if (args is not [("post" or "batch" or "kit") and var command, var argument])
{
    Console.Error.WriteLine("usage: lab-client post <batch.json> | batch <batchId> | kit <code>");
    return 2;
}
var url = Environment.GetEnvironmentVariable("COMMUNITYLEAD_URL");
var key = Environment.GetEnvironmentVariable("COMMUNITYLEAD_KEY");
if (string.IsNullOrWhiteSpace(url) || !Uri.TryCreate(url, UriKind.Absolute, out var service) || string.IsNullOrWhiteSpace(key))
{
    Console.Error.WriteLine("Set COMMUNITYLEAD_URL (e.g. https://tapcheck.example.org) and COMMUNITYLEAD_KEY (the lab's key).");
    return 2;
}

var api = LabConnection.Open(service, key);
try
{
    switch (command)
    {
        case "post":
            var batch = await KiotaJsonSerializer.DeserializeAsync(await File.ReadAllTextAsync(argument), BatchRequest.CreateFromDiscriminatorValue);
            var outcome = await api.Api.Lab.Batches.PostAsync(batch!);
            Console.WriteLine($"Batch {outcome!.BatchId} version {outcome.Version}: {outcome.Status}.");
            break;
        case "batch":
            var detail = await api.Api.Lab.Batches[argument].GetAsync();
            Console.WriteLine(await KiotaJsonSerializer.SerializeAsStringAsync(detail!));
            break;
        case "kit":
            var kit = await api.Api.Kits[argument].GetAsync();
            Console.WriteLine($"Kit {kit!.Code}: {kit.State}.");
            break;
    }
    return 0;
}
catch (BatchRefusedProblem refused)
{
    Console.Error.WriteLine($"{refused.Title} {refused.Detail}");
    var reasons = refused.Errors?.AdditionalData ?? new Dictionary<string, object>();
    foreach (var problem in refused.Problems ?? [])
        Console.Error.WriteLine($"  {problem.Row}: {problem.Field}: {string.Join(" ", Reasons(reasons, problem.Key))}");
    if (refused.Note is { } note) Console.Error.WriteLine(note);
    return 1;
}
catch (ApiException failed)
{
    Console.Error.WriteLine($"The service answered {failed.ResponseStatusCode}: {failed.Message}");
    return 1;
}
catch (JsonException bad)
{
    Console.Error.WriteLine($"{argument} is not a JSON batch: {bad.Message}");
    return 1;
}

// Kiota keeps the reasons of `errors` (a map of arrays) as untyped nodes.
static IEnumerable<string> Reasons(IDictionary<string, object> errors, string? key) =>
    key is not null && errors.TryGetValue(key, out var value) && value is Microsoft.Kiota.Abstractions.Serialization.UntypedArray list
        ? list.GetValue().OfType<Microsoft.Kiota.Abstractions.Serialization.UntypedString>().Select(s => s.GetValue() ?? "")
        : [];
