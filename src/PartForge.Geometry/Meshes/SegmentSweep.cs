namespace PartForge.Geometry.Meshes;

/// <summary>
/// Pairs of ring segments on the integer grid whose bounding boxes, each grown by a margin, overlap: a sweep
/// over x with a list of the boxes still open. The working set is a few arrays of one entry a segment (no
/// index objects), and the cost is about the number of segments times the boxes that cross a sweep position.
/// </summary>
internal static class SegmentSweep
{
    /// <summary>
    /// Calls <paramref name="visit"/>(ring a, segment i, ring b, segment j) once for each unordered pair of
    /// segments (i, i+1) whose boxes grown by <paramref name="margin"/> grid steps overlap (touching counts);
    /// stops when it returns false. Returns false when stopped.
    /// </summary>
    public static bool ForEachNearPair(IReadOnlyList<GridPoint[]> rings, long margin, Func<int, int, int, int, bool> visit)
    {
        int total = 0;
        foreach (var r in rings) total += r.Length;
        if (total >= 1 << 24) throw new InvalidOperationException($"a level with {total} boundary segments is beyond the sweep's index");
        var ringOf = new int[total];
        var segOf = new int[total];
        var order = new long[total];
        long minAll = long.MaxValue;
        foreach (var r in rings) foreach (var p in r) minAll = Math.Min(minAll, p.X);
        int f = 0;
        for (int r = 0; r < rings.Count; r++)
        {
            var ring = rings[r];
            for (int i = 0; i < ring.Length; i++, f++)
            {
                ringOf[f] = r; segOf[f] = i;
                long x0 = Math.Min(ring[i].X, ring[(i + 1) % ring.Length].X) - minAll;
                order[f] = (x0 << 24) | (uint)f; // by the box's left end, then by index
            }
        }
        Array.Sort(order);
        var open = new List<int>();
        long reach = 2 * margin;
        foreach (long key in order)
        {
            int s = (int)(key & 0xffffff);
            var (sx0, sy0, _, sy1) = Box(rings, ringOf[s], segOf[s]);
            int w = 0;
            bool go = true;
            for (int k = 0; k < open.Count; k++)
            {
                int t = open[k];
                var (_, ty0, tx1, ty1) = Box(rings, ringOf[t], segOf[t]);
                if (tx1 + reach < sx0) continue; // the sweep has passed it for good
                open[w++] = t;
                if (!go || ty1 + reach < sy0 || sy1 + reach < ty0) continue;
                go = visit(ringOf[t], segOf[t], ringOf[s], segOf[s]);
            }
            if (!go) return false;
            open.RemoveRange(w, open.Count - w);
            open.Add(s);
        }
        return true;
    }

    private static (long X0, long Y0, long X1, long Y1) Box(IReadOnlyList<GridPoint[]> rings, int r, int i)
    {
        var ring = rings[r];
        var p = ring[i]; var q = ring[(i + 1) % ring.Length];
        return (Math.Min(p.X, q.X), Math.Min(p.Y, q.Y), Math.Max(p.X, q.X), Math.Max(p.Y, q.Y));
    }

    /// <summary>Whether closed segments (a, b) and (c, d) have a point in common, exactly.</summary>
    public static bool SegmentsMeet(GridPoint a, GridPoint b, GridPoint c, GridPoint d)
    {
        int o1 = Int128.Sign(Orient(a, b, c)), o2 = Int128.Sign(Orient(a, b, d));
        int o3 = Int128.Sign(Orient(c, d, a)), o4 = Int128.Sign(Orient(c, d, b));
        if (o1 != o2 && o3 != o4) return true;
        return (o1 == 0 && Within(a, c, b)) || (o2 == 0 && Within(a, d, b)) || (o3 == 0 && Within(c, a, d)) || (o4 == 0 && Within(c, b, d));
    }

    private static Int128 Orient(GridPoint a, GridPoint b, GridPoint c) =>
        (Int128)(b.X - a.X) * (c.Y - a.Y) - (Int128)(b.Y - a.Y) * (c.X - a.X);

    /// <summary>q, collinear with p and r, lies within their box.</summary>
    private static bool Within(GridPoint p, GridPoint q, GridPoint r) =>
        q.X <= Math.Max(p.X, r.X) && q.X >= Math.Min(p.X, r.X) && q.Y <= Math.Max(p.Y, r.Y) && q.Y >= Math.Min(p.Y, r.Y);
}
