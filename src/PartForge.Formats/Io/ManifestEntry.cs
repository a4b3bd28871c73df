namespace PartForge.Formats.Io;

/// <summary>One file of an output set: its name in the folder, its size in bytes and its SHA-256 (lowercase hex).</summary>
public readonly record struct ManifestEntry(string Name, long SizeBytes, string Sha256);
