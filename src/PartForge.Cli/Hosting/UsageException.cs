namespace PartForge.Cli.Hosting;

/// <summary>A user mistake found inside a command action: printed as one line on stderr, exit 2.</summary>
public sealed class UsageException(string message) : Exception(message);
