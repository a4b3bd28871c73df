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

    private readonly Mesh? _mesh = Mesh;
    private Func<Mesh>? _make;

    /// <summary>The object's mesh; for a <see cref="Deferred"/> object, made anew at each read.</summary>
    public Mesh Mesh
    {
        get => _mesh ?? _make?.Invoke()!;
        init => _mesh = value;
    }

    /// <summary>
    /// An object whose mesh is made when the writer comes to it and let go once it is written: a package of
    /// many placed copies then never holds them all at once.
    /// </summary>
    public static ThreeMfObject Deferred(string name, Func<Mesh> make)
    {
        ArgumentNullException.ThrowIfNull(make);
        return new(name, null!, Array.Empty<ThreeMfTransform>()) { _make = make };
    }

    /// <summary>Whether the mesh is made at each read (<see cref="Deferred"/>).</summary>
    public bool IsDeferred => _mesh is null && _make is not null;

    internal bool HasMesh => _mesh is not null || _make is not null;
}
