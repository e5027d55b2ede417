using System.CommandLine;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Features.Wording;

namespace CommunityLead.Api.Commands;

/// <summary>The commands, their arguments and help texts, and the class that does each one's work.</summary>
internal sealed class CommandTree
{
    private readonly Dictionary<Command, Func<ParseResult, ICommand>> work = [];
    private readonly HashSet<Command> service = [];
    private readonly HashSet<Command> noHostSettings = [];
    private readonly Command help;

    private CommandTree()
    {
        Root = new RootCommand("CommunityLead: the service of a community lead-testing program, and its commands. " +
                               "With no command the service runs, as with 'serve'.");
        Service(Root);
        Service(Add(Root, new Command("serve", "Run the service (the default). Listens where --urls says (--urls http://127.0.0.1:5020).")));
        Do(Add(Root, new Command("migrate", "Create or upgrade the database, then exit.")), _ => new MigrateCommand());

        var keys = Add(Root, new Command("keys", "Make, list and revoke API keys."));
        var role = new Option<string>("--role") { Description = $"The key's role: {string.Join(", ", Roles.All)}.", Required = true };
        role.AcceptOnlyFromAmong(Roles.All);
        var label = new Option<string>("--label") { Description = "A name for the key, unique, never reused (1 to 64 characters).", Required = true };
        Do(Add(keys, new Command("create", "Make an API key; it is printed once, as the last line.") { role, label }),
            r => new KeysCreateCommand(r.GetRequiredValue(role), r.GetRequiredValue(label)));
        Do(Add(keys, new Command("list", "List the keys (never their secrets).")), _ => new KeysListCommand());
        var revokeLabel = new Argument<string>("label") { Description = "The label of the key to revoke." };
        Do(Add(keys, new Command("revoke", "Revoke the key with this label.") { revokeLabel }),
            r => new KeysRevokeCommand(r.GetRequiredValue(revokeLabel)));

        Do(Add(Root, new Command("demo", "Load the invented demo scenario from seed-data/ (safe to repeat).")), _ => new DemoCommand());
        var file = new Argument<string>("FILE") { Description = "A new file in an existing folder; an existing file is never overwritten." };
        Do(Add(Root, new Command("backup", "Write a consistent copy of the SQLite database to FILE while the service runs.") { file }),
            r => new BackupCommand(r.GetRequiredValue(file)));

        var messages = Add(Root, new Command("messages", "The wording a household can get, for a medical advisor to review."));
        var format = new Option<string>("--format") { Description = "csv or json.", DefaultValueFactory = _ => "json" };
        format.AcceptOnlyFromAmong("csv", "json");
        var outFile = new Option<string>("--out") { Description = "Write to FILE (a full path) instead of standard output." };
        var export = Add(messages, new Command("export", "Every sentence and letter phrase, with when it is used, its source and reading scores.") { format, outFile });
        Do(export, r => new MessagesCommand(r.GetValue(format) == "csv" ? WordingFormat.Csv : WordingFormat.Json, r.GetValue(outFile)));
        // It reads no setting and no database, so a stray word is a mistake (--to for --out), not a host setting.
        noHostSettings.Add(export);
        help = Add(Root, new Command("help", "Show this help."));
    }

    public RootCommand Root { get; }

    public static CommandTree Build() => new();

    public bool IsService(Command command) => service.Contains(command);

    public bool IsHelp(Command command) => command == help;

    public bool TakesNoHostSettings(Command command) => noHostSettings.Contains(command);

    public ICommand Work(ParseResult result) => work[result.CommandResult.Command](result);

    private static Command Add(Command parent, Command child)
    {
        parent.Add(child);
        return child;
    }

    private void Do(Command command, Func<ParseResult, ICommand> create)
    {
        // Host settings may follow any command (--ConnectionStrings:CommunityLead=...); HostSwitches checks them.
        command.TreatUnmatchedTokensAsErrors = false;
        work[command] = create;
    }

    private void Service(Command command)
    {
        command.TreatUnmatchedTokensAsErrors = false;
        // The parser needs an action on a command that has subcommands; Program starts the service itself.
        command.SetAction(_ => 0);
        service.Add(command);
    }
}
