namespace PartForge.Export.Pipeline;

/// <summary>How a pipeline run ended; the command line maps it to the exit code of the contract.</summary>
public enum PipelineStatus
{
    /// <summary>Passed, or warnings only (exit 0).</summary>
    Ok,

    /// <summary>A check failed (exit 1); without --force nothing was written.</summary>
    ChecksFailed,

    /// <summary>Bad input: design errors, bad options, an output that cannot be written safely (exit 2).</summary>
    BadInput,
}
