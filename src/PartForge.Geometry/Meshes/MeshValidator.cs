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

    /// <remarks>
    /// The working set is a few integer arrays: one entry a vertex for the weld, the shells and the edge
    /// index, and one a directed edge (4 B) for the adjacency, about the size of the mesh itself; no hash
    /// tables. Directed edges are grouped by their start vertex (compressed rows), and each edge's twin is
    /// looked up among the edges leaving its end vertex.
    /// </remarks>
    [Pure]
    public static MeshReport Validate(Mesh m)
    {
        ArgumentNullException.ThrowIfNull(m);
        int nv = m.VertexCount, f = m.TriangleCount;
        var verts = m.Vertices;
        var idx = m.Indices;
        // Weld by exact position, as a reader of a triangle soup would: each vertex maps to the first vertex
        // (lowest index) at its position.
        var remap = new int[nv];
        int nonFinite = 0;
        {
            var order = new int[nv];
            for (int i = 0; i < nv; i++)
            {
                order[i] = i;
                var v = verts[i];
                if (!double.IsFinite(v.X) || !double.IsFinite(v.Y) || !double.IsFinite(v.Z)) nonFinite++;
            }
            Array.Sort(order, (i, j) => { int c = ComparePos(verts[i], verts[j]); return c != 0 ? c : i.CompareTo(j); });
            for (int k = 0; k < nv;)
            {
                int rep = order[k], e = k + 1;
                while (e < nv && ComparePos(verts[order[e]], verts[rep]) == 0) e++;
                for (int q = k; q < e; q++) remap[order[q]] = rep; // sorted by index within a group: rep is the lowest
                k = e;
            }
        }
        // Directed edges a->b, b->c, c->a grouped by start vertex.
        var start = new int[nv + 1];
        int degenerate = 0;
        var uf = new UnionFind(nv);
        for (int t = 0; t < f; t++)
        {
            int a = remap[idx[3 * t]], b = remap[idx[3 * t + 1]], c = remap[idx[3 * t + 2]];
            var (pa, pb, pc) = m.Triangle(t);
            if (a == b || b == c || c == a || (pb - pa).Cross(pc - pa).Length < DegenerateTwiceAreaMm2) degenerate++;
            start[a + 1]++; start[b + 1]++; start[c + 1]++;
            uf.Union(a, b); uf.Union(b, c);
        }
        for (int i = 0; i < nv; i++) start[i + 1] += start[i];
        var to = new int[3 * f];
        {
            var fill = new int[nv];
            Array.Copy(start, fill, nv);
            for (int t = 0; t < f; t++)
            {
                int a = remap[idx[3 * t]], b = remap[idx[3 * t + 1]], c = remap[idx[3 * t + 2]];
                to[fill[a]++] = b; to[fill[b]++] = c; to[fill[c]++] = a;
            }
        }
        for (int u = 0; u < nv; u++) Array.Sort(to, start[u], start[u + 1] - start[u]);
        int boundary = 0, nonManifold = 0, edges = 0;
        for (int u = 0; u < nv; u++)
        {
            for (int k = start[u], e = start[u + 1]; k < e;)
            {
                int v = to[k], run = k + 1;
                while (run < e && to[run] == v) run++;
                bool twin = u == v || Array.BinarySearch(to, start[v], start[v + 1] - start[v], u) >= 0;
                if (run - k > 1) nonManifold++;
                else if (!twin) boundary++;
                if (u <= v || !twin) edges++; // each undirected edge once
                k = run;
            }
        }
        // Shells: components of vertices that carry triangles, numbered in order of first use.
        var shellOfRoot = new int[nv];
        Array.Fill(shellOfRoot, -1);
        var usedMark = new bool[nv];
        int used = 0, shells = 0;
        for (int k = 0; k < 3 * f; k++)
        {
            int v = remap[idx[k]];
            if (usedMark[v]) continue;
            usedMark[v] = true;
            used++;
            int r = uf.Find(v);
            if (shellOfRoot[r] < 0) shellOfRoot[r] = shells++;
        }
        var shellVol = new double[shells];
        var shellMin = Enumerable.Repeat(new Vec3(double.PositiveInfinity, double.PositiveInfinity, double.PositiveInfinity), shells).ToArray();
        var shellMax = Enumerable.Repeat(new Vec3(double.NegativeInfinity, double.NegativeInfinity, double.NegativeInfinity), shells).ToArray();
        for (int i = 0; i < nv; i++)
        {
            int sh = shellOfRoot[uf.Find(remap[i])];
            if (sh < 0) continue;
            var v = verts[i];
            shellMin[sh] = new Vec3(Math.Min(shellMin[sh].X, v.X), Math.Min(shellMin[sh].Y, v.Y), Math.Min(shellMin[sh].Z, v.Z));
            shellMax[sh] = new Vec3(Math.Max(shellMax[sh].X, v.X), Math.Max(shellMax[sh].Y, v.Y), Math.Max(shellMax[sh].Z, v.Z));
        }
        var origin = nv > 0 ? verts[0] : default;
        for (int t = 0; t < f; t++)
        {
            var (pa, pb, pc) = m.Triangle(t);
            int s = shellOfRoot[uf.Find(remap[idx[3 * t]])];
            shellVol[s] += (pa - origin).Dot((pb - origin).Cross(pc - origin)) / 6.0;
        }
        int chi = used - edges + f;
        // A negative shell is an internal cavity (fine) when it lies within the bounds of a positive shell.
        bool IsCavity(int i) => Enumerable.Range(0, shellVol.Length).Any(j => j != i && shellVol[j] > 0 &&
            shellMin[j].X <= shellMin[i].X && shellMin[j].Y <= shellMin[i].Y && shellMin[j].Z <= shellMin[i].Z &&
            shellMax[j].X >= shellMax[i].X && shellMax[j].Y >= shellMax[i].Y && shellMax[j].Z >= shellMax[i].Z);
        return new MeshReport
        {
            VertexCount = used,
            EdgeCount = edges,
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

    /// <summary>Order of positions for the weld; 0 exactly when the positions are equal (as Vec3 equality: 0 and
    /// -0 alike, NaN equal to NaN).</summary>
    private static int ComparePos(Vec3 a, Vec3 b)
    {
        int c = a.X.CompareTo(b.X);
        if (c != 0) return c;
        c = a.Y.CompareTo(b.Y);
        return c != 0 ? c : a.Z.CompareTo(b.Z);
    }

    private sealed class UnionFind
    {
        private readonly int[] _p;
        public UnionFind(int n) { _p = new int[n]; for (int i = 0; i < n; i++) _p[i] = i; }
        public int Find(int x) { while (_p[x] != x) { _p[x] = _p[_p[x]]; x = _p[x]; } return x; }
        public void Union(int a, int b) { a = Find(a); b = Find(b); if (a != b) _p[a] = b; }
    }
}
