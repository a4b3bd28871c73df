using PartForge.Geometry.Primitives;

namespace PartForge.Export.Drawings;

/// <summary>
/// A diameter dimension: a line through the centre at <paramref name="AngleDeg"/> with arrows on the circle,
/// and a label outside it. When <paramref name="DrawCircle"/> is set the circle itself is drawn as a chain
/// line (pitch and bolt circles, which are not edges of the part). <paramref name="Id"/> and the diameter
/// appear as data-dim / data-value attributes.
/// </summary>
public sealed record DiameterDimension(string Id, Vec2 Centre, double Diameter, double AngleDeg, string Label, bool DrawCircle = false);
