using PartForge.Geometry.Primitives;

namespace PartForge.Export.Drawings;

/// <summary>Which pole of the magnet in a pocket faces the stator: drawn as a filled (north) or open (south) badge with N or S.</summary>
public sealed record PoleMark(Vec2 Centre, bool North, double SizeMm);
