using PartForge.Geometry.Primitives;

namespace PartForge.Export.Drawings;

/// <summary>
/// A leader to one feature of a repeated pattern with a note such as "12 x D12.3 pockets". The count and
/// the size are both written as machine-readable attributes (data-dim = CountId / SizeId).
/// </summary>
public sealed record PatternNote(string CountId, int Count, string SizeId, double Size, Vec2 Target, double AngleDeg, string Label)
{
    /// <summary>A second size of the feature (a block pocket's width), written as its own data-dim when set.</summary>
    public string? Size2Id { get; init; }
    public double Size2 { get; init; }
}
