using System.Diagnostics;

namespace PartForge.Cli.Tests.EndToEnd;

/// <summary>What one run of the real executable did.</summary>
public sealed record RunResult(int ExitCode, string Stdout, string Stderr)
{
    public string[] StderrLines => Stderr.Split('\n', StringSplitOptions.RemoveEmptyEntries);
    public override string ToString() => $"exit {ExitCode}\n--- stdout\n{Stdout}\n--- stderr\n{Stderr}";
}

/// <summary>
/// Runs the built <c>partforge</c> (the Cli project is a reference of this test project, so it is built
/// once per test run, next to the test assembly) as a child process, in a working folder, with stdout and
/// stderr redirected (so the tool sees no terminal) and a timeout. With <c>PARTFORGE_EXE</c> set to an
/// executable (the native one from scripts/publish.sh, see scripts/test-native.sh) that one is run instead.
/// </summary>
public static class PartforgeProcess
{
    public static string DllPath { get; } = Path.Combine(AppContext.BaseDirectory, "partforge.dll");

    /// <summary>The executable named by PARTFORGE_EXE, or null for the framework-dependent build.</summary>
    public static string? ExePath { get; } =
        Environment.GetEnvironmentVariable("PARTFORGE_EXE") is { Length: > 0 } exe ? Path.GetFullPath(exe) : null;

    public static RunResult Run(string workDir, params string[] args) => Run(workDir, TimeSpan.FromSeconds(120), args);

    public static RunResult Run(string workDir, TimeSpan timeout, params string[] args)
    {
        if (ExePath != null) Assert.True(File.Exists(ExePath), $"PARTFORGE_EXE names {ExePath}, which does not exist");
        else Assert.True(File.Exists(DllPath), $"the partforge executable is not built at {DllPath}");
        var psi = new ProcessStartInfo(ExePath ?? "dotnet")
        {
            WorkingDirectory = workDir,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
        };
        if (ExePath == null) psi.ArgumentList.Add(DllPath);
        foreach (var a in args) psi.ArgumentList.Add(a);
        psi.Environment["NO_COLOR"] = "1";
        psi.Environment["DOTNET_NOLOGO"] = "1";
        using var p = Process.Start(psi)!;
        p.StandardInput.Close();
        var stdout = p.StandardOutput.ReadToEndAsync();
        var stderr = p.StandardError.ReadToEndAsync();
        if (!p.WaitForExit(timeout))
        {
            p.Kill(entireProcessTree: true);
            Assert.Fail($"partforge {string.Join(' ', args)} did not finish in {timeout.TotalSeconds} s");
        }
        p.WaitForExit();
        return new RunResult(p.ExitCode, stdout.Result.Replace("\r\n", "\n"), stderr.Result.Replace("\r\n", "\n"));
    }
}
