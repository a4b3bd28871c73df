using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;

namespace PartForge.Formats.Tests.ThreeMf;

/// <summary>Small closed, outward meshes for the 3MF tests.</summary>
internal static class SampleMeshes
{
    /// <summary>An axis-aligned box from the origin, 8 shared vertices, 12 triangles counter-clockwise seen from outside.</summary>
    public static Mesh Box(double sx, double sy, double sz)
    {
        var v = new[]
        {
            new Vec3(0, 0, 0), new Vec3(sx, 0, 0), new Vec3(sx, sy, 0), new Vec3(0, sy, 0),
            new Vec3(0, 0, sz), new Vec3(sx, 0, sz), new Vec3(sx, sy, sz), new Vec3(0, sy, sz),
        };
        var t = new[] { 0, 2, 1, 0, 3, 2, 4, 5, 6, 4, 6, 7, 0, 1, 5, 0, 5, 4, 1, 2, 6, 1, 6, 5, 2, 3, 7, 2, 7, 6, 3, 0, 4, 3, 4, 7 };
        return new Mesh(v, t);
    }

    /// <summary>The corner tetrahedron of edge a (volume a^3 / 6).</summary>
    public static Mesh Tetrahedron(double a)
    {
        var v = new[] { new Vec3(0, 0, 0), new Vec3(a, 0, 0), new Vec3(0, a, 0), new Vec3(0, 0, a) };
        return new Mesh(v, new[] { 0, 2, 1, 0, 1, 3, 0, 3, 2, 1, 2, 3 });
    }

    /// <summary>The same mesh as a triangle soup: three fresh vertices per triangle.</summary>
    public static Mesh Soup(Mesh m)
    {
        var v = new List<Vec3>();
        for (int t = 0; t < m.TriangleCount; t++)
        {
            var (a, b, c) = m.Triangle(t);
            v.Add(a); v.Add(b); v.Add(c);
        }
        return new Mesh(v, Enumerable.Range(0, v.Count).ToArray());
    }

    /// <summary>A faceted cylinder (n sides), for larger meshes: 2n + 2 vertices, 4n triangles.</summary>
    public static Mesh Cylinder(double r, double h, int n)
    {
        var v = new List<Vec3> { new(0, 0, 0), new(0, 0, h) };
        for (int i = 0; i < n; i++)
        {
            double a = 2 * Math.PI * i / n;
            v.Add(new Vec3(r * Math.Cos(a), r * Math.Sin(a), 0));
            v.Add(new Vec3(r * Math.Cos(a), r * Math.Sin(a), h));
        }
        var t = new List<int>();
        for (int i = 0; i < n; i++)
        {
            int b0 = 2 + 2 * i, t0 = b0 + 1, b1 = 2 + 2 * ((i + 1) % n), t1 = b1 + 1;
            t.AddRange(new[] { 0, b1, b0 });      // bottom, facing down
            t.AddRange(new[] { 1, t0, t1 });      // top, facing up
            t.AddRange(new[] { b0, b1, t1 });     // side
            t.AddRange(new[] { b0, t1, t0 });
        }
        return new Mesh(v, t);
    }
}
