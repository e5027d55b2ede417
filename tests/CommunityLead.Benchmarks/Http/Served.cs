using System.Diagnostics;
using System.Net;
using System.Net.Http.Headers;
using System.Net.Sockets;

namespace CommunityLead.Benchmarks.Http;

/// <summary>
/// A web program started on a free loopback port: the service's own Release build (its own database file), or the
/// empty baseline app. Start-up is timed from the process start to the first 200 on /health.
/// </summary>
internal sealed class Served : IDisposable
{
    private readonly ChildProcess process;

    private Served(ChildProcess process, Uri address, TimeSpan startUp)
    {
        this.process = process;
        Address = address;
        StartUp = startUp;
    }

    public Uri Address { get; }
    public TimeSpan StartUp { get; }
    public ChildProcess Process => process;

    /// <summary>The service, as its Release build runs in production, on <paramref name="database"/>.</summary>
    public static Task<Served> ServiceAsync(string database) =>
        StartAsync(RepoPaths.ServiceDll, [], new Dictionary<string, string>
        {
            ["ConnectionStrings__CommunityLead"] = $"Data Source={database}",
            ["Logging__LogLevel__Default"] = "Warning",
        });

    /// <summary>An ASP.NET Core app that does nothing: the floor for start-up and for latency at a given rate.</summary>
    public static Task<Served> EmptyAppAsync() =>
        StartAsync(typeof(Served).Assembly.Location, ["empty-app"], new Dictionary<string, string>());

    /// <summary>A command of the service's program (keys create, migrate), run to its end; its standard output.</summary>
    public static async Task<string> CommandAsync(string database, params string[] arguments)
    {
        using var run = new ChildProcess(RepoPaths.ServiceDll, arguments,
            new Dictionary<string, string> { ["ConnectionStrings__CommunityLead"] = $"Data Source={database}" });
        var code = await run.WaitAsync(TimeSpan.FromMinutes(5));
        if (code != 0) throw new InvalidOperationException($"{string.Join(' ', arguments)} exited {code}: {run.Output}");
        return run.Output;
    }

    /// <summary>A fresh key of <paramref name="role"/> on <paramref name="database"/>: `keys create` prints it last.</summary>
    public static async Task<string> KeyAsync(string database, string role) =>
        (await CommandAsync(database, "keys", "create", "--role", role, "--label", $"perf-{role}-{Guid.NewGuid():N}"))
        .Split('\n', StringSplitOptions.RemoveEmptyEntries)[^1].Trim();

    private static async Task<Served> StartAsync(string dll, string[] arguments, Dictionary<string, string> environment)
    {
        var port = FreePort();
        var address = new Uri($"http://127.0.0.1:{port}");
        var clock = Stopwatch.StartNew();
        var process = new ChildProcess(dll, [.. arguments, "--urls", address.ToString().TrimEnd('/')], environment);
        using var probe = new HttpClient { Timeout = TimeSpan.FromSeconds(2) };
        while (clock.Elapsed < TimeSpan.FromMinutes(2))
        {
            if (process.HasExited) throw new InvalidOperationException($"{Path.GetFileName(dll)} stopped: {process.Output}");
            try
            {
                if ((await probe.GetAsync(new Uri(address, "/health"))).StatusCode == HttpStatusCode.OK)
                    return new Served(process, address, clock.Elapsed);
            }
            catch (Exception e) when (e is HttpRequestException or TaskCanceledException)
            {
                // Not listening yet, or too busy starting to answer within the probe's patience.
            }
            await Task.Delay(10);
        }
        process.Dispose();
        throw new TimeoutException($"{Path.GetFileName(dll)} did not answer /health in 2 minutes.");
    }

    public HttpClient Client(string? key = null)
    {
        var client = new HttpClient(new SocketsHttpHandler { MaxConnectionsPerServer = 256, PooledConnectionLifetime = TimeSpan.FromMinutes(10) })
            { BaseAddress = Address, Timeout = TimeSpan.FromMinutes(10) };
        if (key is not null) client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", key);
        return client;
    }

    private static int FreePort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }

    public void Dispose() => process.Dispose();
}
