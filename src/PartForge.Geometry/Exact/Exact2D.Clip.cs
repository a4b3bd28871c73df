using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Exact;

// The half-plane clip of a convex contour, exact on lines and arcs.
public static partial class Exact2D
{
    /// <summary>
    /// The part of a convex contour with p . n &lt;= h (n a unit normal), closed by a straight chord along the
    /// cutting line. The input's loop direction is kept. Throws when the line misses the contour or cuts all of it.
    /// </summary>
    public static Contour ClipConvex(Contour c, Vec2 n, double h)
    {
        var segs = c.Circle is { } circle
            ? new List<Segment> { new ArcSegment(circle.Center, circle.Radius, AngleOf(n) + 180, 360) }
            : c.Segments.ToList();
        var kept = new List<Segment>();
        var keptAfterGap = new List<bool>();
        bool gap = false;
        foreach (var s in segs)
        {
            foreach (var piece in Split(s, n, h))
            {
                if (Inside(Midpoint(piece), n, h)) { kept.Add(piece); keptAfterGap.Add(gap); gap = false; }
                else gap = true;
            }
        }
        if (kept.Count == 0) throw new ArgumentException("the cutting line removes the whole contour");
        if (!gap && !keptAfterGap.Any(x => x)) throw new ArgumentException("the cutting line misses the contour");
        // Start the output at the first piece that follows a removed stretch, then close each gap with a chord.
        int start = keptAfterGap.IndexOf(true);
        if (start < 0) start = 0; // the removed stretch is at the end of the loop
        var result = new List<Segment>();
        for (int i = 0; i < kept.Count; i++)
        {
            var cur = kept[(start + i) % kept.Count];
            var next = kept[(start + i + 1) % kept.Count];
            result.Add(cur);
            if ((cur.End - next.Start).Length > 1e-9) result.Add(new LineSegment(cur.End, next.Start));
        }
        return Contour.FromSegments(result);
    }

    private static bool Inside(Vec2 p, Vec2 n, double h) => p.Dot(n) <= h;

    private static IEnumerable<Segment> Split(Segment s, Vec2 n, double h)
    {
        switch (s)
        {
            case LineSegment l:
            {
                double fa = l.From.Dot(n) - h, fb = l.To.Dot(n) - h;
                if (fa * fb < 0)
                {
                    double t = fa / (fa - fb);
                    var x = l.From + (l.To - l.From) * t;
                    yield return new LineSegment(l.From, x);
                    yield return new LineSegment(x, l.To);
                }
                else yield return l;
                break;
            }
            case ArcSegment a:
            {
                // (C + r u(phi)) . n = h  ->  cos(phi - phiN) = k
                double k = (h - a.Center.Dot(n)) / a.Radius;
                var cuts = new List<double>();
                if (Math.Abs(k) < 1)
                {
                    double phiN = AngleOf(n), delta = Math.Acos(k) * 180.0 / Math.PI;
                    foreach (var phi in new[] { phiN + delta, phiN - delta })
                    {
                        double rel = a.SweepDeg >= 0 ? Angle.Normalize360(phi - a.StartDeg) : Angle.Normalize360(a.StartDeg - phi);
                        if (rel > 1e-9 && rel < Math.Abs(a.SweepDeg) - 1e-9) cuts.Add(rel);
                    }
                }
                cuts.Sort();
                double sign = Math.Sign(a.SweepDeg), prev = 0;
                foreach (var rel in cuts.Append(Math.Abs(a.SweepDeg)))
                {
                    yield return new ArcSegment(a.Center, a.Radius, a.StartDeg + sign * prev, sign * (rel - prev));
                    prev = rel;
                }
                break;
            }
            default: throw new ArgumentException("unknown segment");
        }
    }
}
