using System.Buffers;
using System.Security.Cryptography;
using System.Text.Json;

namespace CommunityLead.Api.Features.LabResults;

/// <summary>
/// The SHA-256 of what the lab reported, fed a few rows at a time so that a streamed CSV batch is never held whole.
/// The bytes hashed are exactly those of serializing the request at once, without the correction note (so a repeated
/// correction is recognised too): hashes stored by earlier versions still match, and a repeat is still a repeat.
/// </summary>
internal sealed class BatchHash : IDisposable
{
    private readonly IncrementalHash sha = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
    private readonly ArrayBufferWriter<byte> buffer = new();
    private readonly Utf8JsonWriter writer;
    private readonly JsonSerializerOptions options;

    public BatchHash(BatchRequest header, JsonSerializerOptions options)
    {
        this.options = options;
        writer = new Utf8JsonWriter(buffer, new JsonWriterOptions { Encoder = options.Encoder, Indented = options.WriteIndented });
        writer.WriteStartObject();
        Property(nameof(BatchRequest.BatchId), header.BatchId);
        Property(nameof(BatchRequest.Method), header.Method);
        Property(nameof(BatchRequest.AnalyzedAt), header.AnalyzedAt);
        Property(nameof(BatchRequest.Correction), null);
        Property(nameof(BatchRequest.CorrectionReason), null);
        writer.WritePropertyName(Name(nameof(BatchRequest.Results)));
        writer.WriteStartArray();
    }

    public static string Of(BatchRequest request, JsonSerializerOptions options)
    {
        using var hash = new BatchHash(request, options);
        hash.AddResults(request.Results ?? []);
        return hash.Finish(request.Qc ?? [], request.Run);
    }

    public void AddResults(IEnumerable<ResultRow> rows)
    {
        foreach (var row in rows) JsonSerializer.Serialize(writer, row, options);
        Drain();
    }

    /// <summary>QC rows, then the optional run (written only when there is one, as serializing the request does); after this the hash is spent.</summary>
    public string Finish(IEnumerable<QcRow> qc, RunBlock? run)
    {
        writer.WriteEndArray();
        writer.WritePropertyName(Name(nameof(BatchRequest.Qc)));
        writer.WriteStartArray();
        foreach (var row in qc) JsonSerializer.Serialize(writer, row, options);
        writer.WriteEndArray();
        if (run is not null) Property(nameof(BatchRequest.Run), run);
        writer.WriteEndObject();
        Drain();
        return Convert.ToHexStringLower(sha.GetHashAndReset());
    }

    public void Dispose()
    {
        writer.Dispose();
        sha.Dispose();
    }

    private void Property(string property, object? value)
    {
        writer.WritePropertyName(Name(property));
        JsonSerializer.Serialize(writer, value, value?.GetType() ?? typeof(object), options);
    }

    private string Name(string property) => options.PropertyNamingPolicy?.ConvertName(property) ?? property;

    private void Drain()
    {
        writer.Flush();
        sha.AppendData(buffer.WrittenSpan);
        buffer.ResetWrittenCount();
    }
}
