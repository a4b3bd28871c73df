namespace PartForge.Design.Presets;

/// <summary>A bundled design: its name (also the file name), a one-line description and the YAML text.</summary>
public sealed record Preset(string Name, string Description, string Text);
