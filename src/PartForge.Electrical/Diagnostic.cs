namespace PartForge.Electrical;

/// <summary>
/// A problem the electrical engine found in a loadable design: something impossible (an error, which the
/// checker turns into a failing check) or doubtful (a warning). The message names the design key and the fix.
/// </summary>
/// <param name="Id">Stable short identifier, e.g. "winding-coils-not-multiple-of-3".</param>
/// <param name="Severity">Error or warning.</param>
/// <param name="Key">The design key concerned, dotted snake_case (e.g. "machine.coils").</param>
/// <param name="Message">What is wrong and what to change.</param>
/// <param name="Measure">The quantity found against its limit, when the problem has one (null: a fact with no number).</param>
public sealed record Diagnostic(string Id, DiagnosticSeverity Severity, string Key, string Message, DiagnosticMeasure? Measure = null);

/// <summary>A diagnostic's quantity: the value found, the limit it crosses, the unit, and the signed margin (positive on the good side).</summary>
public sealed record DiagnosticMeasure(double Value, double Limit, string Unit, double Margin);
