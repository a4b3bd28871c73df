using PartForge.Geometry.Meshes;

namespace PartForge.Formats.ThreeMf;

/// <summary>
/// One object of a 3MF package: a named closed mesh (millimetres, outward triangles) and where to place
/// it. Each placement becomes one build item referring to the same object (identical parts are stored
/// once); no placement means one build item at the mesh's own coordinates.
/// </summary>
public sealed record ThreeMfObject(string Name, Mesh Mesh, IReadOnlyList<ThreeMfTransform> Placements)
{
    /// <summary>An object built once where its mesh already is.</summary>
    public static ThreeMfObject At(string name, Mesh mesh) => new(name, mesh, Array.Empty<ThreeMfTransform>());

    /// <summary>An object built once, placed by a transform.</summary>
    public static ThreeMfObject At(string name, Mesh mesh, ThreeMfTransform placement) => new(name, mesh, new[] { placement });
}
