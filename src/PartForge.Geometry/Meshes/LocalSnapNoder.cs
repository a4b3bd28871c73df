using NetTopologySuite.Geometries;
using NetTopologySuite.Noding;
using NetTopologySuite.Noding.Snapround;

namespace PartForge.Geometry.Meshes;

/// <summary>
/// Snap rounding of closed rings on the integer grid, handing the snap-rounding noder only the segments that
/// can change. A segment changes only where a hot pixel (a vertex, or an intersection rounded to the grid)
/// of another segment lies within half a grid step of it; every such pixel's centre lies within one step of
/// the bounding box of the segment it comes from. So a segment whose box, grown by <see cref="Margin"/> steps,
/// meets no other segment's grown box (other than segments sharing an end with it whose far ends stay more
/// than a step away from it, and the same segment on another ring) is returned as it is, and the runs of the other segments are noded
/// together, each as an open string between two ring vertices (which are hot pixels in any case). The result
/// is the one the noder gives for whole rings, at a working set proportional to the segments near another
/// boundary instead of to every vertex of the level.
/// </summary>
internal static class LocalSnapNoder
{
    /// <summary>Growth of each segment's box, in grid steps (one suffices; two leaves room for the second pass).</summary>
    public const int Margin = 2;

    /// <summary>
    /// Nodes the rings (each an open cyclic list of grid points, at least 3) and returns each as a closed list
    /// (last point equal to the first) that starts at the ring's first point. <paramref name="activeSegments"/>
    /// is the number of segments handed to the noder.
    /// </summary>
    public static List<GridPoint>[] Node(IReadOnlyList<GridPoint[]> rings, out int activeSegments)
    {
        var active = ActiveSegments(rings, out activeSegments);
        var inputs = new List<ISegmentString>();
        // runs[r]: (first segment, segment count, input index) of ring r's active runs, in ring order.
        var runs = new List<(int First, int Count, int Input)>[rings.Count];
        for (int r = 0; r < rings.Count; r++)
        {
            var ring = rings[r];
            int n = ring.Length;
            var a = active[r];
            if (a is null) continue;
            runs[r] = new List<(int, int, int)>();
            for (int i = 0; i < n;)
            {
                if (!a[i]) { i++; continue; }
                int j = i;
                while (j < n && a[j]) j++;
                var c = new Coordinate[j - i + 1];
                for (int k = i; k <= j; k++) { var p = ring[k % n]; c[k - i] = new Coordinate(p.X, p.Y); }
                runs[r].Add((i, j - i, inputs.Count));
                inputs.Add(new NodedSegmentString(c, inputs.Count));
                i = j;
            }
        }
        var parts = new List<GridPoint[]>[inputs.Count];
        for (int i = 0; i < parts.Length; i++) parts[i] = new List<GridPoint[]>();
        if (inputs.Count > 0)
        {
            var noder = new SnapRoundingNoder(new PrecisionModel(1.0)); // grid units: exact integer input
            noder.ComputeNodes(inputs);
            foreach (var ss in noder.GetNodedSubstrings())
            {
                var cs = ss.Coordinates;
                var g = new GridPoint[cs.Length];
                for (int k = 0; k < cs.Length; k++) g[k] = new GridPoint((long)Math.Floor(cs[k].X + 0.5), (long)Math.Floor(cs[k].Y + 0.5));
                parts[(int)ss.Context].Add(g);
            }
        }
        var res = new List<GridPoint>[rings.Count];
        for (int r = 0; r < rings.Count; r++)
        {
            var ring = rings[r];
            int n = ring.Length;
            var outp = new List<GridPoint>(n + 1);
            int next = 0;
            var rr = runs[r];
            for (int i = 0; i < n;)
            {
                if (rr is not null && next < rr.Count && rr[next].First == i)
                {
                    var (first, count, input) = rr[next++];
                    var chain = Chain(parts[input], ring[first], ring[(first + count) % n]);
                    for (int k = 0; k < chain.Count - 1; k++) if (outp.Count == 0 || outp[^1] != chain[k]) outp.Add(chain[k]);
                    i += count;
                }
                else
                {
                    if (outp.Count == 0 || outp[^1] != ring[i]) outp.Add(ring[i]);
                    i++;
                }
            }
            outp.Add(ring[0]);
            res[r] = outp;
        }
        return res;
    }

    /// <summary>Per ring, which segments (i, i+1) the noder must see; null for a ring with none.</summary>
    private static bool[]?[] ActiveSegments(IReadOnlyList<GridPoint[]> rings, out int count)
    {
        var active = new bool[]?[rings.Count];
        int marked = 0;
        SegmentSweep.ForEachNearPair(rings, Margin, (rs, s, rt, t) =>
        {
            if (!Interacts(rings, rs, s, rt, t)) return true;
            Mark(rs, s);
            Mark(rt, t);
            return true;
        });
        count = marked;
        return active;

        void Mark(int r, int i)
        {
            var a = active[r] ??= new bool[rings[r].Length];
            if (!a[i]) { a[i] = true; marked++; }
        }
    }

    /// <summary>Whether two segments with overlapping grown boxes can node each other. Segments with no end in
    /// common can. Two with one end in common (neighbours on a ring, or segments of two rings through a shared
    /// vertex) meet only there unless the far end of one comes within a grid step of the other (a spike). The
    /// same segment on two rings (a boundary both layers share) has no hot pixel but its ends.</summary>
    private static bool Interacts(IReadOnlyList<GridPoint[]> rings, int rs, int s, int rt, int t)
    {
        if (rs == rt && s == t) return false;
        var (p0, p1) = (rings[rs][s], rings[rs][(s + 1) % rings[rs].Length]);
        var (q0, q1) = (rings[rt][t], rings[rt][(t + 1) % rings[rt].Length]);
        if ((p0 == q0 && p1 == q1) || (p0 == q1 && p1 == q0)) return rs == rt; // on one ring: a doubled-back edge
        GridPoint pf, qf, c;
        if (p0 == q0) { c = p0; pf = p1; qf = q1; }
        else if (p0 == q1) { c = p0; pf = p1; qf = q0; }
        else if (p1 == q0) { c = p1; pf = p0; qf = q1; }
        else if (p1 == q1) { c = p1; pf = p0; qf = q0; }
        else return true;
        return DistSq(qf, c, pf) <= 1.0 || DistSq(pf, c, qf) <= 1.0;
    }

    private static double DistSq(GridPoint x, GridPoint a, GridPoint b)
    {
        double dx = b.X - a.X, dy = b.Y - a.Y, px = x.X - a.X, py = x.Y - a.Y;
        double l2 = dx * dx + dy * dy;
        double u = l2 > 0 ? Math.Clamp((px * dx + py * dy) / l2, 0, 1) : 0;
        double ex = px - u * dx, ey = py - u * dy;
        return ex * ex + ey * ey;
    }

    /// <summary>Joins the noded pieces of one run from its first vertex to its last (the noder does not promise
    /// to return them in order). For a run round a whole ring the two are the same point.</summary>
    private static List<GridPoint> Chain(List<GridPoint[]> parts, GridPoint start, GridPoint end)
    {
        var byStart = new Dictionary<long, Queue<int>>(MixedLongComparer.Instance);
        int nonEmpty = 0;
        for (int i = 0; i < parts.Count; i++)
        {
            if (parts[i].Length == 0) continue;
            nonEmpty++;
            long k = parts[i][0].Key;
            if (!byStart.TryGetValue(k, out var q)) byStart[k] = q = new Queue<int>();
            q.Enqueue(i);
        }
        var res = new List<GridPoint> { start };
        var at = start;
        int used = 0;
        while (used < nonEmpty && byStart.TryGetValue(at.Key, out var queue) && queue.Count > 0)
        {
            var part = parts[queue.Dequeue()];
            used++;
            foreach (var g in part) if (res[^1] != g) res.Add(g);
            at = part[^1];
        }
        if (used != nonEmpty || at != end) throw new InvalidOperationException("noded ring pieces do not join up");
        if (res[^1] != end) res.Add(end);
        return res;
    }
}
