namespace PartForge.Fuzz.Mutations;

/// <summary>A starting design: a preset's name and its YAML text (LF line ends).</summary>
public sealed record SeedText(string Name, string Text);
