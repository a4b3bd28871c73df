namespace PartForge.Geometry.Meshes;

/// <summary>
/// Triangulates one planar face (an outer ring with holes, grid coordinates) without adding or dropping a
/// boundary vertex, so that the face meets its walls edge for edge. Ear clipping with a z-order hash of the
/// vertices and holes bridged to the outer ring by the leftmost-vertex method (after the well-known
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
        public int Z;
        public bool HasZ;
        public Node? PrevZ, NextZ;
    }

    private readonly List<int> _out;
    private readonly List<(int Prev, int V, int Next)> _removed = new();
    private double _minX, _minY, _invSize;
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
        if (total > 80)
        {
            double x0 = double.PositiveInfinity, y0 = x0, x1 = double.NegativeInfinity, y1 = x1;
            var p = outerNode;
            do { x0 = Math.Min(x0, p.X); y0 = Math.Min(y0, p.Y); x1 = Math.Max(x1, p.X); y1 = Math.Max(y1, p.Y); p = p.Next; } while (p != outerNode);
            _minX = x0; _minY = y0;
            double size = Math.Max(x1 - x0, y1 - y0);
            _invSize = size != 0 ? 32767 / size : 0;
        }
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
        p.Next.Prev = p.Prev;
        p.Prev.Next = p.Next;
        if (p.PrevZ is not null) p.PrevZ.NextZ = p.NextZ;
        if (p.NextZ is not null) p.NextZ.PrevZ = p.PrevZ;
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

    private void EarcutLinked(Node? ear, int pass)
    {
        if (ear is null) return;
        if (pass == 0 && _invSize != 0) IndexCurve(ear);
        Node stop = ear;
        while (ear.Prev != ear.Next)
        {
            Node prev = ear.Prev, next = ear.Next;
            if (_invSize != 0 ? IsEarHashed(ear) : IsEar(ear))
            {
                _out.Add(prev.I); _out.Add(ear.I); _out.Add(next.I);
                Remove(ear);
                ear = next.Next;
                stop = next.Next;
                continue;
            }
            ear = next;
            if (ear == stop)
            {
                if (pass == 0) EarcutLinked(FilterPoints(ear), 1);
                else if (!SplitEarcut(ear)) throw new InvalidOperationException("face triangulation found no ear (invalid face boundary)");
                break;
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

    private bool IsEarHashed(Node ear)
    {
        Node a = ear.Prev, b = ear, c = ear.Next;
        if (Area(a, b, c) >= 0) return false;
        double x0 = Math.Min(a.X, Math.Min(b.X, c.X)), y0 = Math.Min(a.Y, Math.Min(b.Y, c.Y));
        double x1 = Math.Max(a.X, Math.Max(b.X, c.X)), y1 = Math.Max(a.Y, Math.Max(b.Y, c.Y));
        int minZ = ZOrder(x0, y0), maxZ = ZOrder(x1, y1);
        Node? p = ear.PrevZ, n = ear.NextZ;
        while (p is not null && p.Z >= minZ && n is not null && n.Z <= maxZ)
        {
            if (p.X >= x0 && p.X <= x1 && p.Y >= y0 && p.Y <= y1 && p != a && p != c && Blocks(a, b, c, p)) return false;
            p = p.PrevZ;
            if (n.X >= x0 && n.X <= x1 && n.Y >= y0 && n.Y <= y1 && n != a && n != c && Blocks(a, b, c, n)) return false;
            n = n.NextZ;
        }
        while (p is not null && p.Z >= minZ)
        {
            if (p.X >= x0 && p.X <= x1 && p.Y >= y0 && p.Y <= y1 && p != a && p != c && Blocks(a, b, c, p)) return false;
            p = p.PrevZ;
        }
        while (n is not null && n.Z <= maxZ)
        {
            if (n.X >= x0 && n.X <= x1 && n.Y >= y0 && n.Y <= y1 && n != a && n != c && Blocks(a, b, c, n)) return false;
            n = n.NextZ;
        }
        return true;
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

    // ---- z-order hash ----

    private int ZOrder(double px, double py)
    {
        int x = (int)((px - _minX) * _invSize), y = (int)((py - _minY) * _invSize);
        x = (x | (x << 8)) & 0x00FF00FF; x = (x | (x << 4)) & 0x0F0F0F0F; x = (x | (x << 2)) & 0x33333333; x = (x | (x << 1)) & 0x55555555;
        y = (y | (y << 8)) & 0x00FF00FF; y = (y | (y << 4)) & 0x0F0F0F0F; y = (y | (y << 2)) & 0x33333333; y = (y | (y << 1)) & 0x55555555;
        return x | (y << 1);
    }

    private void IndexCurve(Node start)
    {
        Node p = start;
        do
        {
            if (!p.HasZ) { p.Z = ZOrder(p.X, p.Y); p.HasZ = true; }
            p.PrevZ = p.Prev;
            p.NextZ = p.Next;
            p = p.Next;
        } while (p != start);
        p.PrevZ!.NextZ = null;
        p.PrevZ = null;
        SortLinked(p);
    }

    private static Node SortLinked(Node list)
    {
        int inSize = 1, numMerges;
        do
        {
            Node? p = list, e, tail = null;
            list = null!;
            numMerges = 0;
            while (p is not null)
            {
                numMerges++;
                Node? q = p;
                int pSize = 0;
                for (int i = 0; i < inSize; i++) { pSize++; q = q.NextZ; if (q is null) break; }
                int qSize = inSize;
                while (pSize > 0 || (qSize > 0 && q is not null))
                {
                    if (pSize != 0 && (qSize == 0 || q is null || p!.Z <= q.Z)) { e = p!; p = p!.NextZ; pSize--; }
                    else { e = q!; q = q!.NextZ; qSize--; }
                    if (tail is not null) tail.NextZ = e; else list = e;
                    e.PrevZ = tail;
                    tail = e;
                }
                p = q;
            }
            tail!.NextZ = null;
            inSize *= 2;
        } while (numMerges > 1);
        return list;
    }

    // ---- T-junction repair ----

    private void PutBackRemoved()
    {
        if (_removed.Count == 0) return;
        var byEdge = new Dictionary<long, int>();
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
