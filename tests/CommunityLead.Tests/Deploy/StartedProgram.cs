using System.Diagnostics;
using System.Text;

namespace CommunityLead.Tests.Deploy;

/// <summary>
/// A child process whose output is collected as it comes (so a chatty one never blocks on a full pipe),
/// killed with its children on Dispose, so a failing assertion never leaves a service running.
/// </summary>
internal sealed class StartedProgram : IDisposable
{
    private readonly StringBuilder output = new();
    private readonly StringBuilder error = new();

    public StartedProgram(ProcessStartInfo start)
    {
        start.RedirectStandardOutput = start.RedirectStandardError = true;
        start.UseShellExecute = false;
        Process = new Process { StartInfo = start };
        Process.OutputDataReceived += (_, e) => Append(output, e.Data);
        Process.ErrorDataReceived += (_, e) => Append(error, e.Data);
        Process.Start();
        Process.BeginOutputReadLine();
        Process.BeginErrorReadLine();
    }

    public Process Process { get; }
    public string Output { get { lock (output) return output.ToString(); } }
    public string Error { get { lock (error) return error.ToString(); } }

    public async Task<int> ExitCodeAsync(TimeSpan patience)
    {
        using var timeout = new CancellationTokenSource(patience);
        try
        {
            await Process.WaitForExitAsync(timeout.Token);
        }
        catch (OperationCanceledException)
        {
            throw new TimeoutException($"{Process.StartInfo.FileName} {string.Join(' ', Process.StartInfo.ArgumentList)} " +
                                       $"still running after {patience.TotalSeconds} s. Error output: {Error}");
        }
        return Process.ExitCode;
    }

    public void Dispose()
    {
        try
        {
            if (!Process.HasExited)
            {
                Process.Kill(entireProcessTree: true);
                Process.WaitForExit(10_000);
            }
        }
        catch (InvalidOperationException)
        {
            // It ended between the check and the kill.
        }
        Process.Dispose();
    }

    private static void Append(StringBuilder to, string? line)
    {
        if (line is null) return;
        lock (to) to.AppendLine(line);
    }
}
