using System.Security.Cryptography;
using System.Text.Json;
using CommunityLead.Api.Features.LabResults;
using CommunityLead.Api.Infrastructure;

namespace CommunityLead.Tests.Features.LabResults;

/// <summary>
/// The hash fed row by row (a streamed CSV batch) is the hash of the whole request serialized at once, as earlier
/// versions stored it: otherwise a lab's retry of a batch stored before would be refused as changed content.
/// </summary>
public sealed class BatchHashTests
{
    [Fact]
    public void BatchHash_RowByRow_SameAsTheWholeRequestSerialized()
    {
        var options = new JsonSerializerOptions(JsonSerializerDefaults.Web);
        JsonSetup.Configure(options);
        var request = new BatchRequest("BCL-1", "EPA 200.8", "2026-04-08T14:30:00-05:00", true, "a fix",
            [
                new ResultRow("7KQ4-M2XD-H", "first-draw", null, null, "lead", 12.4, "µg/L", "<", 0.3, 1.0, null, [12.1, 12.6], "2026-04-07T09:00:00+00:00"),
                new ResultRow("7KQ4-M2XD-H", "sequential", 2, null, "Pb", 1e-7, "ug/L", null, 0, 1e300, 0.5, null, null) { Where = "row 3", Unreadable = ["mdl"] },
            ],
            [new QcRow("calibration-check", "lead", 10.0, 10.2, null, null, null, "ug/L"), new QcRow(null, null, null, null, null, null, null, null)]);
        var whole = Convert.ToHexStringLower(SHA256.HashData(JsonSerializer.SerializeToUtf8Bytes(
            request with { Correction = null, CorrectionReason = null }, options)));

        using var hash = new BatchHash(request, options);
        hash.AddResults(request.Results!.Take(1));
        hash.AddResults(request.Results!.Skip(1));

        Assert.Equal(whole, hash.Finish(request.Qc!, request.Run));
        Assert.Equal(whole, BatchHash.Of(request, options));
        Assert.NotEqual(whole, BatchHash.Of(request with { Results = request.Results!.Take(1).ToList() }, options));
    }
}
