using PartForge.Geometry.Primitives;

namespace PartForge.Formats.Cutting;

/// <summary>
/// The sheet a nest of parts is cut from: its size (the sheet's lower-left corner at the origin) and a label per
/// placed part. Written on the notes layer of a DXF (never cut) and as the page of an SVG; the labels go to the
/// DXF only (an SVG's text would be engraved by some cutter software).
/// </summary>
/// <param name="WidthMm">Along x.</param>
/// <param name="HeightMm">Along y.</param>
/// <param name="Labels">Text and where it goes (mm, on the sheet).</param>
public sealed record SheetFrame(double WidthMm, double HeightMm, IReadOnlyList<(string Text, Vec2 At)> Labels);
