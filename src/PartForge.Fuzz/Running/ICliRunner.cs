namespace PartForge.Fuzz.Running;

/// <summary>Runs one <c>partforge</c> command line, in-process or as a child process.</summary>
public interface ICliRunner
{
    /// <summary>Short name for summaries ("in-process", "executable").</summary>
    string Kind { get; }

    CliRun Run(IReadOnlyList<string> args, TimeSpan timeout);
}
