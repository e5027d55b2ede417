using System.Text.Json;
using CommunityLead.Api.Features.Wording;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Commands;

/// <summary>
/// messages export [--format csv|json] [--out FILE]: the whole wording catalogue for a medical advisor to review,
/// the same as GET /api/admin/messages. Needs no database. Without --out it goes to standard output. The
/// arguments are checked by <see cref="CommandTree"/>.
/// </summary>
internal sealed class MessagesCommand(WordingFormat format, string? outFile) : ICommand
{
    public async Task<int> RunAsync(IServiceProvider services, TextWriter output, TextWriter error)
    {
        var export = WordingCatalogue.Export();
        var text = format == WordingFormat.Csv ? WordingCsv.Write(export) : Json(services, export);
        if (outFile is null)
        {
            await output.WriteAsync(text);
            return 0;
        }
        var target = Path.GetFullPath(outFile);
        try
        {
            await File.WriteAllTextAsync(target, text);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            error.WriteLine($"Could not write {target}: {e.Message}");
            return CommandLine.Failed;
        }
        output.WriteLine($"{export.Count} entries, catalogue version {export.Version}, written to {target}.");
        return 0;
    }

    /// <summary>The API's own JSON conventions (camelCase, kebab-case enums), indented for reading.</summary>
    private static string Json(IServiceProvider services, WordingExport export) =>
        JsonSerializer.Serialize(export, new JsonSerializerOptions(services.GetRequiredService<IOptions<JsonOptions>>().Value.SerializerOptions)
        {
            WriteIndented = true,
        }) + "\n";
}
