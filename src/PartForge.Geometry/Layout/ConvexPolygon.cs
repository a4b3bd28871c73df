using PartForge.Geometry.Primitives;

namespace PartForge.Geometry.Layout;

/// <summary>
/// Convex polygons as counter-clockwise vertex arrays (not closed, no repeated vertex), the operations the
/// layout engine needs: hull, outward simplification, outward offset, Minkowski sum, strict containment.
/// Every operation that changes a shape only ever makes it larger (so a placement found on the result is
/// also valid for the exact shape), and says by how much at most.
/// </summary>
internal static class ConvexPolygon
{
    /// <summary>Longest run of edges one simplification step may replace (keeps it linear in practice).</summary>
    private const int MaxChain = 64;

    /// <summary>
    /// Convex hull (Andrew's monotone chain, O(n log n)); counter-clockwise, collinear points dropped,
    /// starting at the lowest vertex (then leftmost).
    /// </summary>
    public static Vec2[] Hull(IReadOnlyList<Vec2> points)
    {
        var p = points.Distinct().OrderBy(v => v.X).ThenBy(v => v.Y).ToArray();
        if (p.Length < 3) throw new ArgumentException("an outline needs at least three distinct points");
        var h = new Vec2[2 * p.Length];
        int k = 0;
        for (int i = 0; i < p.Length; i++)
        {
            while (k >= 2 && (h[k - 1] - h[k - 2]).Cross(p[i] - h[k - 2]) <= 0) k--;
            h[k++] = p[i];
        }
        for (int i = p.Length - 2, t = k + 1; i >= 0; i--)
        {
            while (k >= t && (h[k - 1] - h[k - 2]).Cross(p[i] - h[k - 2]) <= 0) k--;
            h[k++] = p[i];
        }
        if (k - 1 < 3) throw new ArgumentException("an outline encloses no area (all its points are on one line)");
        return StartAtLowest(h.AsSpan(0, k - 1).ToArray());
    }

    /// <summary>The same polygon with its vertices rotated so that the lowest (then leftmost) comes first.</summary>
    public static Vec2[] StartAtLowest(Vec2[] v)
    {
        int s = 0;
        for (int i = 1; i < v.Length; i++)
            if (v[i].Y < v[s].Y || (v[i].Y == v[s].Y && v[i].X < v[s].X)) s = i;
        if (s == 0) return v;
        var r = new Vec2[v.Length];
        for (int i = 0; i < v.Length; i++) r[i] = v[(s + i) % v.Length];
        return r;
    }

    /// <summary>
    /// Fewer edges, never smaller: runs of edges are replaced by extending the edges on either side until
    /// they meet, as long as the new corner is at most <paramref name="tolMm"/> from the polygon. The result
    /// is the intersection of half-planes of kept edges, so it contains the input; its Hausdorff distance to
    /// the input is at most <paramref name="tolMm"/> (for nested convex polygons it is reached at a vertex).
    /// Edges along x or y are always kept.
    /// </summary>
    public static Vec2[] SimplifyOutward(Vec2[] v, double tolMm)
    {
        int n = v.Length;
        if (n <= 4 || !(tolMm > 0)) return v;
        var kept = new List<int> { 0 };
        int i = 0;
        while (true)
        {
            int best = i + 1;
            for (int j = i + 2; j <= n && j - i <= MaxChain; j++)
            {
                if (AxisParallel(v, (j - 1) % n) || !CanJoin(v, i, j, tolMm)) break;
                best = j;
            }
            if (best >= n) break;
            kept.Add(best);
            i = best;
        }
        if (kept.Count < 3) return v;
        var res = new List<Vec2>(kept.Count);
        for (int k = 0; k < kept.Count; k++)
        {
            int a = kept[k], b = k + 1 < kept.Count ? kept[k + 1] : n;
            res.Add(b == a + 1 ? v[(a + 1) % n] : LineMeet(v, a, b % n));
        }
        return StartAtLowest(res.ToArray());
    }

    /// <summary>Edges along x or y are kept: they carry the bounding box (a disc's hull then touches its box).</summary>
    private static bool AxisParallel(Vec2[] v, int e)
    {
        Vec2 d = v[(e + 1) % v.Length] - v[e];
        return d.X == 0 || d.Y == 0;
    }

    private static bool CanJoin(Vec2[] v, int i, int jUnwrapped, double tol)
    {
        int n = v.Length;
        int j = jUnwrapped % n;
        Vec2 di = v[(i + 1) % n] - v[i], dj = v[(j + 1) % n] - v[j];
        double cr = di.Cross(dj);
        if (!(cr > 1e-12 * di.Length * dj.Length)) return false; // the two lines must turn left by less than 180 degrees
        var w = LineMeet(v, i, j);
        double best = double.PositiveInfinity;
        for (int k = i; k <= jUnwrapped; k++)
            best = Math.Min(best, PointSegmentDistance(w, v[k % n], v[(k + 1) % n]));
        return best <= tol;
    }

    private static Vec2 LineMeet(Vec2[] v, int i, int j)
    {
        int n = v.Length;
        Vec2 p = v[i], d = v[(i + 1) % n] - v[i];
        Vec2 q = v[j], e = v[(j + 1) % n] - v[j];
        double t = (q - p).Cross(e) / d.Cross(e);
        return p + d * t;
    }

    public static double PointSegmentDistance(Vec2 p, Vec2 a, Vec2 b)
    {
        Vec2 d = b - a;
        double dd = d.Dot(d);
        double t = dd > 0 ? Math.Clamp((p - a).Dot(d) / dd, 0, 1) : 0;
        return (p - (a + d * t)).Length;
    }

    /// <summary>
    /// A convex polygon containing the polygon grown by <paramref name="dMm"/> (its Minkowski sum with a
    /// disc): edges move out parallel, each corner's arc is replaced by tangent segments whose corners are
    /// at most <paramref name="tolMm"/> outside the arc (d / cos(phi / 2) - d &lt;= tol).
    /// </summary>
    public static Vec2[] Inflate(Vec2[] v, double dMm, double tolMm)
    {
        if (!(dMm > 0)) return v;
        int n = v.Length;
        double phiMax = 2 * Math.Acos(dMm / (dMm + tolMm));
        var res = new List<Vec2>(3 * n);
        for (int i = 0; i < n; i++)
        {
            Vec2 nPrev = OutwardNormal(v[(i + n - 1) % n], v[i]);
            Vec2 nNext = OutwardNormal(v[i], v[(i + 1) % n]);
            double a0 = Math.Atan2(nPrev.Y, nPrev.X);
            double turn = Math.Atan2(nPrev.Cross(nNext), nPrev.Dot(nNext));
            if (turn < 0) turn = 0; // a rounding-level dent: one tangent corner covers it
            int k = Math.Max(1, (int)Math.Ceiling(turn / phiMax - 1e-12));
            double phi = turn / k;
            double r = dMm / Math.Cos(phi / 2);
            for (int j = 0; j < k; j++)
            {
                double a = a0 + phi * (j + 0.5);
                res.Add(new Vec2(v[i].X + r * Math.Cos(a), v[i].Y + r * Math.Sin(a)));
            }
        }
        return StartAtLowest(res.ToArray());
    }

    private static Vec2 OutwardNormal(Vec2 a, Vec2 b)
    {
        Vec2 d = b - a;
        double len = d.Length;
        return new Vec2(d.Y / len, -d.X / len);
    }

    /// <summary>
    /// Minkowski sum of two convex counter-clockwise polygons that both start at their lowest vertex: the
    /// edges merged by direction, O(n + m) (a standard result of computational geometry; e.g. de Berg et al.,
    /// Computational Geometry, ch. 13).
    /// </summary>
    public static Vec2[] MinkowskiSum(Vec2[] p, Vec2[] q)
    {
        int n = p.Length, m = q.Length;
        var res = new List<Vec2>(n + m);
        int i = 0, j = 0;
        while (i < n || j < m)
        {
            res.Add(p[i % n] + q[j % m]);
            double cr = (p[(i + 1) % n] - p[i % n]).Cross(q[(j + 1) % m] - q[j % m]);
            bool moveI = i < n && (cr >= 0 || j >= m);
            bool moveJ = j < m && (cr <= 0 || i >= n);
            if (moveI) i++;
            if (moveJ) j++;
        }
        return res.ToArray();
    }

    /// <summary>Negated vertices (the polygon reflected through the origin), starting at the lowest again.</summary>
    public static Vec2[] Reflected(Vec2[] v) => StartAtLowest(v.Select(p => new Vec2(-p.X, -p.Y)).ToArray());

    /// <summary>Each vertex rotated about the origin (exact at multiples of 90 degrees), starting at the lowest again.</summary>
    public static Vec2[] Rotated(Vec2[] v, double deg) => deg == 0 ? v : StartAtLowest(v.Select(p => p.RotatedDeg(deg)).ToArray());

    public static (Vec2 Min, Vec2 Max) Bounds(Vec2[] v)
    {
        double x0 = double.PositiveInfinity, y0 = x0, x1 = double.NegativeInfinity, y1 = x1;
        foreach (var p in v)
        {
            x0 = Math.Min(x0, p.X); y0 = Math.Min(y0, p.Y);
            x1 = Math.Max(x1, p.X); y1 = Math.Max(y1, p.Y);
        }
        return (new Vec2(x0, y0), new Vec2(x1, y1));
    }

    public static double Area(Vec2[] v)
    {
        double s = 0;
        for (int i = 0; i < v.Length; i++) s += v[i].Cross(v[(i + 1) % v.Length]);
        return s / 2;
    }
}
