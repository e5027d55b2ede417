using System.Diagnostics;
using System.Text;

namespace CommunityLead.Benchmarks.Http;

/// <summary>A program of its own process (as in production: not sharing the load client's CPU time or heap).</summary>
internal sealed class ChildProcess : IDisposable
{
    private readonly Process process;
    private readonly StringBuilder output = new();

    public ChildProcess(string dll, IEnumerable<string> arguments, IDictionary<string, string>? environment = null, string? folder = null)
    {
        var start = new ProcessStartInfo("dotnet")
        {
            RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false,
            WorkingDirectory = folder ?? Path.GetDirectoryName(dll)!,
        };
        start.ArgumentList.Add(dll);
        foreach (var argument in arguments) start.ArgumentList.Add(argument);
        foreach (var (name, value) in environment ?? new Dictionary<string, string>()) start.Environment[name] = value;
        process = new Process { StartInfo = start };
        process.OutputDataReceived += (_, e) => { lock (output) output.AppendLine(e.Data); };
        process.ErrorDataReceived += (_, e) => { lock (output) output.AppendLine(e.Data); };
        process.Start();
        process.BeginOutputReadLine();
        process.BeginErrorReadLine();
    }

    public int Id => process.Id;

    public string Output { get { lock (output) return output.ToString(); } }

    public bool HasExited => process.HasExited;

    /// <summary>Peak resident memory so far, read from /proc (VmHWM), in bytes; 0 where /proc is absent.</summary>
    public long PeakMemory()
    {
        var status = $"/proc/{process.Id}/status";
        if (!File.Exists(status)) return 0;
        var line = File.ReadLines(status).FirstOrDefault(l => l.StartsWith("VmHWM:", StringComparison.Ordinal));
        return line is null ? 0 : long.Parse(line.Split(' ', StringSplitOptions.RemoveEmptyEntries)[1]) * 1024;
    }

    /// <summary>Current resident memory (VmRSS), in bytes.</summary>
    public long Memory()
    {
        var status = $"/proc/{process.Id}/status";
        if (!File.Exists(status)) return 0;
        var line = File.ReadLines(status).FirstOrDefault(l => l.StartsWith("VmRSS:", StringComparison.Ordinal));
        return line is null ? 0 : long.Parse(line.Split(' ', StringSplitOptions.RemoveEmptyEntries)[1]) * 1024;
    }

    /// <summary>CPU time the process has used (user + system).</summary>
    public TimeSpan CpuTime()
    {
        process.Refresh();
        return process.HasExited ? TimeSpan.Zero : process.TotalProcessorTime;
    }

    public async Task<int> WaitAsync(TimeSpan patience)
    {
        using var timeout = new CancellationTokenSource(patience);
        await process.WaitForExitAsync(timeout.Token);
        return process.ExitCode;
    }

    public void Dispose()
    {
        try
        {
            if (!process.HasExited)
            {
                process.Kill(entireProcessTree: true);
                process.WaitForExit(10_000);
            }
        }
        catch (InvalidOperationException)
        {
            // Ended between the check and the kill.
        }
        process.Dispose();
    }
}
