using PartForge.Geometry.Profiles;

namespace PartForge.Export.Drawings;

/// <summary>
/// Everything a top-view drawing of one part shows: its exact outline (outers and holes), optional extra
/// outlines drawn as hidden or engraved lines (blind pockets, marks), and the annotations.
/// </summary>
public sealed record PartSketch
{
    public required string PartName { get; init; }
    public required string Title { get; init; }
    public required Profile Outline { get; init; }
    public IReadOnlyList<Contour> Blind { get; init; } = [];
    public IReadOnlyList<Contour> Marks { get; init; } = [];
    public IReadOnlyList<DiameterDimension> Diameters { get; init; } = [];
    public IReadOnlyList<PatternNote> Notes { get; init; } = [];
    public IReadOnlyList<LinearDimension> Linear { get; init; } = [];
    public IReadOnlyList<PoleMark> Poles { get; init; } = [];
}
