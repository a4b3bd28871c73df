namespace PartForge.Geometry.Meshes;

/// <summary>
/// Triangulates one planar face (an outer ring with holes, grid coordinates) without adding or dropping a
/// boundary vertex, so that the face meets its walls edge for edge. Ear clipping (shortest new diagonal first) with a uniform grid of
/// the reflex vertices and holes bridged to the outer ring by the leftmost-vertex method (after the well-known
/// "earcut" scheme), in exact integer arithmetic. Collinear vertices may be skipped while clipping; each is
/// put back afterwards by splitting the one triangle whose edge it lies on, so no T-junction remains.
/// Strictly convex rings without holes get a balanced recursive split instead (no long slivers).
/// Output triangles are counter-clockwise (seen from +z) when the outer ring is counter-clockwise.
/// </summary>
internal sealed class FaceTriangulator
{
    private sealed class Node
    {
        public int I;           // mesh vertex id
        public double X, Y;     // exact integers stored as double (|v| < 2^31, products < 2^62 are not needed)
        public Node Prev = null!, Next = null!;
        public bool Removed;
        public int Version;
    }

    private readonly List<int> _out;
    private readonly List<(int Prev, int V, int Next)> _removed = new();
    private bool _useGrid;
    private int _start;

    private FaceTriangulator(List<int> output) => _out = output;

    /// <summary>Appends the triangles of the face to <paramref name="output"/> (3 vertex ids each).</summary>
    public static void Triangulate(IReadOnlyList<int> outerIds, IReadOnlyList<GridPoint> outer,
        IReadOnlyList<(int[] Ids, GridPoint[] Pts)> holes, List<int> output)
    {
        var t = new FaceTriangulator(output) { _start = output.Count };
        if (holes.Count == 0 && TryConvex(outerIds, outer, output)) return;
        t.Run(outerIds, outer, holes);
    }

    private static bool TryConvex(IReadOnlyList<int> ids, IReadOnlyList<GridPoint> p, List<int> output)
    {
        int n = p.Count;
        if (n < 3) return false;
        for (int i = 0; i < n; i++)
            if (GridPoint.Orient(p[(i + n - 1) % n], p[i], p[(i + 1) % n]) <= 0) return false;
        // Strictly convex: any three vertices make a proper triangle. Split in three, then halve recursively.
        int a = 0, b = n / 3, c = 2 * n / 3;
        output.Add(ids[a]); output.Add(ids[b]); output.Add(ids[c]);
        Halve(ids, a, b, output);
        Halve(ids, b, c, output);
        Halve(ids, c, n, output);
        return true;

        static void Halve(IReadOnlyList<int> ids, int i, int j, List<int> output)
        {
            // chain i..j (j may equal n, meaning vertex 0)
            var stack = new Stack<(int, int)>();
            stack.Push((i, j));
            while (stack.Count > 0)
            {
                var (s, e) = stack.Pop();
                if (e - s < 2) continue;
                int m = (s + e) / 2;
                output.Add(ids[s]); output.Add(ids[m]); output.Add(ids[e % ids.Count]);
                stack.Push((s, m));
                stack.Push((m, e));
            }
        }
    }

    private void Run(IReadOnlyList<int> outerIds, IReadOnlyList<GridPoint> outer, IReadOnlyList<(int[] Ids, GridPoint[] Pts)> holes)
    {
        var outerNode = LinkedList(outerIds, outer, ccw: true);
        if (outerNode is null || outerNode.Next == outerNode.Prev) return;
        int total = outer.Count;
        if (holes.Count > 0)
        {
            var queue = new List<Node>();
            foreach (var (ids, pts) in holes)
            {
                var list = LinkedList(ids, pts, ccw: false);
                if (list is null) continue;
                total += pts.Length;
                queue.Add(Leftmost(list));
            }
            queue.Sort((a, b) => a.X != b.X ? a.X.CompareTo(b.X) : a.Y.CompareTo(b.Y));
            foreach (var h in queue) outerNode = EliminateHole(h, outerNode);
        }
        _useGrid = total > 64;
        EarcutLinked(outerNode, 0);
        PutBackRemoved();
    }

    // ---- linked list ----

    private static Node? LinkedList(IReadOnlyList<int> ids, IReadOnlyList<GridPoint> pts, bool ccw)
    {
        long area2 = 0;
        int n = pts.Count;
        for (int i = 0, j = n - 1; i < n; j = i++) area2 += pts[j].X * pts[i].Y - pts[i].X * pts[j].Y;
        Node? last = null;
        if (ccw == (area2 > 0)) for (int i = 0; i < n; i++) last = Insert(ids[i], pts[i], last);
        else for (int i = n - 1; i >= 0; i--) last = Insert(ids[i], pts[i], last);
        if (last is not null && Equal(last, last.Next)) { Remove(last); last = last.Next; }
        return last;
    }

    private static Node Insert(int id, GridPoint p, Node? last)
    {
        var node = new Node { I = id, X = p.X, Y = p.Y };
        if (last is null) { node.Prev = node; node.Next = node; }
        else { node.Next = last.Next; node.Prev = last; last.Next.Prev = node; last.Next = node; }
        return node;
    }

    private static void Remove(Node p)
    {
        p.Removed = true;
        p.Next.Prev = p.Prev;
        p.Prev.Next = p.Next;
    }

    private static bool Equal(Node a, Node b) => a.X == b.X && a.Y == b.Y;

    /// <summary>Negative for a left (convex, counter-clockwise) turn, as in the original scheme.</summary>
    private static double Area(Node p, Node q, Node r) => (q.Y - p.Y) * (r.X - q.X) - (q.X - p.X) * (r.Y - q.Y);

    private static Node Leftmost(Node start)
    {
        Node p = start, left = start;
        do { if (p.X < left.X || (p.X == left.X && p.Y < left.Y)) left = p; p = p.Next; } while (p != start);
        return left;
    }

    /// <summary>
    /// Removes coincident neighbours, and collinear vertices that lie strictly between their neighbours
    /// (recorded, to be put back by a split). Spikes are kept.
    /// </summary>
    private Node? FilterPoints(Node? start, Node? end = null)
    {
        if (start is null) return null;
        end ??= start;
        Node p = start;
        bool again;
        do
        {
            again = false;
            bool dup = Equal(p, p.Next);
            bool between = !dup && Area(p.Prev, p, p.Next) == 0 && StrictlyBetween(p.Prev, p, p.Next);
            if (dup || between)
            {
                if (between) _removed.Add((p.Prev.I, p.I, p.Next.I));
                else if (p.I != p.Next.I) _removed.Add((p.Prev.I, p.I, p.Next.I)); // coincident but distinct ids: never happens on one level
                Remove(p);
                p = end = p.Prev;
                if (p == p.Next) break;
                again = true;
            }
            else p = p.Next;
        } while (again || p != end);
        return end;
    }

    private static bool StrictlyBetween(Node a, Node p, Node b)
    {
        double dx = b.X - a.X, dy = b.Y - a.Y;
        double t = (p.X - a.X) * dx + (p.Y - a.Y) * dy;
        return t > 0 && t < dx * dx + dy * dy;
    }

    // ---- ear clipping ----

    /// <summary>
    /// Clips the ear with the shortest new diagonal first (a priority queue of candidate convex vertices),
    /// instead of walking round the ring. Only the two neighbours of a clipped ear change, so the many reflex
    /// vertices of holes are not re-tested after every cut, and small ears keep the hash look-ups local and
    /// the triangles compact. When the queue runs dry the ring is scanned again; a scan without a cut falls
    /// back to filtering collinear vertices and then to splitting along a diagonal.
    /// </summary>
    private void EarcutLinked(Node? ear, int pass)
    {
        if (ear is null) return;
        if (_useGrid) BuildGrid(ear);
        var work = new PriorityQueue<(Node N, int Version), double>();
        Node live = ear;
        bool clippedSinceScan = true;
        void Offer(Node n)
        {
            n.Version++;
            if (Area(n.Prev, n, n.Next) < 0)
            {
                double dx = n.Next.X - n.Prev.X, dy = n.Next.Y - n.Prev.Y;
                work.Enqueue((n, n.Version), dx * dx + dy * dy);
            }
        }
        while (live.Prev != live.Next)
        {
            if (work.Count == 0)
            {
                if (!clippedSinceScan)
                {
                    if (pass == 0) EarcutLinked(FilterPoints(live), 1);
                    else if (!SplitEarcut(live)) throw new InvalidOperationException("face triangulation found no ear (invalid face boundary)");
                    return;
                }
                clippedSinceScan = false;
                Node p = live;
                do { Offer(p); p = p.Next; } while (p != live);
                if (work.Count == 0) continue;
            }
            var (e, version) = work.Dequeue();
            if (e.Removed || version != e.Version) continue;
            if (_useGrid ? IsEarGrid(e) : IsEar(e))
            {
                Node prev = e.Prev, next = e.Next;
                _out.Add(prev.I); _out.Add(e.I); _out.Add(next.I);
                Remove(e);
                clippedSinceScan = true;
                live = next;
                Offer(prev);
                Offer(next);
            }
        }
    }

    private bool IsEar(Node ear)
    {
        Node a = ear.Prev, b = ear, c = ear.Next;
        if (Area(a, b, c) >= 0) return false;
        double x0 = Math.Min(a.X, Math.Min(b.X, c.X)), y0 = Math.Min(a.Y, Math.Min(b.Y, c.Y));
        double x1 = Math.Max(a.X, Math.Max(b.X, c.X)), y1 = Math.Max(a.Y, Math.Max(b.Y, c.Y));
        for (Node p = c.Next; p != a; p = p.Next)
            if (p.X >= x0 && p.X <= x1 && p.Y >= y0 && p.Y <= y1 && Blocks(a, b, c, p)) return false;
        return true;
    }

    // ---- uniform grid of the reflex (and straight) vertices: the only ones that can block an ear ----

    private Node[] _cellNodes = Array.Empty<Node>();
    private int[] _cellStart = Array.Empty<int>();
    private int _gx, _gy;
    private double _gx0, _gy0, _cell;

    private void BuildGrid(Node start)
    {
        var reflex = new List<Node>();
        double x0 = double.PositiveInfinity, y0 = x0, x1 = double.NegativeInfinity, y1 = x1;
        Node p = start;
        do
        {
            x0 = Math.Min(x0, p.X); y0 = Math.Min(y0, p.Y); x1 = Math.Max(x1, p.X); y1 = Math.Max(y1, p.Y);
            if (Area(p.Prev, p, p.Next) >= 0) reflex.Add(p);
            p = p.Next;
        } while (p != start);
        double w = Math.Max(x1 - x0, 1), h = Math.Max(y1 - y0, 1);
        // About two reflex vertices per cell on average.
        double cells = Math.Clamp(reflex.Count / 2.0, 1, 1 << 20);
        _cell = Math.Max(Math.Sqrt(w * h / cells), 1);
        _gx = Math.Min((int)(w / _cell) + 1, 4096);
        _gy = Math.Min((int)(h / _cell) + 1, 4096);
        _cell = Math.Max(w / (_gx - 0.5), h / (_gy - 0.5));
        _gx0 = x0; _gy0 = y0;
        var count = new int[_gx * _gy + 1];
        foreach (var n in reflex) count[CellOf(n.X, n.Y) + 1]++;
        for (int i = 1; i < count.Length; i++) count[i] += count[i - 1];
        _cellStart = (int[])count.Clone();
        _cellNodes = new Node[reflex.Count];
        foreach (var n in reflex) _cellNodes[count[CellOf(n.X, n.Y)]++] = n;
    }

    private int CellOf(double x, double y)
    {
        int cx = Math.Clamp((int)((x - _gx0) / _cell), 0, _gx - 1);
        int cy = Math.Clamp((int)((y - _gy0) / _cell), 0, _gy - 1);
        return cy * _gx + cx;
    }

    private bool IsEarGrid(Node ear)
    {
        Node a = ear.Prev, b = ear, c = ear.Next;
        if (Area(a, b, c) >= 0) return false;
        double x0 = Math.Min(a.X, Math.Min(b.X, c.X)), y0 = Math.Min(a.Y, Math.Min(b.Y, c.Y));
        double x1 = Math.Max(a.X, Math.Max(b.X, c.X)), y1 = Math.Max(a.Y, Math.Max(b.Y, c.Y));
        int cx0 = Math.Clamp((int)((x0 - _gx0) / _cell), 0, _gx - 1), cx1 = Math.Clamp((int)((x1 - _gx0) / _cell), 0, _gx - 1);
        int cy0 = Math.Clamp((int)((y0 - _gy0) / _cell), 0, _gy - 1), cy1 = Math.Clamp((int)((y1 - _gy0) / _cell), 0, _gy - 1);
        bool cull = (cx1 - cx0 + 1) * (cy1 - cy0 + 1) > 4;
        for (int cy = cy0; cy <= cy1; cy++)
        {
            for (int cx = cx0; cx <= cx1; cx++)
            {
                int ci = cy * _gx + cx;
                int s0 = _cellStart[ci], s1 = _cellStart[ci + 1];
                if (s0 == s1) continue;
                if (cull && CellOutside(a, b, c, _gx0 + cx * _cell, _gy0 + cy * _cell, _cell)) continue;
                for (int k = s0; k < s1; k++)
                {
                    var p = _cellNodes[k];
                    if (p.Removed || p == a || p == c) continue;
                    if (p.X < x0 || p.X > x1 || p.Y < y0 || p.Y > y1) continue;
                    if (Blocks(a, b, c, p)) return false;
                }
            }
        }
        return true;
    }

    /// <summary>True when the cell square lies wholly outside one edge of the counter-clockwise triangle.</summary>
    private static bool CellOutside(Node a, Node b, Node c, double x, double y, double size)
    {
        return Right(a, b) || Right(b, c) || Right(c, a);

        bool Right(Node p, Node q)
        {
            double ex = q.X - p.X, ey = q.Y - p.Y;
            // left-of test: ex*(y - p.Y) - ey*(x - p.X) > 0 means left; the cell is outside if every corner is right.
            double m = double.NegativeInfinity;
            m = Math.Max(m, ex * (y - p.Y) - ey * (x - p.X));
            m = Math.Max(m, ex * (y - p.Y) - ey * (x + size - p.X));
            m = Math.Max(m, ex * (y + size - p.Y) - ey * (x - p.X));
            m = Math.Max(m, ex * (y + size - p.Y) - ey * (x + size - p.X));
            return m < 0;
        }
    }

    /// <summary>
    /// Whether vertex p forbids clipping ear (a, b, c): it lies in the closed triangle (a coincident copy of a
    /// excepted) and is reflex or straight, or it lies on the new diagonal a-c (which would leave a T-junction).
    /// </summary>
    private static bool Blocks(Node a, Node b, Node c, Node p)
    {
        if (p == b) return false;
        if (p.X == a.X && p.Y == a.Y) return false;
        if (!PointInTriangle(a.X, a.Y, b.X, b.Y, c.X, c.Y, p.X, p.Y)) return false;
        if (Area(p.Prev, p, p.Next) >= 0) return true;
        if (p.X == c.X && p.Y == c.Y) return false;
        return Area(a, c, p) == 0; // on the diagonal
    }

    private static bool PointInTriangle(double ax, double ay, double bx, double by, double cx, double cy, double px, double py) =>
        (cx - px) * (ay - py) >= (ax - px) * (cy - py) &&
        (ax - px) * (by - py) >= (bx - px) * (ay - py) &&
        (bx - px) * (cy - py) >= (cx - px) * (by - py);

    private bool SplitEarcut(Node start)
    {
        Node a = start;
        do
        {
            Node b = a.Next.Next;
            while (b != a.Prev)
            {
                if (a.I != b.I && IsValidDiagonal(a, b))
                {
                    Node c = SplitPolygon(a, b);
                    a = FilterPoints(a, a.Next)!;
                    c = FilterPoints(c, c.Next)!;
                    EarcutLinked(a, 0);
                    EarcutLinked(c, 0);
                    return true;
                }
                b = b.Next;
            }
            a = a.Next;
        } while (a != start);
        return false;
    }

    private static bool IsValidDiagonal(Node a, Node b) =>
        a.Next.I != b.I && a.Prev.I != b.I && !IntersectsPolygon(a, b) &&
        LocallyInside(a, b) && LocallyInside(b, a) && MiddleInside(a, b) &&
        (Area(a.Prev, a, b.Prev) != 0 || Area(a, b.Prev, b) != 0);

    private static bool IntersectsPolygon(Node a, Node b)
    {
        Node p = a;
        do
        {
            if (p.I != a.I && p.Next.I != a.I && p.I != b.I && p.Next.I != b.I && Intersects(p, p.Next, a, b)) return true;
            p = p.Next;
        } while (p != a);
        return false;
    }

    private static bool Intersects(Node p1, Node q1, Node p2, Node q2)
    {
        int o1 = Math.Sign(Area(p1, q1, p2)), o2 = Math.Sign(Area(p1, q1, q2));
        int o3 = Math.Sign(Area(p2, q2, p1)), o4 = Math.Sign(Area(p2, q2, q1));
        if (o1 != o2 && o3 != o4) return true;
        if (o1 == 0 && OnSegment(p1, p2, q1)) return true;
        if (o2 == 0 && OnSegment(p1, q2, q1)) return true;
        if (o3 == 0 && OnSegment(p2, p1, q2)) return true;
        if (o4 == 0 && OnSegment(p2, q1, q2)) return true;
        return false;
    }

    private static bool OnSegment(Node p, Node q, Node r) =>
        q.X <= Math.Max(p.X, r.X) && q.X >= Math.Min(p.X, r.X) && q.Y <= Math.Max(p.Y, r.Y) && q.Y >= Math.Min(p.Y, r.Y);

    private static bool LocallyInside(Node a, Node b) =>
        Area(a.Prev, a, a.Next) < 0
            ? Area(a, b, a.Next) >= 0 && Area(a, a.Prev, b) >= 0
            : Area(a, b, a.Prev) < 0 || Area(a, a.Next, b) < 0;

    private static bool MiddleInside(Node a, Node b)
    {
        Node p = a;
        bool inside = false;
        double px = (a.X + b.X) / 2, py = (a.Y + b.Y) / 2;
        do
        {
            if (((p.Y > py) != (p.Next.Y > py)) && p.Next.Y != p.Y && (px < (p.Next.X - p.X) * (py - p.Y) / (p.Next.Y - p.Y) + p.X))
                inside = !inside;
            p = p.Next;
        } while (p != a);
        return inside;
    }

    private static Node SplitPolygon(Node a, Node b)
    {
        var a2 = new Node { I = a.I, X = a.X, Y = a.Y };
        var b2 = new Node { I = b.I, X = b.X, Y = b.Y };
        Node an = a.Next, bp = b.Prev;
        a.Next = b; b.Prev = a;
        a2.Next = an; an.Prev = a2;
        b2.Next = a2; a2.Prev = b2;
        bp.Next = b2; b2.Prev = bp;
        return b2;
    }

    // ---- holes ----

    private Node EliminateHole(Node hole, Node outerNode)
    {
        var bridge = FindHoleBridge(hole, outerNode);
        if (bridge is null) throw new InvalidOperationException("a hole of a face lies outside its outer ring");
        var bridgeReverse = SplitPolygon(bridge, hole);
        FilterPoints(bridgeReverse, bridgeReverse.Next);
        return FilterPoints(bridge, bridge.Next)!;
    }

    private static Node? FindHoleBridge(Node hole, Node outerNode)
    {
        Node p = outerNode;
        double hx = hole.X, hy = hole.Y, qx = double.NegativeInfinity;
        Node? m = null;
        if (Equal(hole, p)) return p;
        do
        {
            if (Equal(hole, p.Next)) return p.Next;
            if (hy <= p.Y && hy >= p.Next.Y && p.Next.Y != p.Y)
            {
                double x = p.X + (hy - p.Y) * (p.Next.X - p.X) / (p.Next.Y - p.Y);
                if (x <= hx && x > qx)
                {
                    qx = x;
                    m = p.X < p.Next.X ? p : p.Next;
                    if (x == hx) return m;
                }
            }
            p = p.Next;
        } while (p != outerNode);
        if (m is null) return null;
        Node stop = m;
        double mx = m.X, my = m.Y, tanMin = double.PositiveInfinity;
        p = m;
        do
        {
            if (hx >= p.X && p.X >= mx && hx != p.X &&
                PointInTriangle(hy < my ? hx : qx, hy, mx, my, hy < my ? qx : hx, hy, p.X, p.Y))
            {
                double tan = Math.Abs(hy - p.Y) / (hx - p.X);
                if (LocallyInside(p, hole) && (tan < tanMin || (tan == tanMin && (p.X > m.X || (p.X == m.X && SectorContainsSector(m, p))))))
                {
                    m = p;
                    tanMin = tan;
                }
            }
            p = p.Next;
        } while (p != stop);
        return m;
    }

    private static bool SectorContainsSector(Node m, Node p) => Area(m.Prev, m, p.Prev) < 0 && Area(p.Next, m, m.Next) < 0;

    // ---- T-junction repair ----

    private void PutBackRemoved()
    {
        if (_removed.Count == 0) return;
        var byEdge = new Dictionary<long, int>(MixedLongComparer.Instance);
        for (int t = _start; t < _out.Count; t += 3)
            for (int k = 0; k < 3; k++) byEdge[EdgeKey(_out[t + k], _out[t + (k + 1) % 3])] = t;
        for (int r = _removed.Count - 1; r >= 0; r--)
        {
            var (u, v, w) = _removed[r];
            if (u == v || v == w) continue;
            if (!byEdge.TryGetValue(EdgeKey(u, w), out int t))
                throw new InvalidOperationException("face triangulation lost a boundary vertex");
            // Triangle (u, w, x) in some rotation: find x.
            int k0 = _out[t] == u ? 0 : _out[t + 1] == u ? 1 : 2;
            int x = _out[t + (k0 + 2) % 3];
            byEdge.Remove(EdgeKey(u, w));
            _out[t] = u; _out[t + 1] = v; _out[t + 2] = x;
            int t2 = _out.Count;
            _out.Add(v); _out.Add(w); _out.Add(x);
            byEdge[EdgeKey(u, v)] = t; byEdge[EdgeKey(v, x)] = t; byEdge[EdgeKey(x, u)] = t;
            byEdge[EdgeKey(v, w)] = t2; byEdge[EdgeKey(w, x)] = t2; byEdge[EdgeKey(x, v)] = t2;
        }
    }

    private static long EdgeKey(int a, int b) => ((long)a << 32) | (uint)b;
}
