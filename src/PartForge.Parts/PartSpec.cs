using PartForge.Design.Machines;
using PartForge.Design.Materials;
using PartForge.Design.Parts;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Solids;

namespace PartForge.Parts;

/// <summary>
/// A part described in exact primitives only (no polygons yet): what the individual builders produce and
/// <see cref="PartsBuilder"/> turns into a <see cref="PartModel"/> with its solid and mesh.
/// </summary>
internal sealed record PartSpec
{
    public required PartId Id { get; init; }
    public required PartProcess Process { get; init; }
    public required Material Material { get; init; }
    public required double HeightMm { get; init; }
    public required IReadOnlyList<ExactLayer> Layers { get; init; }
    public required IReadOnlyList<PartFeature> Features { get; init; }
    public required IReadOnlyList<PartInstance> Instances { get; init; }
    public Profile? CutProfile { get; init; }
    public IReadOnlyList<Contour> Marks { get; init; } = Array.Empty<Contour>();
    public IReadOnlyList<string> Notes { get; init; } = Array.Empty<string>();

    /// <summary>The pieces it is printed in (name, layers in the piece's frame, height), or none when printed whole.</summary>
    public IReadOnlyList<(string Name, IReadOnlyList<ExactLayer> Layers, double HeightMm)> Pieces { get; init; } = Array.Empty<(string, IReadOnlyList<ExactLayer>, double)>();
}
