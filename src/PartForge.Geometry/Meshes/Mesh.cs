using System.Diagnostics.Contracts;
using PartForge.Geometry.Primitives;

namespace PartForge.Geometry.Meshes;

/// <summary>
/// An immutable indexed triangle mesh in millimetres: three indices per triangle, counter-clockwise seen
/// from outside. Vertices are shared (no duplicates) within a mesh built by <see cref="Mesher"/>.
/// </summary>
public sealed class Mesh
{
    private readonly Vec3[] _vertices;
    private readonly int[] _indices;

    public Mesh(IReadOnlyList<Vec3> vertices, IReadOnlyList<int> indices)
    {
        ArgumentNullException.ThrowIfNull(vertices);
        ArgumentNullException.ThrowIfNull(indices);
        if (indices.Count % 3 != 0) throw new ArgumentException("index count must be a multiple of 3", nameof(indices));
        _vertices = vertices.ToArray();
        _indices = indices.ToArray();
        foreach (int i in _indices)
            if ((uint)i >= (uint)_vertices.Length) throw new ArgumentException($"index {i} out of range", nameof(indices));
    }

    /// <summary>Takes ownership of the arrays (internal: the mesher never touches them again).</summary>
    internal Mesh(Vec3[] vertices, int[] indices, bool _)
    {
        _vertices = vertices;
        _indices = indices;
    }

    public static Mesh Empty { get; } = new(Array.Empty<Vec3>(), Array.Empty<int>(), true);

    public IReadOnlyList<Vec3> Vertices => _vertices;
    public IReadOnlyList<int> Indices => _indices;
    public int TriangleCount => _indices.Length / 3;
    public int VertexCount => _vertices.Length;

    /// <summary>The three corners of triangle t.</summary>
    [Pure]
    public (Vec3 A, Vec3 B, Vec3 C) Triangle(int t) => (_vertices[_indices[3 * t]], _vertices[_indices[3 * t + 1]], _vertices[_indices[3 * t + 2]]);

    /// <summary>Signed enclosed volume (divergence theorem, mm^3); positive for a closed outward mesh.</summary>
    [Pure]
    public double SignedVolume()
    {
        // Relative to a reference point near the mesh, to keep the sum well conditioned.
        var o = _vertices.Length > 0 ? _vertices[0] : default;
        double s = 0;
        for (int t = 0; t < TriangleCount; t++)
        {
            var (a, b, c) = Triangle(t);
            s += (a - o).Dot((b - o).Cross(c - o));
        }
        return s / 6.0;
    }

    /// <summary>Total triangle area, mm^2.</summary>
    [Pure]
    public double SurfaceArea()
    {
        double s = 0;
        for (int t = 0; t < TriangleCount; t++)
        {
            var (a, b, c) = Triangle(t);
            s += (b - a).Cross(c - a).Length;
        }
        return s / 2.0;
    }

    /// <summary>Axis-aligned bounds, (0,0,0) twice when empty.</summary>
    [Pure]
    public (Vec3 Min, Vec3 Max) Bounds()
    {
        if (_vertices.Length == 0) return (default, default);
        double x0 = double.PositiveInfinity, y0 = x0, z0 = x0, x1 = double.NegativeInfinity, y1 = x1, z1 = x1;
        foreach (var v in _vertices)
        {
            x0 = Math.Min(x0, v.X); y0 = Math.Min(y0, v.Y); z0 = Math.Min(z0, v.Z);
            x1 = Math.Max(x1, v.X); y1 = Math.Max(y1, v.Y); z1 = Math.Max(z1, v.Z);
        }
        return (new Vec3(x0, y0, z0), new Vec3(x1, y1, z1));
    }

    /// <summary>Moved by a vector.</summary>
    [Pure]
    public Mesh Translated(Vec3 d) => new(_vertices.Select(v => v + d).ToArray(), _indices, true);

    /// <summary>
    /// Each vertex mapped by a transform. If the map reverses orientation (a mirror), pass
    /// <paramref name="reversesOrientation"/> = true and the triangles are flipped to stay outward.
    /// </summary>
    [Pure]
    public Mesh Transformed(Func<Vec3, Vec3> map, bool reversesOrientation = false)
    {
        ArgumentNullException.ThrowIfNull(map);
        var v = _vertices.Select(map).ToArray();
        if (!reversesOrientation) return new Mesh(v, _indices, true);
        var idx = (int[])_indices.Clone();
        for (int t = 0; t < idx.Length; t += 3) (idx[t + 1], idx[t + 2]) = (idx[t + 2], idx[t + 1]);
        return new Mesh(v, idx, true);
    }

    /// <summary>Rotated about the z axis by an angle in degrees (exact at multiples of 90).</summary>
    [Pure]
    public Mesh RotatedZDeg(double deg)
    {
        double c = Angle.CosDeg(deg), s = Angle.SinDeg(deg);
        return Transformed(p => new Vec3(c * p.X - s * p.Y, s * p.X + c * p.Y, p.Z));
    }

    /// <summary>All meshes in one (vertices concatenated; shells stay separate).</summary>
    [Pure]
    public static Mesh Merge(IEnumerable<Mesh> meshes)
    {
        ArgumentNullException.ThrowIfNull(meshes);
        var list = meshes.ToList();
        var v = new Vec3[list.Sum(m => m._vertices.Length)];
        var idx = new int[list.Sum(m => m._indices.Length)];
        int vo = 0, io = 0;
        foreach (var m in list)
        {
            Array.Copy(m._vertices, 0, v, vo, m._vertices.Length);
            for (int i = 0; i < m._indices.Length; i++) idx[io + i] = m._indices[i] + vo;
            vo += m._vertices.Length;
            io += m._indices.Length;
        }
        return new Mesh(v, idx, true);
    }

    [Pure]
    public static Mesh Merge(params Mesh[] meshes) => Merge((IEnumerable<Mesh>)meshes);
}
