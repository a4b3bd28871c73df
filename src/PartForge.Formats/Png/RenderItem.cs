using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;

namespace PartForge.Formats.Png;

/// <summary>
/// One triangle mesh to draw, with a flat colour. <paramref name="Triangles"/> holds three vertex indices a
/// triangle. The rasteriser lights both sides, so the winding order only matters for the mesh's own validity,
/// unless <see cref="ClosedOutward"/> says the mesh is closed with outward triangles: then the triangles that
/// face away from the eye are skipped (they are always behind a front face), which halves the work.
/// </summary>
public sealed record RenderItem(IReadOnlyList<Vec3> Positions, IReadOnlyList<int> Triangles, Rgb Colour)
{
    /// <summary>The mesh is closed and its triangles wind counter-clockwise seen from outside.</summary>
    public bool ClosedOutward { get; init; }

    /// <summary>A kernel mesh in one colour.</summary>
    public static RenderItem FromMesh(Mesh mesh, Rgb colour) => new(mesh.Vertices, mesh.Indices, colour);

    /// <summary>This item moved by an offset (the assembly places parts along the axis this way).</summary>
    public RenderItem Translated(Vec3 offset) =>
        this with { Positions = Positions.Select(p => p + offset).ToArray() };
}
