namespace PartForge.Fuzz.Running;

/// <summary>The outcome of one command: exit code (null when it did not finish in time), streams and time.</summary>
public sealed record CliRun(int? ExitCode, string Stdout, string Stderr, TimeSpan Elapsed)
{
    public bool TimedOut => ExitCode == null;
}
