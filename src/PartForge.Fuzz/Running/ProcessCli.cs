using System.Diagnostics;

namespace PartForge.Fuzz.Running;

/// <summary>
/// Runs the real <c>partforge</c> executable as a child process (the apphost if present, else
/// <c>dotnet partforge.dll</c>), killing it when it overruns the timeout.
/// </summary>
public sealed class ProcessCli : ICliRunner
{
    private readonly string _file;
    private readonly string[] _prefix;

    public ProcessCli(string file, params string[] prefixArgs)
    {
        _file = file;
        _prefix = prefixArgs;
    }

    public string Kind => "executable";

    /// <summary>The partforge executable next to the given assembly folder (where a project reference puts it).</summary>
    public static ProcessCli? Find(string folder)
    {
        string host = Path.Combine(folder, OperatingSystem.IsWindows() ? "partforge.exe" : "partforge");
        if (File.Exists(host)) return new ProcessCli(host);
        string dll = Path.Combine(folder, "partforge.dll");
        return File.Exists(dll) ? new ProcessCli("dotnet", dll) : null;
    }

    /// <summary>Starts the executable without waiting (for tests that kill it on purpose).</summary>
    public Process Start(IReadOnlyList<string> args, string? workingDirectory = null)
    {
        var psi = new ProcessStartInfo(_file)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
            WorkingDirectory = workingDirectory ?? Environment.CurrentDirectory,
        };
        foreach (var a in _prefix) psi.ArgumentList.Add(a);
        foreach (var a in args) psi.ArgumentList.Add(a);
        psi.Environment["NO_COLOR"] = "1";
        psi.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        return Process.Start(psi) ?? throw new InvalidOperationException("could not start " + _file);
    }

    public CliRun Run(IReadOnlyList<string> args, TimeSpan timeout)
    {
        var sw = Stopwatch.StartNew();
        using var p = Start(args);
        var so = p.StandardOutput.ReadToEndAsync();
        var se = p.StandardError.ReadToEndAsync();
        if (!p.WaitForExit(timeout))
        {
            try { p.Kill(entireProcessTree: true); } catch (InvalidOperationException) { }
            p.WaitForExit();
            return new CliRun(null, so.Result, se.Result, sw.Elapsed);
        }
        p.WaitForExit();
        return new CliRun(p.ExitCode, so.Result, se.Result, sw.Elapsed);
    }
}
