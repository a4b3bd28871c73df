using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Parts.Shapes;

/// <summary>
/// Exact measurements on line/arc contours that the part builders need (radial extents, support in a
/// direction, distance from a point, where a ray leaves a contour) and a half-plane clip of a convex contour.
/// Everything is computed on the true lines and arcs, never on a polygon.
/// </summary>
public static class ExactGeometry
{
    private const double Eps = 1e-12;

    /// <summary>Is the direction angle phi (degrees) on the arc's sweep?</summary>
    public static bool OnSweep(ArcSegment a, double phiDeg)
    {
        double sweep = Math.Abs(a.SweepDeg);
        if (sweep >= 360 - 1e-12) return true;
        double rel = a.SweepDeg >= 0 ? Angle.Normalize360(phiDeg - a.StartDeg) : Angle.Normalize360(a.StartDeg - phiDeg);
        return rel <= sweep + 1e-12;
    }

    /// <summary>Angle of a vector in degrees, (-180, 180].</summary>
    public static double AngleOf(Vec2 v) => Math.Atan2(v.Y, v.X) * 180.0 / Math.PI;

    /// <summary>Nearest point of a segment to p.</summary>
    public static Vec2 Nearest(Segment s, Vec2 p)
    {
        switch (s)
        {
            case LineSegment l:
            {
                var d = l.To - l.From;
                double len2 = d.Dot(d);
                if (len2 < Eps) return l.From;
                double t = Math.Clamp((p - l.From).Dot(d) / len2, 0, 1);
                return l.From + d * t;
            }
            case ArcSegment a:
            {
                var v = p - a.Center;
                if (v.Length > Eps && OnSweep(a, AngleOf(v))) return a.Center + v * (a.Radius / v.Length);
                var s0 = a.Start; var s1 = a.End;
                return (s0 - p).Length <= (s1 - p).Length ? s0 : s1;
            }
            default: throw new ArgumentException("unknown segment", nameof(s));
        }
    }

    /// <summary>Exact distance from a point to a contour's boundary.</summary>
    public static double Distance(Contour c, Vec2 p)
    {
        if (c.Circle is { } circle) return Math.Abs((p - circle.Center).Length - circle.Radius);
        double best = double.PositiveInfinity;
        foreach (var s in c.Segments) best = Math.Min(best, (Nearest(s, p) - p).Length);
        return best;
    }

    /// <summary>Smallest and largest distance from the origin of a contour's boundary points.</summary>
    public static (double Min, double Max) RadialExtent(Contour c)
    {
        if (c.Circle is { } circle)
        {
            double d = circle.Center.Length;
            return (Math.Max(0, d - circle.Radius), d + circle.Radius);
        }
        double min = double.PositiveInfinity, max = 0;
        var o = new Vec2(0, 0);
        foreach (var s in c.Segments)
        {
            min = Math.Min(min, Nearest(s, o).Length);
            max = Math.Max(max, s.Start.Length);
            max = Math.Max(max, s.End.Length);
            if (s is ArcSegment a)
            {
                double dc = a.Center.Length;
                double phiFar = dc > Eps ? AngleOf(a.Center) : a.StartDeg;
                if (dc <= Eps || OnSweep(a, phiFar)) max = Math.Max(max, dc + a.Radius);
            }
        }
        return (min, max);
    }

    /// <summary>Largest p . u over the contour (u need not be a unit vector).</summary>
    public static double Support(Contour c, Vec2 u)
    {
        double ul = u.Length;
        if (c.Circle is { } circle) return circle.Center.Dot(u) + circle.Radius * ul;
        double best = double.NegativeInfinity;
        foreach (var s in c.Segments)
        {
            best = Math.Max(best, s.Start.Dot(u));
            best = Math.Max(best, s.End.Dot(u));
            if (s is ArcSegment a && OnSweep(a, AngleOf(u))) best = Math.Max(best, a.Center.Dot(u) + a.Radius * ul);
        }
        return best;
    }

    /// <summary>
    /// Distance from <paramref name="origin"/> along the unit direction <paramref name="dir"/> to the farthest
    /// crossing of the contour's boundary (for a convex contour around the origin: where the ray leaves it).
    /// </summary>
    public static double RayExit(Contour c, Vec2 origin, Vec2 dir)
    {
        double best = double.NaN;
        void Take(double t) { if (t >= -Eps && (double.IsNaN(best) || t > best)) best = t; }
        if (c.Circle is { } circle) { foreach (var t in RayCircle(origin, dir, circle.Center, circle.Radius)) Take(t); return best; }
        foreach (var s in c.Segments)
        {
            switch (s)
            {
                case LineSegment l:
                {
                    var e = l.To - l.From;
                    double den = dir.Cross(e);
                    if (Math.Abs(den) < Eps) break;
                    var w = l.From - origin;
                    double t = w.Cross(e) / den, u = w.Cross(dir) / den;
                    if (u >= -1e-12 && u <= 1 + 1e-12) Take(t);
                    break;
                }
                case ArcSegment a:
                    foreach (var t in RayCircle(origin, dir, a.Center, a.Radius))
                        if (OnSweep(a, AngleOf(origin + dir * t - a.Center))) Take(t);
                    break;
            }
        }
        return best;
    }

    private static IEnumerable<double> RayCircle(Vec2 o, Vec2 d, Vec2 c, double r)
    {
        var w = o - c;
        double b = w.Dot(d), cc = w.Dot(w) - r * r, disc = b * b - cc;
        if (disc < 0) yield break;
        double sq = Math.Sqrt(disc);
        yield return -b - sq;
        yield return -b + sq;
    }

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
                if (Inside(Mid(piece), n, h)) { kept.Add(piece); keptAfterGap.Add(gap); gap = false; }
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

    private static Vec2 Mid(Segment s) => s switch
    {
        LineSegment l => (l.From + l.To) * 0.5,
        ArcSegment a => a.Center + Vec2.FromAngleDeg(a.StartDeg + a.SweepDeg / 2) * a.Radius,
        _ => throw new ArgumentException("unknown segment"),
    };

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
