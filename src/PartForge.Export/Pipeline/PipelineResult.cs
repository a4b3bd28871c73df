using PartForge.Export.Results;

namespace PartForge.Export.Pipeline;

/// <summary>
/// The outcome of <c>check</c> or <c>build</c>: the status, one line per problem (design errors, failed
/// checks, refused outputs), the evaluation and results document when the design loaded, and the files
/// written (relative to the output folder, in writing order; the manifest last).
/// </summary>
public sealed record PipelineResult
{
    public required PipelineStatus Status { get; init; }
    public IReadOnlyList<string> Problems { get; init; } = [];
    public Evaluation? Evaluation { get; init; }
    public ResultsDocument? Results { get; init; }
    public IReadOnlyList<string> Written { get; init; } = [];

    /// <summary>Leftover temporaries of earlier, interrupted builds that this build removed from the folder.</summary>
    public IReadOnlyList<string> RemovedTemporaries { get; init; } = [];

    /// <summary>The output folder's full path (build only).</summary>
    public string? OutputFolder { get; init; }

    /// <summary>Wall time per stage, ms, in stage order (load, budget, electrical, parts, checks, mesh, previews, write); stages
    /// that did not run are absent. For benchmarks and <c>build --timings</c>; never part of any output file.</summary>
    public IReadOnlyList<(string Stage, double Ms)> Timings { get; init; } = [];
}
