namespace PartForge.Electrical;

/// <summary>How serious a <see cref="Diagnostic"/> is.</summary>
public enum DiagnosticSeverity
{
    /// <summary>Doubtful but computable; the results stand.</summary>
    Warning,

    /// <summary>Impossible or not computable; dependent results are reported as 0.</summary>
    Error,
}
