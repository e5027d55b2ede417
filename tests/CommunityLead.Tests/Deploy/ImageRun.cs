using System.Diagnostics;
using System.Net;
using System.Net.Sockets;
using Microsoft.Data.Sqlite;

namespace CommunityLead.Tests.Deploy;

/// <summary>
/// The image's ENTRYPOINT run on this machine the way the container runs it: the program's folder as
/// WORKDIR, the Dockerfile's ENV as the settings, with the data volume replaced by a fresh temp folder and
/// the exposed port by a free one. Settings this process could pass on (a test environment name, another
/// connection string) are removed, so only what the image sets decides the outcome.
/// </summary>
internal sealed class ImageRun : IDisposable
{
    public static readonly TimeSpan Patience = TimeSpan.FromSeconds(60);
    private readonly string[] entrypoint;
    private readonly List<StartedProgram> started = [];

    public ImageRun(Dockerfile image, string volume, string exposedPort)
    {
        entrypoint = image.Entrypoint;
        DataFolder = Directory.CreateTempSubdirectory("cl-image-data").FullName;
        Port = FreePort();
        Environment = image.Env.ToDictionary(e => e.Key,
            e => e.Value.Replace(volume, DataFolder).Replace($":{exposedPort}", $":{Port}"));
    }

    public string DataFolder { get; }
    public int Port { get; }
    public IReadOnlyDictionary<string, string> Environment { get; }
    public Uri Url => new($"http://127.0.0.1:{Port}");

    /// <summary>WORKDIR /app: the folder the build put the program in, here the test output.</summary>
    public static string ProgramFolder => Path.GetDirectoryName(typeof(Program).Assembly.Location)!;

    /// <summary>What `docker run IMAGE args` runs: the entrypoint followed by the arguments.</summary>
    public StartedProgram Start(params string[] arguments) => Launch(entrypoint[0], [.. entrypoint[1..], .. arguments]);

    public async Task<(int Exit, string Output, string Error)> RunAsync(params string[] arguments)
    {
        var program = Start(arguments);
        var exit = await program.ExitCodeAsync(Patience);
        return (exit, program.Output, program.Error);
    }

    /// <summary>A HEALTHCHECK in shell form: Docker runs it with /bin/sh -c, in the container's environment.</summary>
    public Task<int> ShellAsync(string commandLine) => Launch("/bin/sh", ["-c", commandLine]).ExitCodeAsync(Patience);

    public async Task WaitUntilAnsweringAsync(StartedProgram service)
    {
        using var http = new HttpClient { Timeout = TimeSpan.FromSeconds(2) };
        var deadline = DateTime.UtcNow + Patience;
        while (DateTime.UtcNow < deadline)
        {
            if (service.Process.HasExited)
                throw new InvalidOperationException($"The service exited with {service.Process.ExitCode}: {service.Error}");
            try
            {
                using var response = await http.GetAsync(new Uri(Url, "/health"));
                if (response.StatusCode == HttpStatusCode.OK) return;
            }
            catch (Exception e) when (e is HttpRequestException or TaskCanceledException)
            {
                // Not listening yet.
            }
            await Task.Delay(200);
        }
        throw new TimeoutException($"No answer on {Url} within {Patience.TotalSeconds} s. Output: {service.Output}");
    }

    public void Dispose()
    {
        foreach (var program in started) program.Dispose();
        SqliteConnection.ClearAllPools();
        try { Directory.Delete(DataFolder, recursive: true); } catch (IOException) { }
    }

    private StartedProgram Launch(string fileName, IEnumerable<string> arguments)
    {
        var start = new ProcessStartInfo(fileName, arguments) { WorkingDirectory = ProgramFolder };
        foreach (var name in start.Environment.Keys.Where(CouldChangeTheOutcome).ToList()) start.Environment.Remove(name);
        foreach (var (name, value) in Environment) start.Environment[name] = value;
        var program = new StartedProgram(start);
        started.Add(program);
        return program;
    }

    /// <summary>Host settings (environment name, URLs) and every spelling of a connection string or database choice.</summary>
    private static bool CouldChangeTheOutcome(string name) =>
        name.StartsWith("ASPNETCORE_", StringComparison.OrdinalIgnoreCase)
        || name.Equals("DOTNET_ENVIRONMENT", StringComparison.OrdinalIgnoreCase)
        || name.Equals("DOTNET_URLS", StringComparison.OrdinalIgnoreCase)
        || name.StartsWith("ConnectionStrings__", StringComparison.OrdinalIgnoreCase)
        || name.Contains("CONNSTR_", StringComparison.OrdinalIgnoreCase)
        || name.StartsWith("Database__", StringComparison.OrdinalIgnoreCase);

    private static int FreePort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }
}
