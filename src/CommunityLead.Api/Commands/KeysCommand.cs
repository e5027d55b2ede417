using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Commands;

/// <summary>keys create --role R --label L | keys list | keys revoke L</summary>
internal sealed class KeysCommand(string[] args) : ICommand
{
    public async Task<int> RunAsync(IServiceProvider services, TextWriter output, TextWriter error)
    {
        await StorageSetup.MigrateAsync(services);
        await using var scope = services.CreateAsyncScope();
        var keys = scope.ServiceProvider.GetRequiredService<ApiKeyService>();
        try
        {
            switch (args.FirstOrDefault())
            {
                case "create":
                    var role = Option("--role");
                    var label = Option("--label");
                    if (role is null || label is null) return Fail(error, "keys create needs --role and --label.");
                    var created = await keys.CreateAsync(role, label);
                    output.WriteLine($"Key for '{created.Label}' ({created.Role}). It is shown only now; store it safely:");
                    output.WriteLine(created.Key);
                    return 0;
                case "list":
                    var db = scope.ServiceProvider.GetRequiredService<CommunityLeadDb>();
                    var rows = await db.ApiKeys.AsNoTracking().OrderBy(k => k.Id).ToListAsync();
                    output.WriteLine($"{"label",-30} {"role",-12} {"created (UTC)",-20} revoked (UTC)");
                    foreach (var k in rows)
                        output.WriteLine($"{k.Label,-30} {k.Role,-12} {k.CreatedAtUtc:yyyy-MM-dd HH:mm}     {k.RevokedAtUtc?.ToString("yyyy-MM-dd HH:mm") ?? "-"}");
                    return 0;
                case "revoke" when args.Length == 2:
                    await keys.RevokeAsync(args[1]);
                    output.WriteLine($"Key '{args[1]}' is revoked.");
                    return 0;
                default:
                    return Fail(error, "Use: keys create --role R --label L | keys list | keys revoke L");
            }
        }
        catch (KeyCommandException e)
        {
            return Fail(error, e.Message);
        }
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
