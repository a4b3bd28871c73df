namespace PartForge.Dynamics.Engine;

/// <summary>
/// The drive's conduction windows in radians, and the sorted list of every window edge over one revolution
/// (plus 0, the revolution mark). Commands are read only at known angles: at the start, and at an edge from the
/// side the rotor crosses to, so an edge is never missed or taken twice through rounding.
/// </summary>
internal sealed class WindowTable
{
    private readonly (double A, double B, int Sign)[][] _intervals; // per circuit, A < B in [0, 2 pi]

    public WindowTable(IReadOnlyList<CoilCircuit> circuits)
    {
        var edges = new SortedSet<double> { 0.0 };
        _intervals = new (double, double, int)[circuits.Count][];
        for (int k = 0; k < circuits.Count; k++)
        {
            var list = new List<(double, double, int)>();
            if (circuits[k].Connection is DriveConnection d)
                foreach (var w in d.Windows)
                {
                    double on = Rad(w.OnDeg), off = Rad(w.OffDeg);
                    edges.Add(on);
                    edges.Add(off);
                    if (on < off) list.Add((on, off, w.Sign));
                    else
                    {
                        list.Add((on, 2 * Math.PI, w.Sign));
                        if (off > 0) list.Add((0, off, w.Sign));
                    }
                }
            _intervals[k] = list.ToArray();
        }
        Edges = edges.ToArray();
    }

    /// <summary>Every edge in [0, 2 pi), sorted; Edges[0] is 0.</summary>
    public double[] Edges { get; }

    public static double Rad(double deg) => deg * (Math.PI / 180.0);

    /// <summary>Angle wrapped into [0, 2 pi).</summary>
    public static double Wrap(double theta)
    {
        double p = theta - 2 * Math.PI * Math.Floor(theta / (2 * Math.PI));
        return p >= 2 * Math.PI || p < 0 ? 0 : p;
    }

    /// <summary>The command of circuit k at wrapped angle phi (sign of the window containing it, else 0).</summary>
    public int Command(int k, double phi)
    {
        foreach (var (a, b, s) in _intervals[k])
            if (phi >= a && phi < b) return s;
        return 0;
    }

    /// <summary>Wrapped angle just after crossing edge j in the direction dir: the edge itself going forward
    /// (windows are [on, off)), the next double below it going backward.</summary>
    public double SideOf(int j, int dir)
    {
        double e = Edges[j];
        if (dir > 0) return e;
        return e > 0 ? Math.BitDecrement(e) : Math.BitDecrement(2 * Math.PI);
    }

    /// <summary>
    /// The first edge the rotor meets moving from theta in direction dir: forward the smallest unwrapped edge
    /// above theta, backward the largest at or below it. Returns the unwrapped angle and the edge index.
    /// </summary>
    public (double E, int J) Next(double theta, int dir)
    {
        int m = Edges.Length;
        double twoPi = 2 * Math.PI;
        long k = (long)Math.Floor(theta / twoPi);
        double rel = theta - twoPi * k;
        int j = UpperBound(rel);
        // Unwrapped candidate for index (k, j), moved until the predicate holds exactly in unwrapped terms.
        if (dir > 0)
        {
            long kk = k; int jj = j;
            if (jj == m) { jj = 0; kk++; }
            while (At(kk, jj) <= theta) Step(ref kk, ref jj, +1, m);
            while (true)
            {
                long pk = kk; int pj = jj;
                Step(ref pk, ref pj, -1, m);
                if (At(pk, pj) > theta) { kk = pk; jj = pj; } else break;
            }
            return (At(kk, jj), jj);
        }
        else
        {
            long kk = k; int jj = j - 1;
            if (jj < 0) { jj = m - 1; kk--; }
            while (At(kk, jj) > theta) Step(ref kk, ref jj, -1, m);
            while (true)
            {
                long nk = kk; int nj = jj;
                Step(ref nk, ref nj, +1, m);
                if (At(nk, nj) <= theta) { kk = nk; jj = nj; } else break;
            }
            return (At(kk, jj), jj);
        }
    }

    private double At(long k, int j) => 2 * Math.PI * k + Edges[j];

    private static void Step(ref long k, ref int j, int d, int m)
    {
        j += d;
        if (j == m) { j = 0; k++; }
        else if (j < 0) { j = m - 1; k--; }
    }

    private int UpperBound(double x)
    {
        int lo = 0, hi = Edges.Length;
        while (lo < hi)
        {
            int mid = (lo + hi) >> 1;
            if (Edges[mid] > x) hi = mid; else lo = mid + 1;
        }
        return lo;
    }
}
