namespace CommunityLead.Api.Demo;

public sealed record DemoLoadResult(int NewHouseholds, int NewKits, int SkippedHouseholds);

public static class DemoLoader
{
    public static Task<DemoLoadResult?> LoadAsync(IServiceProvider services, TextWriter error) =>
        Task.FromResult<DemoLoadResult?>(null);
}
