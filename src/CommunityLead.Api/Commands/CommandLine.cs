namespace CommunityLead.Api.Commands;

/// <summary>
/// The executable's commands (migrate, keys, demo, backup, messages). Each runs on the configured database and
/// exits; with no command the service starts. Errors go to standard error with a non-zero exit code.
/// </summary>
public interface ICommand
{
    Task<int> RunAsync(IServiceProvider services, TextWriter output, TextWriter error);
}

public static class CommandLine
{
    public const int UsageError = 2;

    public static ICommand? Find(string[] args) => args.FirstOrDefault() switch
    {
        "migrate" => new MigrateCommand(),
        "keys" => new KeysCommand(args[1..]),
        "demo" => new DemoCommand(),
        "backup" => new BackupCommand(args[1..]),
        "messages" => new MessagesCommand(args[1..]),
        "help" or "--help" => new HelpCommand(),
        _ => null,
    };

    /// <summary>Logs go to standard error so the last line of standard output stays the command's answer.</summary>
    public static void QuietLogging(ILoggingBuilder logging)
    {
        logging.ClearProviders();
        logging.AddConsole(o => o.LogToStandardErrorThreshold = LogLevel.Trace);
        logging.SetMinimumLevel(LogLevel.Warning);
    }

    public const string Usage = """
        Usage: CommunityLead.Api [command]
          (no command)                          run the service (--urls http://127.0.0.1:5020)
          migrate                               create or upgrade the database, then exit
          keys create --role R --label L        make an API key (roles: coordinator, lab, health, admin); printed once
          keys list                             list keys (never their secrets)
          keys revoke L                         revoke the key labelled L
          demo                                  load the invented demo scenario from seed-data/ (safe to repeat)
          backup FILE                           write a consistent copy of the database to FILE
          messages export [--format csv|json] [--out FILE]
                                                every sentence a household can get, with notes and reading scores
        The database is ConnectionStrings:CommunityLead (environment ConnectionStrings__CommunityLead).
        """;
}

internal sealed class HelpCommand : ICommand
{
    public Task<int> RunAsync(IServiceProvider services, TextWriter output, TextWriter error)
    {
        output.WriteLine(CommandLine.Usage);
        return Task.FromResult(0);
    }
}
