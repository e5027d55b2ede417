using CommunityLead.Api.Infrastructure;

namespace CommunityLead.Api.Commands;

internal sealed class MigrateCommand : ICommand
{
    public async Task<int> RunAsync(IServiceProvider services, TextWriter output, TextWriter error)
    {
        await StorageSetup.MigrateAsync(services);
        output.WriteLine("Database is up to date.");
        return 0;
    }
}
