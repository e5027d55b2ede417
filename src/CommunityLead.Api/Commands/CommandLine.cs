using System.CommandLine;

namespace CommunityLead.Api.Commands;

/// <summary>
/// The executable's commands (serve, migrate, keys, demo, backup). Each runs on the configured database and
/// exits; with no command, or <c>serve</c>, the service starts. Errors go to standard error with a non-zero exit code.
/// </summary>
public interface ICommand
{
    Task<int> RunAsync(IServiceProvider services, TextWriter output, TextWriter error);
}

public static class CommandLine
{
    /// <summary>The command could not do its work (a missing folder, an unreadable database).</summary>
    public const int Failed = 1;

    /// <summary>The arguments were wrong: an unknown command, a missing argument, a role that does not exist.</summary>
    public const int UsageError = 2;

    /// <summary>Response files and bundled short options are off: an argument means what it says.</summary>
    private static readonly ParserConfiguration Parser = new() { ResponseFileTokenReplacer = null, EnablePosixBundling = false };

    public static ParsedCommandLine Parse(IReadOnlyList<string> args)
    {
        var tree = CommandTree.Build();
        return new ParsedCommandLine(tree, tree.Root.Parse(args, Parser));
    }

    /// <summary>Parses and runs a command on services that already exist (the tests' way in).</summary>
    public static Task<int> RunAsync(IReadOnlyList<string> args, IServiceProvider services, TextWriter output, TextWriter error) =>
        Parse(args).RunAsync(services, output, error);

    /// <summary>Logs go to standard error so the last line of standard output stays the command's answer.</summary>
    public static void QuietLogging(ILoggingBuilder logging)
    {
        logging.ClearProviders();
        logging.AddConsole(o => o.LogToStandardErrorThreshold = LogLevel.Trace);
        logging.SetMinimumLevel(LogLevel.Warning);
    }

    internal static void WriteHelp(RootCommand root, IEnumerable<string> commandPath, TextWriter to) =>
        root.Parse([.. commandPath, "--help"], Parser).Invoke(new InvocationConfiguration { Output = to, Error = to });
}

/// <summary>What the arguments ask for: the service, help, a command, or something this program does not know.</summary>
public sealed class ParsedCommandLine
{
    private readonly CommandTree tree;
    private readonly ParseResult result;

    internal ParsedCommandLine(CommandTree tree, ParseResult result)
    {
        this.tree = tree;
        this.result = result;
        Problems = [.. result.Errors.Select(e => e.Message),
            .. tree.TakesNoHostSettings(result.CommandResult.Command)
                ? result.UnmatchedTokens.Select(t => $"Unrecognized command or argument '{t}'.")
                : HostSwitches.Problems(result.UnmatchedTokens)];
    }

    /// <summary>Why the arguments were refused; empty when they were understood.</summary>
    public IReadOnlyList<string> Problems { get; }

    /// <summary>Help or the version: the 'help' command, or an option that answers by itself (--help, --version).</summary>
    public bool IsHelp => Problems.Count == 0 && (tree.IsHelp(result.CommandResult.Command) || AnsweredByAnOption);

    private bool AnsweredByAnOption => result.Action is { } action && action != result.CommandResult.Command.Action;

    public bool RunsService => Problems.Count == 0 && !IsHelp && tree.IsService(result.CommandResult.Command);

    /// <summary>A command that works on the database: it needs the program's services (settings, storage).</summary>
    public bool NeedsServices => Problems.Count == 0 && !IsHelp && !RunsService;

    /// <summary>
    /// Help and refused arguments need no services (pass null): no setting is read and no database is touched.
    /// </summary>
    public async Task<int> RunAsync(IServiceProvider? services, TextWriter output, TextWriter error)
    {
        if (Problems.Count > 0)
        {
            foreach (var problem in Problems) error.WriteLine(problem);
            error.WriteLine();
            CommandLine.WriteHelp(tree.Root, Path(), error);
            return CommandLine.UsageError;
        }
        if (IsHelp)
        {
            if (AnsweredByAnOption) return await result.InvokeAsync(new InvocationConfiguration { Output = output, Error = error });
            CommandLine.WriteHelp(tree.Root, [], output);
            return 0;
        }
        if (RunsService) throw new InvalidOperationException("The service is started by Program, not as a command.");
        ArgumentNullException.ThrowIfNull(services);
        return await tree.Work(result).RunAsync(services, output, error);
    }

    /// <summary>The names from the root down to the command that was reached ("keys create"), for its own help.</summary>
    private List<string> Path()
    {
        var names = new List<string>();
        for (var command = result.CommandResult; command.Parent is System.CommandLine.Parsing.CommandResult parent; command = parent)
            names.Insert(0, command.Command.Name);
        return names;
    }
}
