namespace PartForge.Export.Pipeline;

/// <summary>An output cannot be written safely (a link or folder at its name): a user-level problem, exit 2.</summary>
public sealed class OutputRefusedException(string message) : Exception(message);
