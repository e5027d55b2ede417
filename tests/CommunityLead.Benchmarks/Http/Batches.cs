using System.Text;

namespace CommunityLead.Benchmarks.Http;

/// <summary>A lab's CSV batch for received kits: first draw and flushed lead per kit, a calibration check per 10 samples.</summary>
internal static class Batches
{
    public const string Header = "sampleType,kitCode,bottle,analyte,value,unit,mdl,reportingLimit,expected,measured\n";

    public static byte[] Csv(IReadOnlyList<string> codes, int seed = 42)
    {
        var text = new StringBuilder(Header);
        var random = new Random(seed);
        foreach (var code in codes)
        {
            text.Append($"sample,{code},first-draw,lead,{random.Next(10, 300) / 10.0:0.0},ug/L,0.3,1.0,,\n");
            text.Append($"sample,{code},flushed,lead,{random.Next(10, 100) / 10.0:0.0},ug/L,0.3,1.0,,\n");
        }
        for (var i = 0; i < codes.Count * 2 / 10; i++) text.Append("calibration-check,,,lead,,ug/L,,,10,10.1\n");
        text.Append("calibration-blank,,,lead,,ug/L,,,0,0.02\n");
        return Encoding.UTF8.GetBytes(text.ToString());
    }

    public static async Task<HttpResponseMessage> PostAsync(HttpClient lab, string batchId, byte[] csv)
    {
        using var content = new ByteArrayContent(csv);
        content.Headers.ContentType = new("text/csv");
        return await lab.PostAsync($"/api/lab/batches?batchId={batchId}&method=EPA%20200.8&analyzedAt=2026-04-05T10:00:00%2B00:00", content);
    }
}
