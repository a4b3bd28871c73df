using System.Diagnostics.Contracts;
using PartForge.Geometry.Primitives;

namespace PartForge.Geometry.Meshes;

/// <summary>
/// Independent validity check of a triangle mesh: exact directed-edge pairing on vertex positions, degenerate
/// and non-finite geometry, Euler characteristic, genus, shells and their orientation.
/// </summary>
public static class MeshValidator
{
    /// <summary>Twice-area threshold for "zero area" (mm^2); a real triangle on the 1e-4 mm grid has at least 1e-8.</summary>
    public const double DegenerateTwiceAreaMm2 = 1e-12;

    [Pure]
    public static MeshReport Validate(Mesh m)
    {
        ArgumentNullException.ThrowIfNull(m);
        // Weld by exact position, as a reader of a triangle soup would.
        var ids = new Dictionary<Vec3, int>();
        var remap = new int[m.VertexCount];
        int nonFinite = 0;
        for (int i = 0; i < m.VertexCount; i++)
        {
            var v = m.Vertices[i];
            if (!double.IsFinite(v.X) || !double.IsFinite(v.Y) || !double.IsFinite(v.Z)) nonFinite++;
            if (!ids.TryGetValue(v, out int id)) { id = ids.Count; ids[v] = id; }
            remap[i] = id;
        }
        int f = m.TriangleCount;
        var directed = new Dictionary<long, int>(f * 3, MixedLongComparer.Instance);
        int degenerate = 0;
        var uf = new UnionFind(ids.Count);
        for (int t = 0; t < f; t++)
        {
            int a = remap[m.Indices[3 * t]], b = remap[m.Indices[3 * t + 1]], c = remap[m.Indices[3 * t + 2]];
            var (pa, pb, pc) = m.Triangle(t);
            if (a == b || b == c || c == a || (pb - pa).Cross(pc - pa).Length < DegenerateTwiceAreaMm2) degenerate++;
            Add(directed, a, b); Add(directed, b, c); Add(directed, c, a);
            uf.Union(a, b); uf.Union(b, c);
        }
        int boundary = 0, nonManifold = 0;
        var undirected = new HashSet<long>(MixedLongComparer.Instance);
        foreach (var (key, count) in directed)
        {
            int u = (int)(key >> 32), v = (int)(key & 0xffffffff);
            long rev = ((long)v << 32) | (uint)u;
            directed.TryGetValue(rev, out int rc);
            if (count > 1) nonManifold++;
            else if (rc == 0) boundary++;
            undirected.Add(u < v ? key : rev);
        }
        // Shells: components of vertices that carry triangles.
        var used = new HashSet<int>();
        for (int t = 0; t < f * 3; t++) used.Add(remap[m.Indices[t]]);
        var shellOf = new Dictionary<int, int>();
        foreach (int v in used) { int r = uf.Find(v); if (!shellOf.ContainsKey(r)) shellOf[r] = shellOf.Count; }
        var shellVol = new double[shellOf.Count];
        var shellMin = Enumerable.Repeat(new Vec3(double.PositiveInfinity, double.PositiveInfinity, double.PositiveInfinity), shellOf.Count).ToArray();
        var shellMax = Enumerable.Repeat(new Vec3(double.NegativeInfinity, double.NegativeInfinity, double.NegativeInfinity), shellOf.Count).ToArray();
        for (int i = 0; i < m.VertexCount; i++)
        {
            if (!shellOf.TryGetValue(uf.Find(remap[i]), out int sh)) continue;
            var v = m.Vertices[i];
            shellMin[sh] = new Vec3(Math.Min(shellMin[sh].X, v.X), Math.Min(shellMin[sh].Y, v.Y), Math.Min(shellMin[sh].Z, v.Z));
            shellMax[sh] = new Vec3(Math.Max(shellMax[sh].X, v.X), Math.Max(shellMax[sh].Y, v.Y), Math.Max(shellMax[sh].Z, v.Z));
        }
        var origin = m.VertexCount > 0 ? m.Vertices[0] : default;
        for (int t = 0; t < f; t++)
        {
            var (pa, pb, pc) = m.Triangle(t);
            int s = shellOf[uf.Find(remap[m.Indices[3 * t]])];
            shellVol[s] += (pa - origin).Dot((pb - origin).Cross(pc - origin)) / 6.0;
        }
        int chi = used.Count - undirected.Count + f;
        // A negative shell is an internal cavity (fine) when it lies within the bounds of a positive shell.
        bool IsCavity(int i) => Enumerable.Range(0, shellVol.Length).Any(j => j != i && shellVol[j] > 0 &&
            shellMin[j].X <= shellMin[i].X && shellMin[j].Y <= shellMin[i].Y && shellMin[j].Z <= shellMin[i].Z &&
            shellMax[j].X >= shellMax[i].X && shellMax[j].Y >= shellMax[i].Y && shellMax[j].Z >= shellMax[i].Z);
        int shells = shellOf.Count;
        return new MeshReport
        {
            VertexCount = used.Count,
            EdgeCount = undirected.Count,
            TriangleCount = f,
            BoundaryEdges = boundary,
            NonManifoldEdges = nonManifold,
            DegenerateTriangles = degenerate,
            NonFiniteVertices = nonFinite,
            EulerCharacteristic = chi,
            ShellCount = shells,
            InwardShells = Enumerable.Range(0, shells).Count(i => !(shellVol[i] > 0) && !IsCavity(i)),
            Genus = (2 * shells - chi) / 2,
            SignedVolume = shellVol.Sum(),
        };
    }

    private static void Add(Dictionary<long, int> d, int u, int v)
    {
        long k = ((long)u << 32) | (uint)v;
        d[k] = d.TryGetValue(k, out int c) ? c + 1 : 1;
    }

    private sealed class UnionFind
    {
        private readonly int[] _p;
        public UnionFind(int n) { _p = new int[n]; for (int i = 0; i < n; i++) _p[i] = i; }
        public int Find(int x) { while (_p[x] != x) { _p[x] = _p[_p[x]]; x = _p[x]; } return x; }
        public void Union(int a, int b) { a = Find(a); b = Find(b); if (a != b) _p[a] = b; }
    }
}
