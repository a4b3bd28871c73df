namespace PartForge.Fuzz.Mutations;

/// <summary>Where one scalar value sits in a line of YAML: line index, start column and length, and its key.</summary>
public readonly record struct ScalarSpan(int Line, int Start, int Length, string Key, bool IsNumber);
