using PartForge.Design.Parts;

namespace PartForge.Parts;

/// <summary>How serious a part-building diagnostic is.</summary>
public enum DiagnosticSeverity
{
    /// <summary>Something the builder chose for the user (a feature left out for lack of room, a fallback).</summary>
    Note,
    /// <summary>The design asks for something the parts cannot be (e.g. `cut` for a part that is not a flat sheet).</summary>
    Error,
}

/// <summary>One message from the part builders, naming the part and the design key to change.</summary>
/// <param name="Severity">Note or error.</param>
/// <param name="Part">The part.</param>
/// <param name="Code">Short stable identifier, e.g. "cut-not-prismatic".</param>
/// <param name="Message">One line for the user.</param>
public sealed record PartDiagnostic(DiagnosticSeverity Severity, PartId Part, string Code, string Message);
