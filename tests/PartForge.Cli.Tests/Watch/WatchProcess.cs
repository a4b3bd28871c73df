using System.Collections.Concurrent;
using System.Diagnostics;
using PartForge.Cli.Tests.EndToEnd;

namespace PartForge.Cli.Tests.Watch;

/// <summary>A running <c>partforge watch</c> (the built executable, or PARTFORGE_EXE), its log lines and its address.</summary>
public sealed class WatchProcess : IDisposable
{
    private readonly Process _p;
    public BlockingCollection<string> Lines { get; } = new();
    public string Url { get; }

    public WatchProcess(string workDir, params string[] args)
    {
        var psi = new ProcessStartInfo(PartforgeProcess.ExePath ?? "dotnet")
        {
            WorkingDirectory = workDir, RedirectStandardOutput = true, RedirectStandardError = true, RedirectStandardInput = true, UseShellExecute = false,
        };
        if (PartforgeProcess.ExePath == null) psi.ArgumentList.Add(PartforgeProcess.DllPath);
        psi.ArgumentList.Add("watch");
        foreach (var a in args) psi.ArgumentList.Add(a);
        psi.Environment["NO_COLOR"] = "1";
        _p = Process.Start(psi)!;
        _p.OutputDataReceived += (_, e) => { if (e.Data is not null) Lines.Add(e.Data); };
        _p.ErrorDataReceived += (_, e) => { if (e.Data is not null) Lines.Add("stderr: " + e.Data); };
        _p.BeginOutputReadLine();
        _p.BeginErrorReadLine();
        string first = Next(TimeSpan.FromSeconds(60), "watching");
        int at = first.IndexOf("http://", StringComparison.Ordinal);
        Url = first[at..first.IndexOf(' ', at)].TrimEnd('/');
    }

    /// <summary>The next log line containing <paramref name="text"/>.</summary>
    public string Next(TimeSpan timeout, string text)
    {
        var until = DateTime.UtcNow + timeout;
        while (true)
        {
            var left = until - DateTime.UtcNow;
            if (left <= TimeSpan.Zero || !Lines.TryTake(out var line, left)) { Assert.Fail($"watch printed no line with '{text}' in {timeout.TotalSeconds} s"); return ""; }
            Assert.DoesNotContain("stderr:", line);
            if (line.Contains(text, StringComparison.Ordinal)) return line;
        }
    }

    public void Dispose()
    {
        try { if (!_p.HasExited) _p.Kill(entireProcessTree: true); _p.WaitForExit(10_000); } catch (InvalidOperationException) { }
        _p.Dispose();
    }
}
