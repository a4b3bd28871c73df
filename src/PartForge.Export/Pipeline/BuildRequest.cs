using PartForge.Formats.Io;

namespace PartForge.Export.Pipeline;

/// <summary>What <c>partforge build</c> was asked to do.</summary>
public sealed record BuildRequest
{
    /// <summary>The design file.</summary>
    public required string DesignPath { get; init; }

    /// <summary>Output folder (created when something is written). Default <c>out</c>.</summary>
    public string OutputDir { get; init; } = "out";

    /// <summary>Comma-separated formats (<see cref="ExportFormats.All"/>); null = all that apply.</summary>
    public string? Formats { get; init; }

    /// <summary>Comma-separated part names; null = all parts of the design.</summary>
    public string? Parts { get; init; }

    /// <summary>Write even if a check fails, stamping the results and report as failed.</summary>
    public bool Force { get; init; }

    /// <summary>
    /// The command line's interrupt guard: the build's output transaction is begun through it, so SIGINT or
    /// SIGTERM rolls the set back (and the guard's line names the folder). Null: no signal handling.
    /// </summary>
    public InterruptGuard? Guard { get; init; }

    /// <summary>Called with each output name just before it is staged (tests: throw to stand for a failure mid-build).</summary>
    internal Action<string>? BeforeStage { get; init; }
}
