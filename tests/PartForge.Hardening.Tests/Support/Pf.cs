using PartForge.Fuzz.Running;

namespace PartForge.Hardening.Tests.Support;

/// <summary>The partforge command line, in-process (fast) or as the real executable.</summary>
public static class Pf
{
    private static readonly InProcessCli InProcess = new();

    public static CliRun Run(params string[] args) => InProcess.Run(args, TimeSpan.FromSeconds(120));

    public static CliRun RunTimed(TimeSpan timeout, params string[] args) => InProcess.Run(args, timeout);

    public static CliRun Exe(params string[] args) => Repo.Executable.Run(args, TimeSpan.FromSeconds(180));

    public static string Describe(CliRun r) =>
        $"exit {r.ExitCode?.ToString() ?? "hang"} after {r.Elapsed.TotalMilliseconds:F0} ms\n--- stderr:\n{Cut(r.Stderr)}\n--- stdout:\n{Cut(r.Stdout)}";

    private static string Cut(string s) => s.Length > 3000 ? s[..3000] + "..." : s;
}
