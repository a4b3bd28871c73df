namespace PartForge.Formats.Png;

/// <summary>A rendered picture and the scale it was drawn at.</summary>
public sealed record RenderResult(RgbImage Image, double PixelsPerMm);
