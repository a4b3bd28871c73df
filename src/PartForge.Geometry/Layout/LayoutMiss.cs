namespace PartForge.Geometry.Layout;

/// <summary>A copy of a part that the layout could not place, and why.</summary>
public sealed record LayoutMiss(string PartId, int Copy, LayoutMissReason Reason);
