namespace PartForge.Geometry.Meshes;

/// <summary>
/// Even-odd point location against a set of grid rings, in exact integer arithmetic, for the midpoints of grid
/// edges (coordinates are doubled so that midpoints are integers). Edges are bucketed by rows of y so a query
/// only looks at the edges crossing its row.
/// </summary>
internal sealed class ExactAreaLocator
{
    public enum Where { Outside, Inside, Boundary }

    private readonly int[] _c; // x0, y0, x1, y1 of each edge in grid units (4 ints an edge; doubled when used)
    private readonly int _n;
    private readonly int[] _rowStart;
    private readonly int[] _rowEdges;
    private readonly long _yMin;
    private readonly long _rowH;
    private readonly int _rows;

    public ExactAreaLocator(IEnumerable<GridPoint[]> rings)
        : this(rings.SelectMany(r => Enumerable.Range(0, r.Length).Select(i => (r[i], r[(i + 1) % r.Length]))))
    {
    }

    /// <summary>From loose edges (direction does not matter for the even-odd rule).</summary>
    public ExactAreaLocator(IEnumerable<(GridPoint P, GridPoint Q)> edges)
    {
        var c = new List<int>();
        foreach (var e in edges) { c.Add(checked((int)e.P.X)); c.Add(checked((int)e.P.Y)); c.Add(checked((int)e.Q.X)); c.Add(checked((int)e.Q.Y)); }
        _c = c.ToArray();
        _n = _c.Length / 4;
        if (_n == 0) { _rowStart = new int[2]; _rowEdges = Array.Empty<int>(); _rows = 1; _rowH = 1; return; }
        long y0 = long.MaxValue, y1 = long.MinValue;
        for (int i = 0; i < _n; i++) { var (_, a, _, b) = Edge(i); y0 = Math.Min(y0, Math.Min(a, b)); y1 = Math.Max(y1, Math.Max(a, b)); }
        _yMin = y0;
        _rows = Math.Clamp((int)Math.Sqrt(_n), 1, 4096);
        _rowH = Math.Max(1, (y1 - y0) / _rows + 1);
        var count = new int[_rows + 1];
        for (int pass = 0; pass < 2; pass++)
        {
            var fill = pass == 1 ? (int[])count.Clone() : null;
            var list = pass == 1 ? new int[count[_rows]] : null;
            for (int i = 0; i < _n; i++)
            {
                var (_, a, _, b) = Edge(i);
                int r0 = Row(Math.Min(a, b)), r1 = Row(Math.Max(a, b));
                for (int r = r0; r <= r1; r++)
                {
                    if (pass == 0) count[r + 1]++;
                    else list![fill![r]++] = i;
                }
            }
            if (pass == 0) for (int r = 1; r <= _rows; r++) count[r] += count[r - 1];
            else { _rowEdges = list!; }
        }
        _rowStart = count;
        _rowEdges ??= Array.Empty<int>();
    }

    /// <summary>Edge i with doubled coordinates (so that midpoints of grid edges are integers).</summary>
    private (long X0, long Y0, long X1, long Y1) Edge(int i) => (2L * _c[4 * i], 2L * _c[4 * i + 1], 2L * _c[4 * i + 2], 2L * _c[4 * i + 3]);

    private int Row(long y) => (int)Math.Clamp((y - _yMin) / _rowH, 0, _rows - 1);

    /// <summary>Location of the midpoint of grid edge (a, b).</summary>
    public Where LocateMidpoint(GridPoint a, GridPoint b)
    {
        long px = a.X + b.X, py = a.Y + b.Y;
        if (_n == 0) return Where.Outside;
        if (py < _yMin || py > _yMin + (long)_rows * _rowH) return Where.Outside;
        int row = Row(py);
        bool inside = false;
        for (int k = _rowStart[row]; k < _rowStart[row + 1]; k++)
        {
            var (xi, yi, xj, yj) = Edge(_rowEdges[k]);
            // On the edge?
            if (Math.Min(yi, yj) <= py && py <= Math.Max(yi, yj) && Math.Min(xi, xj) <= px && px <= Math.Max(xi, xj))
            {
                Int128 cr = (Int128)(xj - xi) * (py - yi) - (Int128)(yj - yi) * (px - xi);
                if (cr == 0) return Where.Boundary;
            }
            if ((yi > py) != (yj > py))
            {
                Int128 num = (Int128)(xj - xi) * (py - yi), den = yj - yi;
                Int128 lhs = (Int128)(px - xi) * den;
                if (den > 0 ? lhs < num : lhs > num) inside = !inside;
            }
        }
        return inside ? Where.Inside : Where.Outside;
    }
}
