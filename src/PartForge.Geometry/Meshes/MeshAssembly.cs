using NetTopologySuite.Geometries;
using NetTopologySuite.Noding;
using NetTopologySuite.Noding.Snapround;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;

namespace PartForge.Geometry.Meshes;

/// <summary>The working state of one <see cref="Mesher.Build"/> call.</summary>
internal sealed class MeshAssembly
{
    private readonly Precision _prec;
    private readonly double _scale;
    private readonly List<Vec3> _vertices = new();
    private readonly List<int> _tris = new();
    private readonly GeometryFactory _f;
    private readonly bool _collectConflicts;
    private bool _noded;

    /// <summary>Edges (grid points P, Q) where, after noding, the layer above a level and the layer below it
    /// bound the same edge from opposite sides: the two solids would meet along a line (a non-manifold edge).
    /// Layer is the index in the solid of the layer above.</summary>
    public List<(int Layer, GridPoint P, GridPoint Q)> Conflicts { get; } = new();

    public MeshAssembly(Precision prec, bool collectConflicts = false)
    {
        _collectConflicts = collectConflicts;
        _prec = prec;
        _scale = prec.Scale;
        _f = new GeometryFactory(new PrecisionModel(_scale));
    }

    /// <summary>A ring of one layer on one level: its (possibly noded) points and where its own vertices sit.</summary>
    private sealed class RingUse
    {
        public required GridPoint[] Orig;
        public GridPoint[] Noded = null!;
        public int[] OrigPos = null!;     // index in Noded of Orig[i]
        public bool Changed;
    }

    private sealed class Level
    {
        public long Z;
        public readonly Dictionary<long, int> Ids = new(MixedLongComparer.Instance);
    }

    /// <summary>The mesh, or null when conflicts were collected (the caller heals and retries).</summary>
    public Mesh? Build(LayeredSolid solid)
    {
        var layers = solid.Layers.Select((l, i) => (L: l, I: i)).Where(x => !x.L.Region.IsEmpty).ToList();
        if (layers.Count == 0) return Mesh.Empty;
        CheckFloat32(layers.Select(x => x.L).ToList());

        // Group touching layers into stacks (a gap in z starts a new shell).
        var stack = new List<(long Z0, long Z1, Region R, int Index)>();
        long? lastTop = null;
        foreach (var (l, index) in layers)
        {
            long z0 = ToGrid(l.Z0), z1 = ToGrid(l.Z1);
            if (z1 <= z0) continue; // thinner than the grid: nothing to mesh
            if (lastTop is { } t && z0 != t) { BuildStack(stack); stack.Clear(); }
            if (lastTop is { } t2 && z0 < t2) throw new ArgumentException("layers overlap in z after snapping to the grid");
            stack.Add((z0, z1, l.Region, index));
            lastTop = z1;
        }
        BuildStack(stack);
        if (_collectConflicts && Conflicts.Count > 0) return null;
        var mesh = new Mesh(_vertices.ToArray(), _tris.ToArray(), true);
        if (_noded)
        {
            // Levels where layer boundaries cross were snap-rounded: verify before the mesh leaves the kernel.
            var rep = MeshValidator.Validate(mesh);
            if (!rep.IsValid)
                throw new InvalidOperationException($"meshing failed at a level where the boundaries of touching layers meet or cross within one grid step ({rep}); move the features apart by more than {_prec.GridMm} mm");
        }
        return mesh;
    }

    private void CheckFloat32(List<Layer> layers)
    {
        double lim = Mesher.Float32SafeLimitMm(_prec);
        foreach (var l in layers)
        {
            var (mn, mx) = l.Region.Bounds;
            double m = Math.Max(Math.Max(Math.Abs(mn.X), Math.Abs(mx.X)), Math.Max(Math.Abs(mn.Y), Math.Abs(mx.Y)));
            m = Math.Max(m, Math.Max(Math.Abs(l.Z0), Math.Abs(l.Z1)));
            if (!(m < lim))
                throw new ArgumentOutOfRangeException(nameof(layers), $"coordinate {m} mm exceeds {lim} mm, beyond which float32 output cannot keep {_prec.GridMm} mm grid points apart");
        }
    }

    private long ToGrid(double v) => (long)Math.Floor(v * _scale + 0.5);

    private GridPoint[][] Rings(Region r)
    {
        var res = new List<GridPoint[]>();
        foreach (var p in r.Polygons)
        {
            res.Add(ToRing(p.Shell));
            for (int i = 0; i < p.NumInteriorRings; i++) res.Add(ToRing(p.GetInteriorRingN(i)));
        }
        return res.Where(x => x.Length >= 3).ToArray();
    }

    private GridPoint[] ToRing(LineString ring)
    {
        var seq = ring.CoordinateSequence;
        var pts = new List<GridPoint>(seq.Count);
        for (int i = 0; i < seq.Count - 1; i++)
        {
            var g = new GridPoint(ToGrid(seq.GetX(i)), ToGrid(seq.GetY(i)));
            if (pts.Count == 0 || pts[^1] != g) pts.Add(g);
        }
        while (pts.Count > 1 && pts[0] == pts[^1]) pts.RemoveAt(pts.Count - 1);
        return pts.ToArray();
    }

    private int Vertex(Level lv, GridPoint p)
    {
        long k = p.Key;
        if (!lv.Ids.TryGetValue(k, out int id))
        {
            id = _vertices.Count;
            _vertices.Add(new Vec3(p.X / _scale, p.Y / _scale, lv.Z / _scale));
            lv.Ids[k] = id;
        }
        return id;
    }

    // ------------------------------------------------------------------------------------------------

    private void BuildStack(List<(long Z0, long Z1, Region R, int Index)> stack)
    {
        int k = stack.Count;
        if (k == 0) return;
        var rings = stack.Select(s => Rings(s.R)).ToArray();
        var levels = new Level[k + 1];
        for (int m = 0; m <= k; m++) levels[m] = new Level { Z = m < k ? stack[m].Z0 : stack[k - 1].Z1 };

        // bottom[j][r] / top[j][r]: ring r of layer j as used on level j / level j+1.
        var bottom = new RingUse[k][];
        var top = new RingUse[k][];
        for (int j = 0; j < k; j++)
        {
            bottom[j] = rings[j].Select(x => new RingUse { Orig = x }).ToArray();
            top[j] = rings[j].Select(x => new RingUse { Orig = x }).ToArray();
        }
        // continues[j][r] = index of the identical ring in layer j+1 when the wall runs straight through level j+1.
        var continues = new int[k][];
        for (int j = 0; j < k; j++) { continues[j] = new int[rings[j].Length]; Array.Fill(continues[j], -1); }

        for (int m = 0; m <= k; m++)
        {
            RingUse[] below = m > 0 ? top[m - 1] : Array.Empty<RingUse>();
            RingUse[] above = m < k ? bottom[m] : Array.Empty<RingUse>();
            Region? rb = m > 0 ? stack[m - 1].R : null, ra = m < k ? stack[m].R : null;
            BuildLevel(levels[m], below, above, rb, ra, m > 0 ? continues[m - 1] : null, m > 0 ? stack[m - 1].Index : -1, m < k ? stack[m].Index : -1);
        }

        // Register every chain vertex first, so that wall sides know which vertices exist on their edges.
        var runs = new List<(int J0, int R0, int J1, int R1)>();
        for (int j = 0; j < k; j++)
        {
            for (int r = 0; r < rings[j].Length; r++)
            {
                if (j > 0 && IsContinuation(continues[j - 1], r)) continue;
                int jj = j, rr = r;
                while (continues[jj][rr] >= 0) { rr = continues[jj][rr]; jj++; }
                runs.Add((j, r, jj, rr));
                foreach (var p in bottom[j][r].Noded) Vertex(levels[j], p);
                foreach (var p in top[jj][rr].Noded) Vertex(levels[jj + 1], p);
            }
        }
        foreach (var (j0, r0, j1, r1) in runs) BuildWalls(levels, j0, j1 + 1, bottom[j0][r0], top[j1][r1]);
    }

    private static bool IsContinuation(int[] prevContinues, int r)
    {
        foreach (int c in prevContinues) if (c == r) return true;
        return false;
    }

    // ---- one level: noding, classification, faces ----

    private void BuildLevel(Level lv, RingUse[] below, RingUse[] above, Region? rb, Region? ra, int[]? continues, int belowLayer, int aboveLayer)
    {
        // Rings identical on both sides (same cyclic sequence, same direction) pass straight through.
        var passBelow = new int[below.Length];
        var passAbove = new int[above.Length];
        Array.Fill(passBelow, -1);
        Array.Fill(passAbove, -1);
        if (below.Length > 0 && above.Length > 0)
        {
            var byHash = new Dictionary<long, List<int>>(MixedLongComparer.Instance);
            for (int i = 0; i < above.Length; i++)
            {
                long h = CanonicalHash(above[i].Orig);
                if (!byHash.TryGetValue(h, out var l)) byHash[h] = l = new List<int>();
                l.Add(i);
            }
            for (int i = 0; i < below.Length; i++)
            {
                if (!byHash.TryGetValue(CanonicalHash(below[i].Orig), out var l)) continue;
                foreach (int a in l)
                    if (passAbove[a] < 0 && SameCycle(below[i].Orig, above[a].Orig))
                    {
                        passBelow[i] = a; passAbove[a] = i;
                        // Same start vertex on both layers, so that wall edge i means the same edge in both.
                        // (The array is shared by the layer's bottom and top uses, so both follow.)
                        Array.Copy(below[i].Orig, above[a].Orig, below[i].Orig.Length);
                        break;
                    }
            }
        }
        var activeBelow = Enumerable.Range(0, below.Length).Where(i => passBelow[i] < 0).ToList();
        var activeAbove = Enumerable.Range(0, above.Length).Where(i => passAbove[i] < 0).ToList();

        bool complex = activeBelow.Count > 0 && activeAbove.Count > 0 && Touch(below, activeBelow, above, activeAbove);
        if (!complex)
        {
            foreach (var u in below) Identity(u);
            foreach (var u in above) Identity(u);
            for (int i = 0; i < below.Length; i++) if (passBelow[i] >= 0) continues![i] = passBelow[i];
            // Whole rings go to the up face (region below minus above) or the down face (above minus below).
            var up = new List<GridPoint[]>();
            var down = new List<GridPoint[]>();
            var inAbove = activeBelow.Count > 0 && above.Length > 0 ? new ExactAreaLocator(above.Select(u => u.Orig)) : null;
            var inBelow = activeAbove.Count > 0 && below.Length > 0 ? new ExactAreaLocator(below.Select(u => u.Orig)) : null;
            foreach (int i in activeBelow)
            {
                var ring = below[i].Orig;
                if (inAbove is not null && RingInside(inAbove, ring)) down.Add(Reversed(ring));
                else up.Add(ring);
            }
            foreach (int i in activeAbove)
            {
                var ring = above[i].Orig;
                if (inBelow is not null && RingInside(inBelow, ring)) up.Add(Reversed(ring));
                else down.Add(ring);
            }
            EmitFace(lv, up, flip: false);
            EmitFace(lv, down, flip: true);
            return;
        }
        _noded = true;
        NodeAndClassify(lv, below, above, passBelow, passAbove, continues, belowLayer, aboveLayer);
    }

    private static void Identity(RingUse u)
    {
        u.Noded = u.Orig;
        u.OrigPos = new int[u.Orig.Length];
        for (int i = 0; i < u.OrigPos.Length; i++) u.OrigPos[i] = i;
    }

    /// <summary>Whether a ring that does not touch the other side's active rings lies inside the other side
    /// (the first edge whose midpoint is not on a boundary decides).</summary>
    private static bool RingInside(ExactAreaLocator loc, GridPoint[] ring)
    {
        for (int i = 0; i < ring.Length; i++)
        {
            var w = loc.LocateMidpoint(ring[i], ring[(i + 1) % ring.Length]);
            if (w != ExactAreaLocator.Where.Boundary) return w == ExactAreaLocator.Where.Inside;
        }
        throw new InvalidOperationException("a ring lies wholly on the boundary of the other layer");
    }

    private static bool Inside(ExactAreaLocator loc, GridPoint a, GridPoint b)
    {
        var w = loc.LocateMidpoint(a, b);
        if (w == ExactAreaLocator.Where.Boundary) throw new InvalidOperationException($"a noded edge overlaps the other layer's boundary {a} {b}");
        return w == ExactAreaLocator.Where.Inside;
    }

    private static GridPoint[] Reversed(GridPoint[] r)
    {
        var x = (GridPoint[])r.Clone();
        Array.Reverse(x);
        return x;
    }

    private static int CanonicalStart(GridPoint[] r)
    {
        int s = 0;
        for (int i = 1; i < r.Length; i++)
            if (r[i].X < r[s].X || (r[i].X == r[s].X && r[i].Y < r[s].Y)) s = i;
        return s;
    }

    private static long CanonicalHash(GridPoint[] r)
    {
        int s = CanonicalStart(r);
        ulong h = 1469598103934665603UL ^ (ulong)r.Length;
        for (int i = 0; i < r.Length; i++)
        {
            var p = r[(s + i) % r.Length];
            h = (h ^ (ulong)p.X) * 1099511628211UL;
            h = (h ^ (ulong)p.Y) * 1099511628211UL;
        }
        return (long)h;
    }

    private static bool SameCycle(GridPoint[] a, GridPoint[] b)
    {
        if (a.Length != b.Length) return false;
        int sa = CanonicalStart(a), sb = CanonicalStart(b);
        for (int i = 0; i < a.Length; i++) if (a[(sa + i) % a.Length] != b[(sb + i) % b.Length]) return false;
        return true;
    }

    private bool Touch(RingUse[] below, List<int> ab, RingUse[] above, List<int> aa)
    {
        var gb = _f.CreateMultiLineString(ab.Select(i => (LineString)_f.CreateLineString(Coords(below[i].Orig, true))).ToArray());
        var ga = _f.CreateMultiLineString(aa.Select(i => (LineString)_f.CreateLineString(Coords(above[i].Orig, true))).ToArray());
        if (!gb.EnvelopeInternal.Intersects(ga.EnvelopeInternal)) return false;
        return gb.Intersects(ga);
    }

    private Coordinate[] Coords(GridPoint[] r, bool closed)
    {
        var c = new Coordinate[r.Length + (closed ? 1 : 0)];
        for (int i = 0; i < r.Length; i++) c[i] = new Coordinate(r[i].X / _scale, r[i].Y / _scale);
        if (closed) c[^1] = c[0].Copy();
        return c;
    }

    /// <summary>
    /// General level: snap-round all rings of both sides together, then sort every noded edge into the up
    /// face, the down face, or neither, by which side(s) it bounds.
    /// </summary>
    private void NodeAndClassify(Level lv, RingUse[] below, RingUse[] above, int[] passBelow, int[] passAbove, int[]? continues, int belowLayer, int aboveLayer)
    {
        var inputs = new List<ISegmentString>();
        var owners = new List<(bool Below, int Index)>();
        for (int i = 0; i < below.Length; i++) { inputs.Add(new NodedSegmentString(GridCoords(below[i].Orig, true), inputs.Count)); owners.Add((true, i)); }
        for (int i = 0; i < above.Length; i++)
        {
            if (passAbove[i] >= 0) continue; // same ring as one below: noded once
            inputs.Add(new NodedSegmentString(GridCoords(above[i].Orig, true), inputs.Count));
            owners.Add((false, i));
        }
        // Snap rounding can leave a vertex on another edge when two rounded edges come close; noding the
        // output again until nothing changes gives a fully noded arrangement.
        var pieces = new List<GridPoint>[inputs.Count];
        for (int pass = 0; ; pass++)
        {
            var noder = new SnapRoundingNoder(new PrecisionModel(1.0)); // in grid units: exact integer input
            noder.ComputeNodes(inputs);
            var parts = new List<GridPoint[]>[inputs.Count];
            for (int i = 0; i < parts.Length; i++) parts[i] = new List<GridPoint[]>();
            foreach (var ss in noder.GetNodedSubstrings())
                parts[(int)ss.Context].Add(ss.Coordinates.Select(c => new GridPoint((long)Math.Floor(c.X + 0.5), (long)Math.Floor(c.Y + 0.5))).ToArray());
            for (int i = 0; i < pieces.Length; i++)
            {
                var (isBelow, idx) = owners[i];
                pieces[i] = RemoveSpikes(Chain(parts[i], FirstPoint(inputs[i])), (isBelow ? below[idx] : above[idx]).Orig);
            }
            int before = inputs.Sum(x => x.Count), after = pieces.Sum(x => x.Count);
            if (after == before || pass == 4) break;
            inputs = pieces.Select((pl, i) => (ISegmentString)new NodedSegmentString(GridCoords(Trimmed(pl), true), i)).ToList();
        }
        for (int s = 0; s < inputs.Count; s++)
        {
            var (isBelow, idx) = owners[s];
            var use = isBelow ? below[idx] : above[idx];
            SetNoded(use, pieces[s]);
            if (isBelow && passBelow[idx] >= 0)
            {
                var twin = above[passBelow[idx]];
                twin.Noded = use.Noded; twin.OrigPos = use.OrigPos; twin.Changed = use.Changed;
                if (!use.Changed) continues![idx] = passBelow[idx];
            }
        }

        // Signed use of each undirected noded edge by each side.
        var edges = new Dictionary<(long, long), (int B, int A)>();
        var uses = new Dictionary<(long, long), (int B, int A)>(); // unsigned use counts
        void Count(GridPoint[] ring, bool isBelow)
        {
            for (int i = 0; i < ring.Length; i++)
            {
                var p = ring[i]; var q = ring[(i + 1) % ring.Length];
                long kp = p.Key, kq = q.Key;
                var key = kp < kq ? (kp, kq) : (kq, kp);
                int s = kp < kq ? 1 : -1;
                edges.TryGetValue(key, out var e);
                edges[key] = isBelow ? (e.B + s, e.A) : (e.B, e.A + s);
                uses.TryGetValue(key, out var n);
                uses[key] = isBelow ? (n.B + 1, n.A) : (n.B, n.A + 1);
            }
        }
        foreach (var u in below) Count(u.Noded, true);
        foreach (var u in above) Count(u.Noded, false);
        if (_collectConflicts)
        {
            // One side using an edge both ways: two of its rings were pulled onto each other (a wall of zero
            // thickness between them).
            foreach (var (key, (nb, na)) in uses)
            {
                var (eb, ea) = edges[key];
                var p = GridPoint.FromKey(key.Item1); var q = GridPoint.FromKey(key.Item2);
                if (nb > Math.Abs(eb)) Conflicts.Add((belowLayer, p, q));
                if (na > Math.Abs(ea)) Conflicts.Add((aboveLayer, p, q));
            }
        }

        // Locate against each side's net edges: back-and-forth steps left by snap rounding cancel out.
        var locBelow = below.Length > 0 ? new ExactAreaLocator(edges.Where(kv => kv.Value.B != 0).Select(kv => (GridPoint.FromKey(kv.Key.Item1), GridPoint.FromKey(kv.Key.Item2)))) : null;
        var locAbove = above.Length > 0 ? new ExactAreaLocator(edges.Where(kv => kv.Value.A != 0).Select(kv => (GridPoint.FromKey(kv.Key.Item1), GridPoint.FromKey(kv.Key.Item2)))) : null;
        var up = new List<(GridPoint P, GridPoint Q)>();
        var down = new List<(GridPoint P, GridPoint Q)>();
        foreach (var ((k1, k2), (b, a)) in edges)
        {
            var p = GridPoint.FromKey(k1); var q = GridPoint.FromKey(k2);
            if (Math.Abs(b) > 1 || Math.Abs(a) > 1) throw new InvalidOperationException("noded rings overlap on one side");
            if (b == a) continue;
            if (b != 0 && a != 0)
            {
                // Opposite sides: the solid below and the solid above meet along this edge only.
                if (_collectConflicts) Conflicts.Add((aboveLayer, p, q));
                Add(up, p, q, b); Add(down, p, q, a); continue;
            }
            if (b != 0)
            {
                if (locAbove is not null && Inside(locAbove, p, q)) Add(down, p, q, -b); else Add(up, p, q, b);
            }
            else
            {
                if (locBelow is not null && Inside(locBelow, p, q)) Add(up, p, q, -a); else Add(down, p, q, a);
            }
        }
        EmitFace(lv, Cycles(up), flip: false);
        EmitFace(lv, Cycles(down), flip: true);

        static void Add(List<(GridPoint, GridPoint)> l, GridPoint p, GridPoint q, int s) => l.Add(s > 0 ? (p, q) : (q, p));
    }

    private static GridPoint FirstPoint(ISegmentString ss) => new((long)Math.Floor(ss.Coordinates[0].X + 0.5), (long)Math.Floor(ss.Coordinates[0].Y + 0.5));

    private static Coordinate[] GridCoords(GridPoint[] r, bool closed)
    {
        var c = new Coordinate[r.Length + (closed ? 1 : 0)];
        for (int i = 0; i < r.Length; i++) c[i] = new Coordinate(r[i].X, r[i].Y);
        if (closed) c[^1] = c[0].Copy();
        return c;
    }

    /// <summary>Joins the noded pieces of one closed ring end to start, beginning at the ring's first vertex
    /// (the noder does not promise to return them in ring order).</summary>
    private static List<GridPoint> Chain(List<GridPoint[]> parts, GridPoint start)
    {
        var byStart = new Dictionary<long, Queue<int>>(MixedLongComparer.Instance);
        for (int i = 0; i < parts.Count; i++)
        {
            if (parts[i].Length == 0) continue;
            long k = parts[i][0].Key;
            if (!byStart.TryGetValue(k, out var q)) byStart[k] = q = new Queue<int>();
            q.Enqueue(i);
        }
        var res = new List<GridPoint>();
        var at = start;
        int used = 0;
        while (used < parts.Count && byStart.TryGetValue(at.Key, out var queue) && queue.Count > 0)
        {
            var part = parts[queue.Dequeue()];
            used++;
            foreach (var g in part) if (res.Count == 0 || res[^1] != g) res.Add(g);
            at = part[^1];
            if (at == start) break;
        }
        if (used != parts.Count(p => p.Length > 0) || at != start) throw new InvalidOperationException("noded ring pieces do not close");
        return res;
    }

    /// <summary>
    /// Removes back-and-forth steps (x, y, x -> x) that snap rounding can leave where a rounded edge passes a
    /// hot pixel next to its own vertex; they carry no area and would make an edge cancel against itself.
    /// Tips that are the ring's own vertices are kept.
    /// </summary>
    private static List<GridPoint> RemoveSpikes(List<GridPoint> pts, GridPoint[] orig)
    {
        var own = new HashSet<long>(orig.Select(o => o.Key), MixedLongComparer.Instance);
        var res = new List<GridPoint>(pts.Count);
        foreach (var p in pts)
        {
            res.Add(p);
            while (res.Count >= 3 && res[^1] == res[^3] && !own.Contains(res[^2].Key)) { res.RemoveAt(res.Count - 1); res.RemoveAt(res.Count - 1); }
            while (res.Count >= 2 && res[^1] == res[^2]) res.RemoveAt(res.Count - 1);
        }
        // wrap-around spikes (the ring is closed: last point equals the first)
        bool changed = true;
        while (changed && res.Count >= 4)
        {
            changed = false;
            int n = res.Count;
            bool closed = res[0] == res[n - 1];
            int m = closed ? n - 1 : n;
            for (int i = 0; i < m && m >= 3; i++)
            {
                var a = res[(i + m - 1) % m]; var b = res[i]; var c = res[(i + 1) % m];
                if (a == c && !own.Contains(b.Key))
                {
                    var ring = res.Take(m).ToList();
                    ring.RemoveAt(i);
                    int j = i % ring.Count; // c now at j; drop the repeated a/c
                    ring.RemoveAt(j < ring.Count ? j : 0);
                    if (closed) ring.Add(ring[0]);
                    res = ring;
                    changed = true;
                    break;
                }
            }
        }
        return res;
    }

    private static GridPoint[] Trimmed(List<GridPoint> pts)
    {
        int n = pts.Count;
        while (n > 1 && pts[0] == pts[n - 1]) n--;
        return pts.Take(n).ToArray();
    }

    private static void SetNoded(RingUse use, List<GridPoint> pts)
    {
        while (pts.Count > 1 && pts[0] == pts[^1]) pts.RemoveAt(pts.Count - 1);
        var orig = use.Orig;
        var pos = new int[orig.Length];
        int j = 0;
        for (int i = 0; i < pts.Count && j < orig.Length; i++) if (pts[i] == orig[j]) pos[j++] = i;
        if (j != orig.Length) throw new InvalidOperationException("snap rounding moved a ring vertex");
        use.Noded = pts.ToArray();
        use.OrigPos = pos;
        use.Changed = pts.Count != orig.Length;
    }

    /// <summary>Closed walks of directed edges; at a vertex with several ways out, the tightest clockwise turn
    /// (so each walk bounds one face component).</summary>
    private static List<GridPoint[]> Cycles(List<(GridPoint P, GridPoint Q)> edges)
    {
        var outs = new Dictionary<long, List<int>>(MixedLongComparer.Instance);
        for (int i = 0; i < edges.Count; i++)
        {
            long k = edges[i].P.Key;
            if (!outs.TryGetValue(k, out var l)) outs[k] = l = new List<int>(1);
            l.Add(i);
        }
        var used = new bool[edges.Count];
        var res = new List<GridPoint[]>();
        for (int s = 0; s < edges.Count; s++)
        {
            if (used[s]) continue;
            var cyc = new List<GridPoint>();
            int e = s;
            while (true)
            {
                used[e] = true;
                cyc.Add(edges[e].P);
                var v = edges[e].Q;
                if (v == edges[s].P) break;
                var cand = outs[v.Key];
                int best = -1; double bestTurn = double.PositiveInfinity;
                double back = Math.Atan2(edges[e].P.Y - v.Y, edges[e].P.X - v.X);
                foreach (int c in cand)
                {
                    if (used[c]) continue;
                    double a = Math.Atan2(edges[c].Q.Y - v.Y, edges[c].Q.X - v.X);
                    double turn = back - a;
                    while (turn <= 0) turn += 2 * Math.PI;
                    while (turn > 2 * Math.PI) turn -= 2 * Math.PI;
                    if (turn < bestTurn) { bestTurn = turn; best = c; }
                }
                if (best < 0) throw new InvalidOperationException("face boundary is not closed");
                e = best;
            }
            if (cyc.Count >= 3) res.Add(cyc.ToArray());
        }
        return res;
    }

    // ---- faces ----

    private void EmitFace(Level lv, List<GridPoint[]> cycles, bool flip)
    {
        if (cycles.Count == 0) return;
        var outers = new List<(GridPoint[] R, double A, long X0, long Y0, long X1, long Y1)>();
        var holes = new List<GridPoint[]>();
        foreach (var c in cycles)
        {
            double a = SignedArea2(c);
            if (a > 0)
            {
                long x0 = c.Min(p => p.X), y0 = c.Min(p => p.Y), x1 = c.Max(p => p.X), y1 = c.Max(p => p.Y);
                outers.Add((c, a, x0, y0, x1, y1));
            }
            else if (a < 0) holes.Add(c);
        }
        var holesOf = outers.Select(_ => new List<(int[], GridPoint[])>()).ToArray();
        foreach (var h in holes)
        {
            int owner = -1;
            if (outers.Count == 1) owner = 0;
            else
            {
                long hx0 = h.Min(p => p.X), hy0 = h.Min(p => p.Y), hx1 = h.Max(p => p.X), hy1 = h.Max(p => p.Y);
                double bestArea = double.PositiveInfinity;
                for (int o = 0; o < outers.Count; o++)
                {
                    var ot = outers[o];
                    if (hx0 < ot.X0 || hy0 < ot.Y0 || hx1 > ot.X1 || hy1 > ot.Y1 || ot.A >= bestArea) continue;
                    if (ContainsMidpoint(ot.R, h[0], h[1])) { owner = o; bestArea = ot.A; }
                }
            }
            if (owner < 0) throw new InvalidOperationException("a face hole has no outer ring");
            holesOf[owner].Add((h.Select(p => Vertex(lv, p)).ToArray(), h));
        }
        for (int o = 0; o < outers.Count; o++)
        {
            var r = outers[o].R;
            // A hole that touches its outer ring at a vertex is spliced in there (the face's boundary walk
            // passes that vertex twice) instead of being bridged.
            if (holesOf[o].Count > 0)
            {
                bool again = true;
                while (again)
                {
                    again = false;
                    var keys = new Dictionary<long, int>(MixedLongComparer.Instance);
                    for (int i = 0; i < r.Length; i++) keys.TryAdd(r[i].Key, i);
                    for (int h = 0; h < holesOf[o].Count && !again; h++)
                    {
                        var hp = holesOf[o][h].Item2;
                        for (int j = 0; j < hp.Length; j++)
                        {
                            if (!keys.TryGetValue(hp[j].Key, out int k)) continue;
                            var merged = new List<GridPoint>(r.Length + hp.Length + 1);
                            for (int i = 0; i <= k; i++) merged.Add(r[i]);
                            for (int t = 1; t <= hp.Length; t++) merged.Add(hp[(j + t) % hp.Length]);
                            for (int i = k + 1; i < r.Length; i++) merged.Add(r[i]);
                            r = merged.ToArray();
                            holesOf[o].RemoveAt(h);
                            again = true;
                            break;
                        }
                    }
                }
            }
            var ids = r.Select(p => Vertex(lv, p)).ToArray();
            int start = _tris.Count;
            FaceTriangulator.Triangulate(ids, r, holesOf[o], _tris);
            if (flip)
                for (int t = start; t < _tris.Count; t += 3) (_tris[t + 1], _tris[t + 2]) = (_tris[t + 2], _tris[t + 1]);
        }
    }

    private static double SignedArea2(GridPoint[] r)
    {
        double s = 0;
        for (int i = 0, j = r.Length - 1; i < r.Length; j = i++) s += (double)r[j].X * r[i].Y - (double)r[i].X * r[j].Y;
        return s;
    }

    /// <summary>Even-odd test of the midpoint of (a, b) against a ring, exact (coordinates doubled).</summary>
    private static bool ContainsMidpoint(GridPoint[] ring, GridPoint a, GridPoint b)
    {
        long px = a.X + b.X, py = a.Y + b.Y;
        bool inside = false;
        for (int i = 0, j = ring.Length - 1; i < ring.Length; j = i++)
        {
            long xi = 2 * ring[i].X, yi = 2 * ring[i].Y, xj = 2 * ring[j].X, yj = 2 * ring[j].Y;
            if ((yi > py) != (yj > py))
            {
                // x of the crossing compared with px, without division
                long num = (xj - xi) * (py - yi), den = yj - yi;
                long lhs = (px - xi) * den;
                if (den > 0 ? lhs < num : lhs > num) inside = !inside;
            }
        }
        return inside;
    }

    // ---- walls ----

    private void BuildWalls(Level[] levels, int a, int b, RingUse bot, RingUse top)
    {
        var orig = bot.Orig;
        int n = orig.Length;
        var side = new List<int>[n];
        // Vertices on the vertical line through each ring vertex strictly between levels a and b.
        for (int i = 0; i < n; i++)
        {
            List<int>? l = null;
            long key = orig[i].Key;
            for (int m = a + 1; m < b; m++)
                if (levels[m].Ids.TryGetValue(key, out int id)) (l ??= new List<int>()).Add(id);
            side[i] = l!;
        }
        var poly = new List<int>(8);
        for (int i = 0; i < n; i++)
        {
            int i2 = (i + 1) % n;
            poly.Clear();
            // bottom chain u..v at level a
            int s0 = bot.OrigPos[i], s1 = i2 == 0 ? bot.Noded.Length : bot.OrigPos[i2];
            for (int s = s0; s < s1; s++) poly.Add(Vertex(levels[a], bot.Noded[s]));
            int vA = Vertex(levels[a], orig[i2]);
            poly.Add(vA);
            int nBottom = poly.Count;
            // up the v side
            if (side[i2] is { } sv) poly.AddRange(sv);
            // top chain v..u at level b (reversed)
            int t0 = top.OrigPos[i], t1 = i2 == 0 ? top.Noded.Length : top.OrigPos[i2];
            poly.Add(Vertex(levels[b], orig[i2]));
            for (int s = t1 - 1; s >= t0; s--) poly.Add(Vertex(levels[b], top.Noded[s]));
            // down the u side
            if (side[i] is { } su) for (int s = su.Count - 1; s >= 0; s--) poly.Add(su[s]);

            if (poly.Count == 4)
            {
                _tris.Add(poly[0]); _tris.Add(poly[1]); _tris.Add(poly[2]);
                _tris.Add(poly[0]); _tris.Add(poly[2]); _tris.Add(poly[3]);
            }
            else PanelTriangulate(poly, orig[i], orig[i2]);
        }
    }

    /// <summary>Ear clipping of a small planar wall panel in its own (along-edge, z) coordinates.</summary>
    private void PanelTriangulate(List<int> poly, GridPoint u, GridPoint v)
    {
        double dx = v.X - u.X, dy = v.Y - u.Y, len = Math.Sqrt(dx * dx + dy * dy);
        dx /= len; dy /= len;
        var s = new List<(double S, double Z, int Id)>(poly.Count);
        foreach (int id in poly)
        {
            var p = _vertices[id];
            s.Add((((p.X * _scale) - u.X) * dx + ((p.Y * _scale) - u.Y) * dy, p.Z * _scale, id));
        }
        int guard = 0;
        while (s.Count > 3)
        {
            bool clipped = false;
            for (int i = 0; i < s.Count && !clipped; i++)
            {
                var a = s[(i + s.Count - 1) % s.Count]; var b = s[i]; var c = s[(i + 1) % s.Count];
                double cross = (b.S - a.S) * (c.Z - a.Z) - (b.Z - a.Z) * (c.S - a.S);
                if (cross <= 1e-9) continue;
                bool blocked = false;
                for (int k = 0; k < s.Count && !blocked; k++)
                {
                    if (k == i || k == (i + 1) % s.Count || k == (i + s.Count - 1) % s.Count) continue;
                    var p = s[k];
                    double d1 = (b.S - a.S) * (p.Z - a.Z) - (b.Z - a.Z) * (p.S - a.S);
                    double d2 = (c.S - b.S) * (p.Z - b.Z) - (c.Z - b.Z) * (p.S - b.S);
                    double d3 = (a.S - c.S) * (p.Z - c.Z) - (a.Z - c.Z) * (p.S - c.S);
                    if (d1 >= -1e-9 && d2 >= -1e-9 && d3 >= -1e-9) blocked = true;
                }
                if (blocked) continue;
                _tris.Add(a.Id); _tris.Add(b.Id); _tris.Add(c.Id);
                s.RemoveAt(i);
                clipped = true;
            }
            if (!clipped || ++guard > 100000) throw new InvalidOperationException("wall panel triangulation failed");
        }
        _tris.Add(s[0].Id); _tris.Add(s[1].Id); _tris.Add(s[2].Id);
    }
}
