namespace PartForge.Hardening.Tests.Support;

/// <summary>
/// Closedness and manifoldness from the file's own numbers: vertices are identified by the exact bits of their
/// three float32 coordinates; every directed edge (u, v) must occur exactly once and its reverse (v, u) exactly
/// once (closed, 2-manifold, consistently oriented); no triangle may repeat a vertex or have zero area.
/// Signed volume by the divergence theorem (sum of det[a b c] / 6), in double from the float32 values.
/// </summary>
public sealed class MeshAudit
{
    public MeshAudit(StlMesh mesh)
    {
        var ids = new Dictionary<(int, int, int), int>();
        var xyz = mesh.Xyz;
        int n = mesh.TriangleCount;
        var tri = new int[n * 3];
        for (int i = 0; i < n * 3; i++)
        {
            var key = (BitConverter.SingleToInt32Bits(xyz[3 * i]), BitConverter.SingleToInt32Bits(xyz[3 * i + 1]), BitConverter.SingleToInt32Bits(xyz[3 * i + 2]));
            if (!ids.TryGetValue(key, out int id)) ids[key] = id = ids.Count;
            tri[i] = id;
            if (!float.IsFinite(xyz[3 * i]) || !float.IsFinite(xyz[3 * i + 1]) || !float.IsFinite(xyz[3 * i + 2])) NonFinite++;
        }
        VertexCount = ids.Count;
        var edges = new Dictionary<long, int>();
        double vol = 0;
        for (int t = 0; t < n; t++)
        {
            int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
            if (a == b || b == c || a == c) { Degenerate++; }
            else
            {
                double ax = xyz[9 * t], ay = xyz[9 * t + 1], az = xyz[9 * t + 2];
                double bx = xyz[9 * t + 3], by = xyz[9 * t + 4], bz = xyz[9 * t + 5];
                double cx = xyz[9 * t + 6], cy = xyz[9 * t + 7], cz = xyz[9 * t + 8];
                double ux = bx - ax, uy = by - ay, uz = bz - az, vx = cx - ax, vy = cy - ay, vz = cz - az;
                double nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
                if (nx == 0 && ny == 0 && nz == 0) Degenerate++;
                vol += (ax * (by * cz - bz * cy) - ay * (bx * cz - bz * cx) + az * (bx * cy - by * cx)) / 6.0;
            }
            foreach (var (u, v) in new[] { (a, b), (b, c), (c, a) })
            {
                long k = ((long)u << 32) | (uint)v;
                edges[k] = edges.GetValueOrDefault(k) + 1;
            }
        }
        foreach (var (k, count) in edges)
        {
            int u = (int)(k >> 32), v = (int)(k & 0xFFFFFFFF);
            long rev = ((long)v << 32) | (uint)u;
            if (count != 1) RepeatedEdges++;
            if (!edges.ContainsKey(rev)) OpenEdges++;
        }
        EdgeCount = edges.Count / 2;
        TriangleCount = n;
        SignedVolume = vol;
    }

    public int TriangleCount { get; }
    public int VertexCount { get; }
    public int EdgeCount { get; }
    public int OpenEdges { get; }
    public int RepeatedEdges { get; }
    public int Degenerate { get; }
    public int NonFinite { get; }
    public double SignedVolume { get; }

    /// <summary>V - E + F (2 - 2 genus per closed shell).</summary>
    public int EulerCharacteristic => VertexCount - EdgeCount + TriangleCount;

    public bool ClosedManifold => OpenEdges == 0 && RepeatedEdges == 0 && Degenerate == 0 && NonFinite == 0 && TriangleCount > 0;

    public override string ToString() =>
        $"{TriangleCount} triangles, {VertexCount} vertices, open edges {OpenEdges}, repeated edges {RepeatedEdges}, degenerate {Degenerate}, non-finite {NonFinite}, volume {SignedVolume:F3}, chi {EulerCharacteristic}";
}
