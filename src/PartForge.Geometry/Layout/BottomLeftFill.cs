using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Layout;

/// <summary>
/// The layout engine behind <see cref="SheetNester"/> and <see cref="PlatePacker"/>: bottom-left fill on
/// no-fit polygons of convex outlines.
/// </summary>
/// <remarks>
/// <para>Each part is represented by a convex polygon that contains it: the convex hull of its outers (arcs
/// covered by tangent polygons), simplified outward, then grown by half the spacing. Two parts whose grown
/// polygons have disjoint interiors are at least the spacing apart. This is conservative for concave parts
/// (nothing is placed in a notch or a hole of another part).</para>
/// <para>No-fit polygon (NFP) of a placed polygon A and a moving polygon B: the translations of B at which it
/// overlaps A, A ⊕ (−B), their Minkowski sum, O(n + m) for convex polygons. Inner-fit polygon (IFP): the
/// translations that keep B's exact bounding box inside the bin shrunk by the edge margin, a rectangle.</para>
/// <para>Placing a part: the candidates are the IFP corners, the NFP vertices, the crossings of NFP edges
/// with the IFP edges and of NFP edges with each other (the vertices of the arrangement, where the
/// lexicographic minimum of the free region lies); the lowest, then leftmost candidate that is in the IFP
/// and strictly inside no NFP wins. The comparison between rotations uses the placed part's bounding-box
/// corner. Parts go largest exact area first (ties in input order), copies together; each copy tries the
/// open bins in order and takes the first where any rotation fits (first fit); when none does, a new bin
/// of the first stock size in the given order that still has sheets and on which the part fits when empty.</para>
/// <para>All arithmetic is in a fixed order, so the result is deterministic. A point counts as outside an
/// NFP when it is no more than <see cref="EpsMm"/> inside it, so parts may come that much closer than the
/// spacing (far below any grid).</para>
/// </remarks>
internal sealed class BottomLeftFill
{
    /// <summary>Numerical slack of the feasibility tests, mm.</summary>
    public const double EpsMm = 1e-9;

    private sealed class Shape
    {
        public required double RotationDeg { get; init; }
        /// <summary>Exact bounds of the rotated outers.</summary>
        public required Vec2 Min { get; init; }
        public required Vec2 Max { get; init; }
        /// <summary>Grown convex polygon, rotated, counter-clockwise from its lowest vertex.</summary>
        public required Vec2[] Grown { get; init; }
        public required Vec2[] GrownReflected { get; init; }
        public required Vec2 GrownMin { get; init; }
        public required Vec2 GrownMax { get; init; }
    }

    private sealed class Nfp
    {
        public Nfp(Vec2[] p)
        {
            P = p;
            D = new Vec2[p.Length];
            Len = new double[p.Length];
            for (int i = 0; i < p.Length; i++)
            {
                D[i] = p[(i + 1) % p.Length] - p[i];
                Len[i] = D[i].Length;
            }
            (Min, Max) = ConvexPolygon.Bounds(p);
        }

        public Vec2[] P { get; }
        public Vec2[] D { get; }
        public double[] Len { get; }
        public Vec2 Min { get; }
        public Vec2 Max { get; }

        /// <summary>
        /// True when q (relative to this NFP's frame) is inside by more than eps: a binary search for the
        /// wedge of the fan from vertex 0 that holds q, O(log n), then its outer edge and the edges beside
        /// it (a point within eps of one of them counts as outside; one nearer only to a farther edge may
        /// count as inside, which can only make the layout looser, never overlapping).
        /// </summary>
        public bool StrictlyInside(Vec2 q)
        {
            if (q.X <= Min.X + EpsMm || q.X >= Max.X - EpsMm || q.Y <= Min.Y + EpsMm || q.Y >= Max.Y - EpsMm) return false;
            int n = P.Length;
            if (n < 3) return false;
            Vec2 r = q - P[0];
            if (!Left(0, q) || !Left(n - 1, q)) return false;
            int lo = 1, hi = n - 1; // (P[lo] - P0) x r >= 0 and (P[hi] - P0) x r < 0
            if ((P[n - 1] - P[0]).Cross(r) >= 0) return false;
            while (hi - lo > 1)
            {
                int mid = (lo + hi) >> 1;
                if ((P[mid] - P[0]).Cross(r) >= 0) lo = mid; else hi = mid;
            }
            return Left(lo, q) && Left(lo - 1, q) && (lo + 1 >= n || Left(lo + 1, q));
        }

        private bool Left(int edge, Vec2 q) => D[edge].Cross(q - P[edge]) > EpsMm * Len[edge];
    }

    private sealed class Bin
    {
        public required int StockIndex { get; init; }
        public required double W { get; init; }
        public required double H { get; init; }
        public List<(int Item, int Copy, int Rot, Vec2 T, int Order)> Placed { get; } = new();
        public HashSet<(int, int)> Fails { get; } = new();
        public double PartArea { get; set; }
    }

    private readonly Shape[][] _shapes; // [item][rotation]
    private readonly double[] _area;
    private readonly double _margin;
    private readonly Dictionary<(int, int, int, int), Nfp> _nfps = new();

    private BottomLeftFill(Shape[][] shapes, double[] area, double margin)
    {
        _shapes = shapes;
        _area = area;
        _margin = margin;
    }

    public static LayoutResult Run(IReadOnlyList<LayoutItem> items, IReadOnlyList<SheetStock> stocks, double spacingMm,
        double edgeMarginMm, IReadOnlyList<double> rotationsDeg, Precision precision)
    {
        ArgumentNullException.ThrowIfNull(items);
        ArgumentNullException.ThrowIfNull(stocks);
        ArgumentNullException.ThrowIfNull(rotationsDeg);
        ArgumentNullException.ThrowIfNull(precision);
        double tol = precision.ChordalToleranceMm;
        if (!(tol > 0) || !double.IsFinite(tol)) throw new ArgumentOutOfRangeException(nameof(precision), "the chordal tolerance must be positive");
        if (!(spacingMm >= 0) || !double.IsFinite(spacingMm)) throw new ArgumentOutOfRangeException(nameof(spacingMm), "the spacing must be a finite value >= 0 mm");
        if (!(edgeMarginMm >= 0) || !double.IsFinite(edgeMarginMm)) throw new ArgumentOutOfRangeException(nameof(edgeMarginMm), "the edge margin must be a finite value >= 0 mm");
        var rotations = NormaliseRotations(rotationsDeg);
        if (stocks.Count == 0) throw new ArgumentException("no sheet size given", nameof(stocks));
        foreach (var s in stocks)
        {
            if (s is null || !(s.WidthMm > 0) || !(s.HeightMm > 0) || !double.IsFinite(s.WidthMm) || !double.IsFinite(s.HeightMm))
                throw new ArgumentException("every sheet size needs a finite width and height > 0 mm", nameof(stocks));
            if (s.Count is < 0) throw new ArgumentException("a sheet count cannot be negative", nameof(stocks));
        }
        var ids = new HashSet<string>(StringComparer.Ordinal);
        foreach (var it in items)
        {
            if (it is null || string.IsNullOrEmpty(it.Id)) throw new ArgumentException("every item needs an id", nameof(items));
            if (!ids.Add(it.Id)) throw new ArgumentException($"item id '{it.Id}' is used twice", nameof(items));
            if (it.Quantity < 0) throw new ArgumentException($"item '{it.Id}': quantity {it.Quantity} is negative", nameof(items));
            if (it.Profile is null || it.Profile.Outers is null || it.Profile.Holes is null || it.Profile.Outers.Count == 0)
                throw new ArgumentException($"item '{it.Id}' has no outline", nameof(items));
        }

        // The budget of the chordal tolerance: a third each to the arcs' tangent polygons, the outward
        // simplification and the growth's corner arcs, so the grown polygon is within tol of the exact offset.
        var shapes = new Shape[items.Count][];
        var area = new double[items.Count];
        for (int i = 0; i < items.Count; i++)
        {
            var outers = items[i].Profile.Outers;
            area[i] = LayoutOutline.Area(items[i].Profile);
            if (!(area[i] > 0) || !double.IsFinite(area[i])) throw new ArgumentException($"item '{items[i].Id}' encloses no area", nameof(items));
            var hull = ConvexPolygon.Hull(LayoutOutline.CoveringPoints(outers, tol / 3));
            hull = ConvexPolygon.SimplifyOutward(hull, tol / 3);
            var grown = ConvexPolygon.Inflate(hull, spacingMm / 2, tol / 3);
            var list = new List<Shape>(rotations.Count);
            foreach (double deg in rotations)
            {
                var (min, max) = LayoutOutline.ExactBounds(deg == 0 ? outers : outers.Select(c => c.RotatedDeg(deg)).ToArray());
                var g = ConvexPolygon.Rotated(grown, deg);
                // A rotation that maps the layout polygon onto one already listed (a disc turned by a quarter)
                // can't place the part anywhere new: only the first is kept.
                if (list.Any(o => o.Min == min && o.Max == max && o.Grown.AsSpan().SequenceEqual(g))) continue;
                var (gMin, gMax) = ConvexPolygon.Bounds(g);
                list.Add(new Shape
                {
                    RotationDeg = deg, Min = min, Max = max, Grown = g, GrownReflected = ConvexPolygon.Reflected(g), GrownMin = gMin, GrownMax = gMax,
                });
            }
            shapes[i] = list.ToArray();
        }

        var engine = new BottomLeftFill(shapes, area, edgeMarginMm);
        return engine.Fill(items, stocks);
    }

    private static List<double> NormaliseRotations(IReadOnlyList<double> rotationsDeg)
    {
        var res = new List<double>();
        foreach (double d in rotationsDeg)
        {
            if (!double.IsFinite(d)) throw new ArgumentException("rotations must be finite", nameof(rotationsDeg));
            double n = Angle.Normalize360(d);
            if (!res.Contains(n)) res.Add(n);
        }
        if (res.Count == 0) throw new ArgumentException("at least one rotation must be allowed", nameof(rotationsDeg));
        return res;
    }

    private LayoutResult Fill(IReadOnlyList<LayoutItem> items, IReadOnlyList<SheetStock> stocks)
    {
        var order = Enumerable.Range(0, items.Count).OrderByDescending(i => _area[i]).ThenBy(i => i).ToArray();
        var left = stocks.Select(s => s.Count is { } c ? (long)c : long.MaxValue).ToArray();
        var bins = new List<Bin>();
        var misses = new List<LayoutMiss>();
        int placedCount = 0;

        foreach (int item in order)
        {
            for (int copy = 0; copy < items[item].Quantity; copy++)
            {
                bool done = false;
                foreach (var bin in bins)
                {
                    if (bin.PartArea + _area[item] > bin.W * bin.H) continue;
                    if (Best(bin, item) is { } hit) { Put(bin, item, copy, hit, placedCount++); done = true; break; }
                }
                if (done) continue;

                bool fitsSomeSize = false;
                for (int s = 0; s < stocks.Count && !done; s++)
                {
                    var fresh = new Bin { StockIndex = s, W = stocks[s].WidthMm, H = stocks[s].HeightMm };
                    if (Best(fresh, item) is not { } hit) continue;
                    fitsSomeSize = true;
                    if (left[s] <= 0) continue;
                    if (left[s] != long.MaxValue) left[s]--;
                    bins.Add(fresh);
                    Put(fresh, item, copy, hit, placedCount++);
                    done = true;
                }
                if (!done) misses.Add(new LayoutMiss(items[item].Id, copy, fitsSomeSize ? LayoutMissReason.NoBinLeft : LayoutMissReason.LargerThanEveryBin));
            }
        }

        var binRecords = new List<LayoutBin>(bins.Count);
        var placements = new List<LayoutPlacement>(placedCount);
        for (int b = 0; b < bins.Count; b++)
        {
            var bin = bins[b];
            binRecords.Add(new LayoutBin(b, bin.StockIndex, bin.W, bin.H, bin.Placed.Count, bin.PartArea));
            foreach (var p in bin.Placed)
                placements.Add(new LayoutPlacement(items[p.Item].Id, p.Copy, b, _shapes[p.Item][p.Rot].RotationDeg, p.T));
        }
        return new LayoutResult(binRecords, placements, misses);
    }

    private void Put(Bin bin, int item, int copy, (int Rot, Vec2 T) hit, int order)
    {
        bin.Placed.Add((item, copy, hit.Rot, hit.T, order));
        bin.PartArea += _area[item];
    }

    /// <summary>The best (lowest, then leftmost placed box corner) position over the allowed rotations, or null.</summary>
    private (int Rot, Vec2 T)? Best(Bin bin, int item)
    {
        (int Rot, Vec2 T)? best = null;
        double by = double.PositiveInfinity, bx = double.PositiveInfinity;
        for (int r = 0; r < _shapes[item].Length; r++)
        {
            if (bin.Fails.Contains((item, r))) continue;
            var s = _shapes[item][r];
            if (Position(bin, item, r) is not { } t) { bin.Fails.Add((item, r)); continue; }
            double y = t.Y + s.Min.Y, x = t.X + s.Min.X;
            if (y < by || (y == by && x < bx)) { by = y; bx = x; best = (r, t); }
        }
        return best;
    }

    /// <summary>Bottom-left position of one rotation of a part on a bin, or null when it does not fit.</summary>
    private Vec2? Position(Bin bin, int item, int rot)
    {
        var s = _shapes[item][rot];
        var lo = new Vec2(_margin - s.Min.X, _margin - s.Min.Y);
        var hi = new Vec2(bin.W - _margin - s.Max.X, bin.H - _margin - s.Max.Y);
        if (hi.X < lo.X - EpsMm || hi.Y < lo.Y - EpsMm) return null;
        hi = new Vec2(Math.Max(hi.X, lo.X), Math.Max(hi.Y, lo.Y));

        // The NFPs that reach into the IFP.
        var active = new List<(Nfp N, Vec2 T)>();
        foreach (var p in bin.Placed)
        {
            var a = _shapes[p.Item][p.Rot];
            // Box of the NFP: A's box minus B's box.
            double x0 = p.T.X + a.GrownMin.X - s.GrownMax.X, x1 = p.T.X + a.GrownMax.X - s.GrownMin.X;
            double y0 = p.T.Y + a.GrownMin.Y - s.GrownMax.Y, y1 = p.T.Y + a.GrownMax.Y - s.GrownMin.Y;
            // Touching or apart: no point more than eps inside it is in the IFP (grown by eps).
            if (x1 <= lo.X || x0 >= hi.X || y1 <= lo.Y || y0 >= hi.Y) continue;
            active.Add((NfpOf(p.Item, p.Rot, item, rot), p.T));
        }

        bool InIfp(Vec2 q) => q.X >= lo.X - EpsMm && q.X <= hi.X + EpsMm && q.Y >= lo.Y - EpsMm && q.Y <= hi.Y + EpsMm;
        int lastBlocker = 0;
        // Free: in the IFP and strictly inside no NFP (except `skip`, the NFP the point is a vertex of).
        bool Free(Vec2 q, int skip)
        {
            if (!InIfp(q)) return false;
            if (active.Count == 0) return true;
            if (lastBlocker != skip && active[lastBlocker].N.StrictlyInside(q - active[lastBlocker].T)) return false;
            for (int k = 0; k < active.Count; k++)
            {
                if (k == lastBlocker || k == skip) continue;
                if (active[k].N.StrictlyInside(q - active[k].T)) { lastBlocker = k; return false; }
            }
            return true;
        }
        Vec2 Clamp(Vec2 q) => new(Math.Clamp(q.X, lo.X, hi.X), Math.Clamp(q.Y, lo.Y, hi.Y));

        // Candidates: IFP corners, NFP vertices, NFP edges across the IFP's sides.
        var cands = new List<(Vec2 P, int Owner)> { (lo, -1), (new(hi.X, lo.Y), -1), (new(lo.X, hi.Y), -1), (hi, -1) };
        for (int k = 0; k < active.Count; k++)
        {
            var (n, t) = active[k];
            for (int i = 0; i < n.P.Length; i++)
            {
                Vec2 a = n.P[i] + t, b = n.P[(i + 1) % n.P.Length] + t;
                if (InIfp(a)) cands.Add((a, k));
                AddSideCrossings(a, b, lo, hi, k, cands);
            }
        }
        Vec2? best = FirstFree(cands, Free);
        // Crossings of NFP edges with each other, below the best so far: a sweep over the edges' boxes.
        if (active.Count >= 2)
        {
            double limitY = best is { } b0 ? b0.Y + EpsMm : hi.Y + EpsMm;
            var edges = new List<(double X0, double X1, double Y0, double Y1, Vec2 A, Vec2 B, int Owner)>();
            for (int k = 0; k < active.Count; k++)
            {
                var (n, t) = active[k];
                for (int i = 0; i < n.P.Length; i++)
                {
                    Vec2 a = n.P[i] + t, b = n.P[(i + 1) % n.P.Length] + t;
                    double ex0 = Math.Min(a.X, b.X), ex1 = Math.Max(a.X, b.X), ey0 = Math.Min(a.Y, b.Y), ey1 = Math.Max(a.Y, b.Y);
                    if (ey0 > limitY || ey1 < lo.Y - EpsMm || ex1 < lo.X - EpsMm || ex0 > hi.X + EpsMm) continue;
                    edges.Add((ex0, ex1, ey0, ey1, a, b, k));
                }
            }
            edges.Sort((p, q) => p.X0 != q.X0 ? p.X0.CompareTo(q.X0) : p.Owner != q.Owner ? p.Owner.CompareTo(q.Owner) : p.Y0.CompareTo(q.Y0));
            var cross = new List<(Vec2 P, int Owner)>();
            for (int i = 0; i < edges.Count; i++)
            {
                var e = edges[i];
                for (int j = i + 1; j < edges.Count && edges[j].X0 <= e.X1 + EpsMm; j++)
                {
                    var f = edges[j];
                    if (f.Owner == e.Owner || f.Y0 > e.Y1 + EpsMm || f.Y1 < e.Y0 - EpsMm) continue;
                    if (SegmentCrossing(e.A, e.B, f.A, f.B) is { } x && x.Y <= limitY && InIfp(x)) cross.Add((x, -1));
                }
            }
            if (FirstFree(cross, Free) is { } c && (best is not { } bb || c.Y < bb.Y || (c.Y == bb.Y && c.X < bb.X))) best = c;
        }
        return best is { } found ? Clamp(found) : null;
    }

    /// <summary>The lowest, then leftmost free candidate: sorted by y (a primitive-key sort), then the
    /// candidates of the first y with a free one are all looked at for the leftmost.</summary>
    private static Vec2? FirstFree(List<(Vec2 P, int Owner)> cands, Func<Vec2, int, bool> free)
    {
        var keys = new double[cands.Count];
        var idx = new int[cands.Count];
        for (int i = 0; i < keys.Length; i++) { keys[i] = cands[i].P.Y; idx[i] = i; }
        Array.Sort(keys, idx);
        Vec2? best = null;
        for (int i = 0; i < keys.Length; i++)
        {
            if (best is { } b && keys[i] > b.Y) break;
            var (p, owner) = cands[idx[i]];
            if (best is { } b2 && p.X >= b2.X) continue;
            if (free(p, owner)) best = p;
        }
        return best;
    }

    private Nfp NfpOf(int a, int ra, int b, int rb)
    {
        var key = (a, ra, b, rb);
        if (!_nfps.TryGetValue(key, out var n))
        {
            n = new Nfp(ConvexPolygon.MinkowskiSum(_shapes[a][ra].Grown, _shapes[b][rb].GrownReflected));
            _nfps[key] = n;
        }
        return n;
    }

    private static void AddSideCrossings(Vec2 a, Vec2 b, Vec2 lo, Vec2 hi, int owner, List<(Vec2, int)> into)
    {
        // Vertical sides x = lo.X and x = hi.X, horizontal sides y = lo.Y and y = hi.Y.
        foreach (double x in new[] { lo.X, hi.X })
        {
            if ((a.X - x) * (b.X - x) < 0)
            {
                double y = a.Y + (b.Y - a.Y) * (x - a.X) / (b.X - a.X);
                if (y >= lo.Y - EpsMm && y <= hi.Y + EpsMm) into.Add((new Vec2(x, y), owner));
            }
        }
        foreach (double y in new[] { lo.Y, hi.Y })
        {
            if ((a.Y - y) * (b.Y - y) < 0)
            {
                double x = a.X + (b.X - a.X) * (y - a.Y) / (b.Y - a.Y);
                if (x >= lo.X - EpsMm && x <= hi.X + EpsMm) into.Add((new Vec2(x, y), owner));
            }
        }
    }

    /// <summary>The crossing point of two segments, or null when they are parallel or miss each other.</summary>
    private static Vec2? SegmentCrossing(Vec2 a, Vec2 b, Vec2 c, Vec2 d)
    {
        Vec2 r = b - a, s = d - c;
        double den = r.Cross(s);
        if (den == 0) return null;
        double t = (c - a).Cross(s) / den, u = (c - a).Cross(r) / den;
        const double slack = 1e-12;
        if (t < -slack || t > 1 + slack || u < -slack || u > 1 + slack) return null;
        return a + r * t;
    }
}
