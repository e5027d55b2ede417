namespace CommunityLead.Api.Commands;

internal sealed class DemoCommand : ICommand
{
    public async Task<int> RunAsync(IServiceProvider services, TextWriter output, TextWriter error)
    {
        await Infrastructure.StorageSetup.MigrateAsync(services);
        var loaded = await Demo.DemoLoader.LoadAsync(services, error);
        if (loaded is null) return 1;
        output.WriteLine($"Demo scenario loaded: {loaded.NewHouseholds} new households, {loaded.NewKits} new kits " +
                         $"({loaded.SkippedHouseholds} households were already there).");
        return 0;
    }
}
