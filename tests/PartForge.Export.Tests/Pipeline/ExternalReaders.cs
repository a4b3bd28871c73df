using System.Diagnostics;
using System.Text.Json;

namespace PartForge.Export.Tests.Pipeline;

/// <summary>Runs the independent readers installed as Debian packages (python3-ezdxf, assimp-utils) on written files.</summary>
internal static class ExternalReaders
{
    public const string Python = "/usr/bin/python3";
    public const string Assimp = "/usr/bin/assimp";

    public static (int ExitCode, string Stdout, string Stderr) Run(string exe, params string[] args)
    {
        var psi = new ProcessStartInfo(exe) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in args) psi.ArgumentList.Add(a);
        using var p = Process.Start(psi) ?? throw new InvalidOperationException($"cannot start {exe}");
        var stderr = p.StandardError.ReadToEndAsync();
        string stdout = p.StandardOutput.ReadToEnd();
        if (!p.WaitForExit(300_000))
        {
            p.Kill(entireProcessTree: true);
            throw new TimeoutException($"{exe} did not finish");
        }
        return (p.ExitCode, stdout, stderr.Result);
    }

    /// <summary>Runs a python script (python3 -c) that prints one JSON document; returns it parsed.</summary>
    public static JsonElement PythonJson(string script, params string[] args)
    {
        var (code, stdout, stderr) = Run(Python, ["-c", script, .. args]);
        Assert.True(code == 0, $"python reader failed ({code}): {stderr}");
        using var doc = JsonDocument.Parse(stdout);
        return doc.RootElement.Clone();
    }
}
