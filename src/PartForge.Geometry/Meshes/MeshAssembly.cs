using NetTopologySuite.Geometries;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;

namespace PartForge.Geometry.Meshes;

/// <summary>The working state of one <see cref="Mesher.Build"/> call.</summary>
internal sealed class MeshAssembly
{
    private readonly Precision _prec;
    private readonly double _scale;
    private readonly ChunkedBuffer<Vec3> _vertices = new();
    private readonly ChunkedBuffer<int> _tris = new();
    private readonly List<int> _faceTris = new();
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
    }

    /// <summary>A ring of one layer on one level: its (possibly noded) points and where its own vertices sit.</summary>
    private sealed class RingUse
    {
        public required GridPoint[] Orig;
        public GridPoint[] Noded = null!;
        public int[]? OrigPos;            // index in Noded of Orig[i]; null when Noded is Orig
        public int Pos(int i) => OrigPos is null ? i : OrigPos[i];
        public bool Changed;
    }

    /// <summary>
    /// The vertices of one z level: every point of the (noded) rings whose walls end or start there, known
    /// before any face or wall of the level is made. They are numbered consecutively from <see cref="Base"/>
    /// in the order of their packed keys, so a look-up is a binary search in one sorted array (8 B a vertex;
    /// a hash table of the same takes 28 to 56).
    /// </summary>
    private sealed class Level
    {
        public long Z;
        public int Base;
        public long[] Keys = Array.Empty<long>();
        // Directory over the keys' high words (the packed x; the keys sort by it first, as signed values): bucket
        // b holds the keys whose high word h has h - h0 in [b w, (b + 1) w), from index _start[b] to
        // _start[b + 1]; about 8 keys a bucket, so a look-up is a division and a short binary search (half a
        // byte a vertex).
        private int[] _start = [0, 0];
        private long _x0, _w = 1;

        public void SetKeys(long[] keys)
        {
            Keys = keys;
            if (keys.Length == 0) return;
            long x0 = keys[0] >> 32, x1 = keys[^1] >> 32;
            int buckets = Math.Max(1, keys.Length / 8);
            _x0 = x0;
            _w = Math.Max(1, (x1 - x0) / buckets + 1);
            int nb = (int)((x1 - x0) / _w) + 1;
            _start = new int[nb + 1];
            int i = 0;
            for (int b = 0; b <= nb; b++)
            {
                long xb = x0 + b * _w; // first x of bucket b
                while (i < keys.Length && (keys[i] >> 32) < xb) i++;
                _start[b] = i;
            }
            _start[nb] = keys.Length;
        }

        public bool TryGet(long key, out int id)
        {
            id = -1;
            if (Keys.Length == 0) return false;
            long x = (key >> 32) - _x0;
            if (x < 0) return false;
            long b = x / _w;
            if (b >= _start.Length - 1) return false;
            int lo = _start[b], n = _start[b + 1] - lo;
            int i = Array.BinarySearch(Keys, lo, n, key);
            if (i < 0) return false;
            id = Base + i;
            return true;
        }
    }

    /// <summary>One non-empty layer on the grid: its z range and its rings (what the mesher needs of a region).</summary>
    internal sealed record PreparedLayer(long Z0, long Z1, GridPoint[][] Rings, int Index);

    /// <summary>
    /// The rings of every layer thicker than the grid, on the grid, in z order (16 B a vertex, against about
    /// three times that for the regions, which the caller may then let go). Throws when a coordinate is
    /// beyond what float32 output can hold or when layers overlap in z after snapping.
    /// </summary>
    public List<PreparedLayer> Prepare(LayeredSolid solid)
    {
        var layers = solid.Layers.Select((l, i) => (L: l, I: i)).Where(x => !x.L.Region.IsEmpty).ToList();
        var res = new List<PreparedLayer>(layers.Count);
        if (layers.Count == 0) return res;
        CheckFloat32(layers.Select(x => x.L).ToList());
        long? lastTop = null;
        foreach (var (l, index) in layers)
        {
            long z0 = ToGrid(l.Z0), z1 = ToGrid(l.Z1);
            if (z1 <= z0) continue; // thinner than the grid: nothing to mesh
            if (lastTop is { } t && z0 < t) throw new ArgumentException("layers overlap in z after snapping to the grid");
            res.Add(new PreparedLayer(z0, z1, Rings(l.Region), index));
            lastTop = z1;
        }
        return res;
    }

    /// <summary>The mesh, or null when conflicts were collected (the caller heals and retries).</summary>
    public Mesh? Build(LayeredSolid solid) => Build(Prepare(solid));

    /// <summary>The mesh of prepared layers (their ring arrays may be reordered in place), or null when
    /// conflicts were collected.</summary>
    public Mesh? Build(List<PreparedLayer> layers)
    {
        if (layers.Count == 0) return Mesh.Empty;
        // Group touching layers into stacks (a gap in z starts a new shell).
        var stack = new List<PreparedLayer>();
        long? lastTop = null;
        foreach (var l in layers)
        {
            if (lastTop is { } t && l.Z0 != t) { BuildStack(stack); stack.Clear(); }
            stack.Add(l);
            lastTop = l.Z1;
        }
        BuildStack(stack);
        if (_collectConflicts && Conflicts.Count > 0)
        {
            // The caller heals and tries again: let go of this attempt's mesh before it does.
            _vertices.Clear();
            _tris.Clear();
            return null;
        }
        var vertices = _vertices.ToArrayAndClear();
        var mesh = new Mesh(vertices, _tris.ToArrayAndClear(), true);
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

    /// <summary>Use of one undirected edge by the two sides: signed (B, A) and unsigned (NB, NA) counts.</summary>
    private readonly record struct EdgeUse(short B, short A, short NB, short NA);

    private static int Vertex(Level lv, GridPoint p)
    {
        if (!lv.TryGet(p.Key, out int id)) throw new InvalidOperationException($"mesher: point {p} is not a vertex of level {lv.Z}");
        return id;
    }

    /// <summary>
    /// Numbers the vertices of a level: the points of the below rings that end there (no continuation) and of
    /// the above rings that start there (not a continuation), after noding.
    /// </summary>
    private void RegisterLevel(Level lv, RingUse[] below, RingUse[] above, int[]? continues)
    {
        var continued = new bool[above.Length];
        if (continues is not null) foreach (int c in continues) if (c >= 0) continued[c] = true;
        int n = 0;
        for (int i = 0; i < below.Length; i++) if (continues is null || continues[i] < 0) n += below[i].Noded.Length;
        for (int a = 0; a < above.Length; a++) if (!continued[a]) n += above[a].Noded.Length;
        var keys = new long[n];
        n = 0;
        for (int i = 0; i < below.Length; i++) if (continues is null || continues[i] < 0) foreach (var p in below[i].Noded) keys[n++] = p.Key;
        for (int a = 0; a < above.Length; a++) if (!continued[a]) foreach (var p in above[a].Noded) keys[n++] = p.Key;
        Array.Sort(keys);
        int m = 0;
        for (int i = 0; i < keys.Length; i++) if (m == 0 || keys[i] != keys[m - 1]) keys[m++] = keys[i];
        if (m != keys.Length) Array.Resize(ref keys, m);
        lv.SetKeys(keys);
        lv.Base = _vertices.Count;
        foreach (long k in keys)
        {
            var p = GridPoint.FromKey(k);
            _vertices.Add(new Vec3(p.X / _scale, p.Y / _scale, lv.Z / _scale));
        }
    }

    // ------------------------------------------------------------------------------------------------

    private void BuildStack(List<PreparedLayer> stack)
    {
        int k = stack.Count;
        if (k == 0) return;
        var rings = stack.Select(s => s.Rings).ToArray();
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
            BuildLevel(levels[m], below, above, m > 0 ? continues[m - 1] : null, m > 0 ? stack[m - 1].Index : -1, m < k ? stack[m].Index : -1);
        }

        // Walls: one run per ring from the level where it starts to the level where it ends.
        var runs = new List<(int J0, int R0, int J1, int R1)>();
        for (int j = 0; j < k; j++)
        {
            for (int r = 0; r < rings[j].Length; r++)
            {
                if (j > 0 && IsContinuation(continues[j - 1], r)) continue;
                int jj = j, rr = r;
                while (continues[jj][rr] >= 0) { rr = continues[jj][rr]; jj++; }
                runs.Add((j, r, jj, rr));
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

    private void BuildLevel(Level lv, RingUse[] below, RingUse[] above, int[]? continues, int belowLayer, int aboveLayer)
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
            RegisterLevel(lv, below, above, continues);
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
        u.OrigPos = null; // identity
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

    /// <summary>Whether an active ring below and an active ring above have a point in common (exact, on the grid).</summary>
    private static bool Touch(RingUse[] below, List<int> ab, RingUse[] above, List<int> aa)
    {
        var rings = new List<GridPoint[]>(ab.Count + aa.Count);
        foreach (int i in ab) rings.Add(below[i].Orig);
        foreach (int i in aa) rings.Add(above[i].Orig);
        int nb = ab.Count;
        bool touch = false;
        SegmentSweep.ForEachNearPair(rings, 0, (r1, s1, r2, s2) =>
        {
            if ((r1 < nb) == (r2 < nb)) return true; // same side
            var p = rings[r1]; var q = rings[r2];
            touch = SegmentSweep.SegmentsMeet(p[s1], p[(s1 + 1) % p.Length], q[s2], q[(s2 + 1) % q.Length]);
            return !touch;
        });
        return touch;
    }

    /// <summary>
    /// General level: snap-round all rings of both sides together, then sort every noded edge into the up
    /// face, the down face, or neither, by which side(s) it bounds.
    /// </summary>
    private void NodeAndClassify(Level lv, RingUse[] below, RingUse[] above, int[] passBelow, int[] passAbove, int[]? continues, int belowLayer, int aboveLayer)
    {
        var rings = new List<GridPoint[]>();
        var owners = new List<(bool Below, int Index)>();
        for (int i = 0; i < below.Length; i++) { rings.Add(below[i].Orig); owners.Add((true, i)); }
        for (int i = 0; i < above.Length; i++)
        {
            if (passAbove[i] >= 0) continue; // same ring as one below: noded once
            rings.Add(above[i].Orig);
            owners.Add((false, i));
        }
        // Snap rounding can leave a vertex on another edge when two rounded edges come close; noding the
        // output again until nothing changes gives a fully noded arrangement. Only the segments near another
        // boundary go through the noder (LocalSnapNoder).
        var pieces = new List<GridPoint>[rings.Count];
        for (int pass = 0; ; pass++)
        {
            var noded = LocalSnapNoder.Node(rings, out _);
            for (int i = 0; i < pieces.Length; i++)
            {
                var (isBelow, idx) = owners[i];
                pieces[i] = RemoveSpikes(noded[i], (isBelow ? below[idx] : above[idx]).Orig);
            }
            int before = rings.Sum(x => x.Length + 1), after = pieces.Sum(x => x.Count);
            if (after == before || pass == 4) break;
            rings = pieces.Select(Trimmed).ToList();
        }
        for (int s = 0; s < pieces.Length; s++)
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
        RegisterLevel(lv, below, above, continues);

        // Signed and unsigned use of each undirected noded edge by each side (one table, 8 bytes of counts an
        // edge), keyed by its two end points in key order.
        var edges = new Dictionary<(long, long), EdgeUse>();
        void Count(GridPoint[] ring, bool isBelow)
        {
            for (int i = 0; i < ring.Length; i++)
            {
                long kp = ring[i].Key, kq = ring[(i + 1) % ring.Length].Key;
                var key = kp < kq ? (kp, kq) : (kq, kp);
                short s = (short)(kp < kq ? 1 : -1);
                edges.TryGetValue(key, out var e);
                edges[key] = isBelow ? e with { B = (short)(e.B + s), NB = (short)(e.NB + 1) } : e with { A = (short)(e.A + s), NA = (short)(e.NA + 1) };
            }
        }
        foreach (var u in below) Count(u.Noded, true);
        foreach (var u in above) Count(u.Noded, false);
        static GridPoint End((long, long) key, bool second) => GridPoint.FromKey(second ? key.Item2 : key.Item1);
        if (_collectConflicts)
        {
            // One side using an edge both ways: two of its rings were pulled onto each other (a wall of zero
            // thickness between them).
            foreach (var (key, e) in edges)
            {
                var p = End(key, false); var q = End(key, true);
                if (e.NB > Math.Abs(e.B)) Conflicts.Add((belowLayer, p, q));
                if (e.NA > Math.Abs(e.A)) Conflicts.Add((aboveLayer, p, q));
            }
        }

        // Locate against each side's net edges: back-and-forth steps left by snap rounding cancel out.
        var locBelow = below.Length > 0 ? new ExactAreaLocator(edges.Where(kv => kv.Value.B != 0).Select(kv => (End(kv.Key, false), End(kv.Key, true)))) : null;
        var locAbove = above.Length > 0 ? new ExactAreaLocator(edges.Where(kv => kv.Value.A != 0).Select(kv => (End(kv.Key, false), End(kv.Key, true)))) : null;
        var up = new List<(GridPoint P, GridPoint Q)>();
        var down = new List<(GridPoint P, GridPoint Q)>();
        foreach (var (key, e) in edges)
        {
            var p = End(key, false); var q = End(key, true);
            int b = e.B, a = e.A;
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
        edges = null!;
        locBelow = locAbove = null;
        EmitFace(lv, Cycles(up), flip: false);
        EmitFace(lv, Cycles(down), flip: true);

        static void Add(List<(GridPoint, GridPoint)> l, GridPoint p, GridPoint q, int s) => l.Add(s > 0 ? (p, q) : (q, p));
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
        // Edges by start point (then by index): the ways out of a point are one run of `order`.
        var startKey = new long[edges.Count];
        var order = new int[edges.Count];
        for (int i = 0; i < edges.Count; i++) { startKey[i] = edges[i].P.Key; order[i] = i; }
        Array.Sort(order, (x, y) => { int c = startKey[x].CompareTo(startKey[y]); return c != 0 ? c : x.CompareTo(y); });
        var sortedKey = new long[edges.Count];
        for (int i = 0; i < order.Length; i++) sortedKey[i] = startKey[order[i]];
        startKey = null!;
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
                int lo = LowerBound(sortedKey, v.Key);
                int best = -1; double bestTurn = double.PositiveInfinity;
                double back = Math.Atan2(edges[e].P.Y - v.Y, edges[e].P.X - v.X);
                for (int o = lo; o < sortedKey.Length && sortedKey[o] == v.Key; o++)
                {
                    int c = order[o];
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

    /// <summary>First index whose key is at least <paramref name="key"/> in a sorted array.</summary>
    private static int LowerBound(long[] sorted, long key)
    {
        int lo = 0, hi = sorted.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >>> 1;
            if (sorted[mid] < key) lo = mid + 1; else hi = mid;
        }
        return lo;
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
            _faceTris.Clear();
            FaceTriangulator.Triangulate(ids, r, holesOf[o], _faceTris);
            if (flip)
                for (int t = 0; t < _faceTris.Count; t += 3) (_faceTris[t + 1], _faceTris[t + 2]) = (_faceTris[t + 2], _faceTris[t + 1]);
            _tris.AddRange(_faceTris);
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
                if (levels[m].TryGet(key, out int id)) (l ??= new List<int>()).Add(id);
            side[i] = l!;
        }
        var poly = new List<int>(8);
        for (int i = 0; i < n; i++)
        {
            int i2 = (i + 1) % n;
            poly.Clear();
            // bottom chain u..v at level a
            int s0 = bot.Pos(i), s1 = i2 == 0 ? bot.Noded.Length : bot.Pos(i2);
            for (int s = s0; s < s1; s++) poly.Add(Vertex(levels[a], bot.Noded[s]));
            int vA = Vertex(levels[a], orig[i2]);
            poly.Add(vA);
            int nBottom = poly.Count;
            // up the v side
            if (side[i2] is { } sv) poly.AddRange(sv);
            // top chain v..u at level b (reversed)
            int t0 = top.Pos(i), t1 = i2 == 0 ? top.Noded.Length : top.Pos(i2);
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
