using NetTopologySuite.Geometries;
using NetTopologySuite.Noding;
using NetTopologySuite.Noding.Snapround;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;

namespace PartForge.Geometry.Tests.Meshes;

/// <summary>
/// The kernel's lean working structures against plain references: local snap rounding against the
/// general-purpose snap-rounding noder of the geometry library run on whole rings, the segment sweep against
/// every pair, the array-based mesh validator against a hash-table count of the same definitions, and the
/// chunked buffer against a list.
/// </summary>
public class LeanKernelTests
{
    /// <summary>Random rings on the integer grid: star-shaped polygons, some sharing runs of segments with
    /// another ring (a copy with a few vertices moved), some crossing, some far apart.</summary>
    private static List<GridPoint[]> RandomRings(Random rnd)
    {
        var rings = new List<GridPoint[]>();
        int n = rnd.Next(2, 6);
        for (int r = 0; r < n; r++)
        {
            if (rings.Count > 0 && rnd.NextDouble() < 0.4)
            {
                // A copy of an earlier ring with 1..3 vertices moved: the rest of its segments coincide.
                var src = rings[rnd.Next(rings.Count)];
                var copy = (GridPoint[])src.Clone();
                for (int k = rnd.Next(1, 4); k > 0; k--)
                {
                    int i = rnd.Next(copy.Length);
                    copy[i] = new GridPoint(copy[i].X + rnd.Next(-40, 41), copy[i].Y + rnd.Next(-40, 41));
                }
                if (Distinct(copy)) rings.Add(copy);
                continue;
            }
            long cx = rnd.Next(-300, 301), cy = rnd.Next(-300, 301);
            int m = rnd.Next(3, 40);
            double r0 = rnd.Next(20, 250);
            var pts = new List<GridPoint>();
            for (int i = 0; i < m; i++)
            {
                double a = 2 * Math.PI * i / m, rr = r0 * (0.6 + 0.4 * rnd.NextDouble());
                var p = new GridPoint(cx + (long)Math.Round(rr * Math.Cos(a)), cy + (long)Math.Round(rr * Math.Sin(a)));
                if (pts.Count == 0 || pts[^1] != p) pts.Add(p);
            }
            while (pts.Count > 1 && pts[0] == pts[^1]) pts.RemoveAt(pts.Count - 1);
            if (pts.Count >= 3 && Distinct(pts.ToArray())) rings.Add(pts.ToArray());
        }
        return rings;
    }

    private static bool Distinct(GridPoint[] r) => r.Select(p => p.Key).Distinct().Count() == r.Length;

    /// <summary>Snap rounding of whole closed rings by the library's noder, each ring joined from its first vertex.</summary>
    private static List<GridPoint>[] WholeRingReference(List<GridPoint[]> rings)
    {
        var inputs = rings.Select((r, i) => (ISegmentString)new NodedSegmentString(
            r.Append(r[0]).Select(p => new Coordinate(p.X, p.Y)).ToArray(), i)).ToList();
        var noder = new SnapRoundingNoder(new PrecisionModel(1.0));
        noder.ComputeNodes(inputs);
        var parts = rings.Select(_ => new List<GridPoint[]>()).ToArray();
        foreach (var ss in noder.GetNodedSubstrings())
            parts[(int)ss.Context].Add(ss.Coordinates.Select(c => new GridPoint((long)Math.Floor(c.X + 0.5), (long)Math.Floor(c.Y + 0.5))).ToArray());
        var res = new List<GridPoint>[rings.Count];
        for (int r = 0; r < rings.Count; r++)
        {
            var left = parts[r].Where(x => x.Length > 0).ToList();
            var chain = new List<GridPoint> { rings[r][0] };
            while (left.Count > 0)
            {
                int k = left.FindIndex(x => x[0] == chain[^1]);
                Assert.True(k >= 0, "reference pieces do not join");
                foreach (var g in left[k]) if (chain[^1] != g) chain.Add(g);
                left.RemoveAt(k);
            }
            if (chain[^1] != rings[r][0]) chain.Add(rings[r][0]);
            res[r] = chain;
        }
        return res;
    }

    [Fact]
    public void LocalSnapRoundingGivesTheRingsThatNodingWholeRingsGives()
    {
        int compared = 0, partial = 0;
        for (int seed = 0; seed < 400; seed++)
        {
            var rnd = new Random(seed);
            var rings = RandomRings(rnd);
            if (rings.Count == 0) continue;
            var expect = WholeRingReference(rings);
            var got = LocalSnapNoder.Node(rings, out int active);
            int total = rings.Sum(r => r.Length);
            if (active < total) partial++;
            for (int r = 0; r < rings.Count; r++)
                Assert.True(expect[r].SequenceEqual(got[r]), $"seed {seed}, ring {r}: {got[r].Count} points against {expect[r].Count} noded whole");
            compared++;
        }
        Assert.True(compared > 300, $"{compared} scenes");
        Assert.True(partial > 100, $"only {partial} scenes left segments out of the noder"); // the local path was exercised
    }

    [Fact]
    public void SegmentSweepFindsExactlyThePairsWhoseGrownBoxesOverlap()
    {
        for (int seed = 0; seed < 100; seed++)
        {
            var rnd = new Random(seed);
            var rings = RandomRings(rnd);
            if (rings.Count == 0) continue;
            long margin = rnd.Next(0, 5);
            var segs = rings.SelectMany((r, ri) => r.Select((_, i) => (R: ri, I: i))).ToList();
            (long, long, long, long) Box((int R, int I) s)
            {
                var p = rings[s.R][s.I]; var q = rings[s.R][(s.I + 1) % rings[s.R].Length];
                return (Math.Min(p.X, q.X), Math.Min(p.Y, q.Y), Math.Max(p.X, q.X), Math.Max(p.Y, q.Y));
            }
            var expect = new HashSet<(int, int, int, int)>();
            for (int a = 0; a < segs.Count; a++)
                for (int b = a + 1; b < segs.Count; b++)
                {
                    var (ax0, ay0, ax1, ay1) = Box(segs[a]);
                    var (bx0, by0, bx1, by1) = Box(segs[b]);
                    if (ax1 + 2 * margin >= bx0 && bx1 + 2 * margin >= ax0 && ay1 + 2 * margin >= by0 && by1 + 2 * margin >= ay0)
                        expect.Add(Canon(segs[a].R, segs[a].I, segs[b].R, segs[b].I));
                }
            var got = new List<(int, int, int, int)>();
            SegmentSweep.ForEachNearPair(rings, margin, (r1, s1, r2, s2) => { got.Add(Canon(r1, s1, r2, s2)); return true; });
            Assert.Equal(got.Count, got.Distinct().Count());
            Assert.True(expect.SetEquals(got), $"seed {seed}: {got.Count} pairs against {expect.Count}");
        }

        static (int, int, int, int) Canon(int r1, int s1, int r2, int s2) => (r1, s1).CompareTo((r2, s2)) < 0 ? (r1, s1, r2, s2) : (r2, s2, r1, s1);
    }

    /// <summary>
    /// The validator on random triangle soups (repeated positions, flipped and doubled triangles, a zero-area
    /// one, unused vertices) against the same definitions counted with hash tables: directed edges welded by
    /// position, boundary = a directed edge used once whose reverse is absent, non-manifold = a directed edge
    /// used more than once, Euler characteristic V - E + F over the used vertices.
    /// </summary>
    [Fact]
    public void ValidatorCountsMatchAHashTableCountOfTheSameDefinitions()
    {
        for (int seed = 0; seed < 200; seed++)
        {
            var rnd = new Random(seed);
            int nv = rnd.Next(3, 40);
            var pos = Enumerable.Range(0, nv).Select(_ => new Vec3(rnd.Next(0, 6), rnd.Next(0, 6), rnd.Next(0, 3))).ToArray();
            var idx = new List<int>();
            for (int t = rnd.Next(1, 60); t > 0; t--) { idx.Add(rnd.Next(nv)); idx.Add(rnd.Next(nv)); idx.Add(rnd.Next(nv)); }
            var m = new Mesh(pos, idx);
            var rep = MeshValidator.Validate(m);

            var weld = new Dictionary<Vec3, int>();
            var remap = pos.Select(p => weld.TryGetValue(p, out int id) ? id : weld[p] = weld.Count).ToArray();
            var directed = new Dictionary<(int, int), int>();
            for (int t = 0; t < idx.Count; t += 3)
                for (int k = 0; k < 3; k++)
                {
                    var e = (remap[idx[t + k]], remap[idx[t + (k + 1) % 3]]);
                    directed[e] = directed.GetValueOrDefault(e) + 1;
                }
            int boundary = directed.Count(kv => kv.Value == 1 && !directed.ContainsKey((kv.Key.Item2, kv.Key.Item1)));
            int nonManifold = directed.Count(kv => kv.Value > 1);
            int edges = directed.Keys.Select(e => (Math.Min(e.Item1, e.Item2), Math.Max(e.Item1, e.Item2))).Distinct().Count();
            int used = idx.Select(i => remap[i]).Distinct().Count();
            Assert.Equal(boundary, rep.BoundaryEdges);
            Assert.Equal(nonManifold, rep.NonManifoldEdges);
            Assert.Equal(edges, rep.EdgeCount);
            Assert.Equal(used, rep.VertexCount);
            Assert.Equal(used - edges + idx.Count / 3, rep.EulerCharacteristic);
            Assert.Equal(m.SignedVolume(), rep.SignedVolume, 9);
        }
    }

    [Fact]
    public void ChunkedBufferHandsBackWhatWasAddedAcrossChunkBoundaries()
    {
        var b = new ChunkedBuffer<int>();
        var l = new List<int>();
        var rnd = new Random(5);
        for (int i = 0; i < 100_003; i++) { int v = rnd.Next(); b.Add(v); l.Add(v); }
        Assert.Equal(l.Count, b.Count);
        Assert.Equal(l[70_000], b[70_000]);
        Assert.Equal(l, b.ToArrayAndClear());
        Assert.Equal(0, b.Count);
        var v3 = new ChunkedBuffer<Vec3>();
        for (int i = 0; i < 5000; i++) v3.Add(new Vec3(i, -i, 0.5 * i));
        var arr = v3.ToArrayAndClear();
        Assert.Equal(5000, arr.Length);
        Assert.Equal(new Vec3(4999, -4999, 2499.5), arr[^1]);
    }
}
