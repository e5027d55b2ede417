using System.Text.Json;
using CommunityLead.Api.Features.Wording;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Commands;

/// <summary>
/// messages export [--format csv|json] [--out FILE]: the whole wording catalogue for a medical advisor to review,
/// the same as GET /api/admin/messages. Needs no database. Without --out it goes to standard output.
/// </summary>
internal sealed class MessagesCommand(string[] args) : ICommand
{
    private const string Use = "Use: messages export [--format csv|json] [--out FILE]";

    public async Task<int> RunAsync(IServiceProvider services, TextWriter output, TextWriter error)
    {
        if (args.FirstOrDefault() != "export" || !OptionsAreKnown()) return Fail(error, Use);
        var format = WordingFormats.Parse(Option("--format"));
        if (format is null) return Fail(error, $"--format: {WordingFormats.Problem}");
        var outFile = Option("--out");
        if (args.Contains("--out") && string.IsNullOrWhiteSpace(outFile)) return Fail(error, "--out needs a file name.");

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
            return Fail(error, $"Could not write {target}: {e.Message}");
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

    /// <summary>Only --format and --out, each with a value.</summary>
    private bool OptionsAreKnown()
    {
        for (var i = 1; i < args.Length; i += 2)
            if (args[i] is not ("--format" or "--out") || i + 1 >= args.Length) return false;
        return true;
    }

    private string? Option(string name)
    {
        var i = Array.IndexOf(args, name);
        return i >= 0 && i + 1 < args.Length ? args[i + 1] : null;
    }

    private static int Fail(TextWriter error, string message)
    {
        error.WriteLine(message);
        return CommandLine.UsageError;
    }
}
