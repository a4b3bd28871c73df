namespace PartForge.Geometry.Meshes;

/// <summary>
/// What <see cref="MeshValidator"/> found. Vertices are compared by exact position (as an STL reader sees
/// them), edges by the ordered pair of vertex positions.
/// </summary>
public sealed record MeshReport
{
    public int VertexCount { get; init; }
    public int EdgeCount { get; init; }
    public int TriangleCount { get; init; }
    /// <summary>Directed edges whose reverse is missing (holes in the surface or flipped triangles).</summary>
    public int BoundaryEdges { get; init; }
    /// <summary>Edges used by more than two triangles, or a directed edge used twice.</summary>
    public int NonManifoldEdges { get; init; }
    /// <summary>Triangles of zero area (twice-area below 1e-12 mm^2, far under one grid cell).</summary>
    public int DegenerateTriangles { get; init; }
    public int NonFiniteVertices { get; init; }
    /// <summary>V - E + F.</summary>
    public int EulerCharacteristic { get; init; }
    /// <summary>Connected pieces (by shared edges).</summary>
    public int ShellCount { get; init; }
    /// <summary>Shells whose signed volume is not positive (inward-facing) and that are not a cavity inside another shell.</summary>
    public int InwardShells { get; init; }
    /// <summary>Total genus of a closed mesh: (2 x shells - chi) / 2, i.e. the number of through holes.</summary>
    public int Genus { get; init; }
    public double SignedVolume { get; init; }

    public bool IsClosed => BoundaryEdges == 0 && NonManifoldEdges == 0;

    public bool IsValid => IsClosed && DegenerateTriangles == 0 && NonFiniteVertices == 0 && InwardShells == 0;

    public override string ToString() =>
        $"V {VertexCount} E {EdgeCount} F {TriangleCount}, boundary {BoundaryEdges}, non-manifold {NonManifoldEdges}, degenerate {DegenerateTriangles}, non-finite {NonFiniteVertices}, chi {EulerCharacteristic}, shells {ShellCount}, inward {InwardShells}, genus {Genus}";
}
