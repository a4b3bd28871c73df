using PartForge.Geometry.Primitives;

namespace PartForge.Export.Drawings;

/// <summary>
/// A straight dimension between two points, drawn parallel to them at <paramref name="OffsetMm"/> (positive
/// to the left of From -> To) with extension lines, arrows and the label. <paramref name="Value"/> is what
/// data-value carries (normally the distance itself, but a checker's value where that is the point).
/// </summary>
public sealed record LinearDimension(string Id, Vec2 From, Vec2 To, double OffsetMm, double Value, string Label, string Style = "dim");
