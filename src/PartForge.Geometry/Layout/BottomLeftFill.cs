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
        /// <summary>Per moving part and rotation: the placed parts whose NFP lies wholly inside the others'
        /// or outside the IFP, so it can offer no position now or later (it stays in the containment tests).</summary>
        public Dictionary<(int, int), HashSet<int>> Buried { get; } = new();
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
            Vec2[] hull;
            try
            {
                hull = ConvexPolygon.Hull(LayoutOutline.CoveringPoints(outers, tol / 3));
            }
            catch (ArgumentException ex)
            {
                throw new ArgumentException($"item '{items[i].Id}': {ex.Message}", nameof(items), ex);
            }
            hull = ConvexPolygon.SimplifyOutward(hull, tol / 3);
            var grown = ConvexPolygon.Inflate(hull, spacingMm / 2, tol / 3);
            var list = new List<Shape>(rotations.Count);
            foreach (double deg in rotations)
            {
                var (min, max) = LayoutOutline.ExactBounds(deg == 0 ? outers : outers.Select(c => c.RotatedDeg(deg)).ToArray());
                var g = ConvexPolygon.Rotated(grown, deg);
                // A rotation that maps the layout polygon onto one already listed (a disc turned by a quarter)
                // can't place the part anywhere new: only the first is kept.
                if (list.Any(o => SameShape(o, min, max, g))) continue;
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

    /// <summary>
    /// True when a rotation gives (up to 1e-9 mm, rounding of the rotation) the same bounds and layout
    /// polygon as an earlier one; skipping it only gives up positions that the earlier one already offers.
    /// </summary>
    private static bool SameShape(Shape o, Vec2 min, Vec2 max, Vec2[] g)
    {
        const double tol = 1e-9;
        if ((o.Min - min).Length > tol || (o.Max - max).Length > tol || o.Grown.Length != g.Length) return false;
        int n = g.Length, shift = -1;
        for (int i = 0; i < n && shift < 0; i++) if ((g[i] - o.Grown[0]).Length <= tol) shift = i;
        if (shift < 0) return false;
        for (int i = 0; i < n; i++) if ((g[(i + shift) % n] - o.Grown[i]).Length > tol) return false;
        return true;
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
        var placedIndex = new List<int>();
        for (int pi = 0; pi < bin.Placed.Count; pi++)
        {
            var p = bin.Placed[pi];
            var a = _shapes[p.Item][p.Rot];
            // Box of the NFP: A's box minus B's box.
            double x0 = p.T.X + a.GrownMin.X - s.GrownMax.X, x1 = p.T.X + a.GrownMax.X - s.GrownMin.X;
            double y0 = p.T.Y + a.GrownMin.Y - s.GrownMax.Y, y1 = p.T.Y + a.GrownMax.Y - s.GrownMin.Y;
            // Touching or apart: no point more than eps inside it is in the IFP (grown by eps).
            if (x1 <= lo.X || x0 >= hi.X || y1 <= lo.Y || y0 >= hi.Y) continue;
            active.Add((NfpOf(p.Item, p.Rot, item, rot), p.T));
            placedIndex.Add(pi);
        }
        var grid = new NfpGrid(active, lo, hi);
        if (!bin.Buried.TryGetValue((item, rot), out var buried)) bin.Buried[(item, rot)] = buried = new HashSet<int>();

        bool InIfp(Vec2 q) => q.X >= lo.X - EpsMm && q.X <= hi.X + EpsMm && q.Y >= lo.Y - EpsMm && q.Y <= hi.Y + EpsMm;
        Vec2? best = null;
        bool Better(Vec2 q) => best is not { } b || q.Y < b.Y || (q.Y == b.Y && q.X < b.X);
        void Offer(Vec2 q, int skip)
        {
            if (InIfp(q) && Better(q) && grid.CoveredBy(q, skip) < 0) best = q;
        }

        // Candidates: IFP corners, NFP vertices, NFP edges across the IFP's sides. An edge that lies inside
        // one or two other NFPs (its ends inside them and the parts inside each overlapping) offers nothing;
        // an NFP whose every edge is so (or outside the IFP) is buried for good, as parts are only ever added.
        Offer(lo, -1); Offer(new Vec2(hi.X, lo.Y), -1); Offer(new Vec2(lo.X, hi.Y), -1); Offer(hi, -1);
        var live = new List<(Vec2 A, Vec2 B, int Owner)>();
        var side = new List<(Vec2, int)>();
        for (int k = 0; k < active.Count; k++)
        {
            if (buried.Contains(placedIndex[k])) continue;
            var (n, t) = active[k];
            int m = n.P.Length;
            var cov = new int[m];
            for (int i = 0; i < m; i++)
            {
                Vec2 a = n.P[i] + t;
                cov[i] = grid.CoveredBy(a, k);
                if (cov[i] == -1 && InIfp(a) && Better(a)) best = a;
            }
            int liveBefore = live.Count;
            for (int i = 0; i < m; i++)
            {
                int j = (i + 1) % m;
                Vec2 a = n.P[i] + t, b = n.P[j] + t;
                if ((a.X < lo.X - EpsMm && b.X < lo.X - EpsMm) || (a.X > hi.X + EpsMm && b.X > hi.X + EpsMm)
                    || (a.Y < lo.Y - EpsMm && b.Y < lo.Y - EpsMm) || (a.Y > hi.Y + EpsMm && b.Y > hi.Y + EpsMm)) continue;
                if (cov[i] >= 0 && cov[j] >= 0 && grid.SegmentCovered(a, b, cov[i], cov[j])) continue;
                live.Add((a, b, k));
                side.Clear();
                AddSideCrossings(a, b, lo, hi, k, side);
                foreach (var (q, owner) in side) Offer(q, owner);
            }
            if (live.Count == liveBefore) buried.Add(placedIndex[k]);
        }

        // Crossings of live NFP edges with each other, below the best so far, between edges that share a grid cell.
        if (live.Count >= 2)
        {
            double limitY = best is { } b0 ? b0.Y + EpsMm : hi.Y + EpsMm;
            var edges = live.Where(e => Math.Min(e.A.Y, e.B.Y) <= limitY).ToList();
            foreach (var (e, f) in grid.EdgePairs(edges))
            {
                if (e.Owner == f.Owner) continue;
                if (SegmentCrossing(e.A, e.B, f.A, f.B) is { } x && x.Y <= limitY && InIfp(x) && Better(x) && grid.CoveredBy(x, -1) < 0) best = x;
            }
        }
        return best is { } found ? new Vec2(Math.Clamp(found.X, lo.X, hi.X), Math.Clamp(found.Y, lo.Y, hi.Y)) : null;
    }

    /// <summary>
    /// A uniform grid over the IFP holding the active NFPs by their boxes, so that "is this point inside
    /// some NFP" looks at the few NFPs of one cell, and edge pairs are only formed within a cell.
    /// </summary>
    private sealed class NfpGrid
    {
        private readonly List<(Nfp N, Vec2 T)> _active;
        private readonly double _x0, _y0, _cell;
        private readonly int _cols, _rows;
        private readonly int[] _start, _items;
        private int _last;

        public NfpGrid(List<(Nfp N, Vec2 T)> active, Vec2 lo, Vec2 hi)
        {
            _active = active;
            _x0 = lo.X - 2 * EpsMm;
            _y0 = lo.Y - 2 * EpsMm;
            double w = hi.X - lo.X + 4 * EpsMm, h = hi.Y - lo.Y + 4 * EpsMm;
            // Cells about the size of a typical NFP box, at most 128 a side.
            double typical = active.Count == 0 ? Math.Max(w, h) : active.Average(a => Math.Max(a.N.Max.X - a.N.Min.X, a.N.Max.Y - a.N.Min.Y));
            _cell = Math.Max(Math.Max(w, h) / 128, Math.Max(typical, 1e-6));
            _cols = Math.Max(1, (int)Math.Ceiling(w / _cell));
            _rows = Math.Max(1, (int)Math.Ceiling(h / _cell));
            int cells = _cols * _rows;
            _start = new int[cells + 1];
            foreach (var (n, t) in active)
                ForCells(n.Min + t, n.Max + t, cell => _start[cell + 1]++);
            for (int c = 1; c <= cells; c++) _start[c] += _start[c - 1];
            _items = new int[_start[cells]];
            var fill = (int[])_start.Clone();
            for (int k = 0; k < active.Count; k++)
            {
                var (n, t) = active[k];
                int kk = k;
                ForCells(n.Min + t, n.Max + t, cell => _items[fill[cell]++] = kk);
            }
        }

        private void ForCells(Vec2 min, Vec2 max, Action<int> visit)
        {
            var (c0, r0) = CellOf(min);
            var (c1, r1) = CellOf(max);
            for (int r = r0; r <= r1; r++)
                for (int c = c0; c <= c1; c++) visit(r * _cols + c);
        }

        private (int C, int R) CellOf(Vec2 p) =>
            (Math.Clamp((int)Math.Floor((p.X - _x0) / _cell), 0, _cols - 1), Math.Clamp((int)Math.Floor((p.Y - _y0) / _cell), 0, _rows - 1));

        /// <summary>An active NFP that holds q strictly (other than `skip`), or -1.</summary>
        public int CoveredBy(Vec2 q, int skip)
        {
            if (_active.Count == 0) return -1;
            if (_last != skip && _last < _active.Count && Inside(_last, q)) return _last;
            var (c, r) = CellOf(q);
            int cell = r * _cols + c;
            for (int i = _start[cell]; i < _start[cell + 1]; i++)
            {
                int k = _items[i];
                if (k == skip || k == _last) continue;
                if (Inside(k, q)) { _last = k; return k; }
            }
            return -1;
        }

        public bool Inside(int k, Vec2 q) => _active[k].N.StrictlyInside(q - _active[k].T);

        /// <summary>
        /// True when the segment from a (strictly inside NFP ka) to b (strictly inside NFP kb) lies strictly
        /// inside their union: the parameter ranges inside each (Cyrus-Beck clipping against the convex
        /// polygons, with the eps margin) overlap.
        /// </summary>
        public bool SegmentCovered(Vec2 a, Vec2 b, int ka, int kb)
        {
            if (ka == kb) return true;
            if (Inside(ka, b) || Inside(kb, a)) return true;
            var (_, aHi) = Clip(ka, a, b);
            var (bLo, _) = Clip(kb, a, b);
            return aHi > bLo;
        }

        private (double Lo, double Hi) Clip(int k, Vec2 a, Vec2 b)
        {
            var (n, t) = _active[k];
            Vec2 p = a - t, d = b - a;
            double lo = double.NegativeInfinity, hi = double.PositiveInfinity;
            for (int i = 0; i < n.P.Length; i++)
            {
                double f0 = n.D[i].Cross(p - n.P[i]) - EpsMm * n.Len[i];
                double df = n.D[i].Cross(d);
                if (df == 0) { if (f0 <= 0) return (1, 0); continue; }
                double root = -f0 / df;
                if (df > 0) lo = Math.Max(lo, root); else hi = Math.Min(hi, root);
                if (lo >= hi) return (1, 0);
            }
            return (lo, hi);
        }

        /// <summary>Pairs of edges that share a cell (a pair may come more than once).</summary>
        public IEnumerable<((Vec2 A, Vec2 B, int Owner) E, (Vec2 A, Vec2 B, int Owner) F)> EdgePairs(List<(Vec2 A, Vec2 B, int Owner)> edges)
        {
            var byCell = new Dictionary<int, List<int>>();
            for (int i = 0; i < edges.Count; i++)
            {
                var (a, b, _) = edges[i];
                int ii = i;
                ForCells(new Vec2(Math.Min(a.X, b.X), Math.Min(a.Y, b.Y)), new Vec2(Math.Max(a.X, b.X), Math.Max(a.Y, b.Y)), cell =>
                {
                    if (!byCell.TryGetValue(cell, out var list)) byCell[cell] = list = new List<int>();
                    list.Add(ii);
                });
            }
            foreach (var cell in byCell.Keys.OrderBy(k => k))
            {
                var list = byCell[cell];
                for (int i = 0; i < list.Count; i++)
                    for (int j = i + 1; j < list.Count; j++)
                        yield return (edges[list[i]], edges[list[j]]);
            }
        }
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
