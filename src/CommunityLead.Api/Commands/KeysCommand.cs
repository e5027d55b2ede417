using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Infrastructure;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Commands;

/// <summary>keys create --role R --label L: the key is printed once, as the last line of standard output.</summary>
internal sealed class KeysCreateCommand(string role, string label) : ICommand
{
    public Task<int> RunAsync(IServiceProvider services, TextWriter output, TextWriter error) =>
        KeyWork.RunAsync(services, error, async keys =>
        {
            var created = await keys.CreateAsync(role, label);
            output.WriteLine($"Key for '{created.Label}' ({created.Role}). It is shown only now; store it safely:");
            output.WriteLine(created.Key);
        });
}

/// <summary>keys list: labels, roles and dates, never a secret.</summary>
internal sealed class KeysListCommand : ICommand
{
    public async Task<int> RunAsync(IServiceProvider services, TextWriter output, TextWriter error)
    {
        await StorageSetup.MigrateAsync(services);
        await using var scope = services.CreateAsyncScope();
        var db = scope.ServiceProvider.GetRequiredService<CommunityLeadDb>();
        var rows = await db.ApiKeys.AsNoTracking().OrderBy(k => k.Id).ToListAsync();
        output.WriteLine($"{"label",-30} {"role",-12} {"created (UTC)",-20} revoked (UTC)");
        foreach (var k in rows)
            output.WriteLine($"{k.Label,-30} {k.Role,-12} {k.CreatedAtUtc:yyyy-MM-dd HH:mm}     {k.RevokedAtUtc?.ToString("yyyy-MM-dd HH:mm") ?? "-"}");
        return 0;
    }
}

/// <summary>keys revoke L</summary>
internal sealed class KeysRevokeCommand(string label) : ICommand
{
    public Task<int> RunAsync(IServiceProvider services, TextWriter output, TextWriter error) =>
        KeyWork.RunAsync(services, error, async keys =>
        {
            await keys.RevokeAsync(label);
            output.WriteLine($"Key '{label}' is revoked.");
        });
}

internal static class KeyWork
{
    /// <summary>A refusal of the key service (unknown role, label taken, no such key) is a usage error, said on standard error.</summary>
    public static async Task<int> RunAsync(IServiceProvider services, TextWriter error, Func<ApiKeyService, Task> work)
    {
        await StorageSetup.MigrateAsync(services);
        await using var scope = services.CreateAsyncScope();
        try
        {
            await work(scope.ServiceProvider.GetRequiredService<ApiKeyService>());
            return 0;
        }
        catch (KeyCommandException e)
        {
            error.WriteLine(e.Message);
            return CommandLine.UsageError;
        }
    }
}
