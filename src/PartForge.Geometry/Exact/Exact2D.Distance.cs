using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Exact;

// Distances in closed form (no facets). Segment pairs: the minimum is at an end point of one of them or at an
// interior critical pair, whose connecting line is perpendicular to a line and radial to an arc; arc-arc
// critical pairs lie on the line of centres. Intersections give 0.
public static partial class Exact2D
{
    /// <summary>Nearest point of a segment to p.</summary>
    public static Vec2 Nearest(Segment s, Vec2 p)
    {
        switch (s)
        {
            case LineSegment l:
            {
                var d = l.To - l.From;
                double len2 = d.Dot(d);
                if (len2 <= 0) return l.From;
                double t = Math.Clamp((p - l.From).Dot(d) / len2, 0, 1);
                return l.From + d * t;
            }
            case ArcSegment a:
            {
                var v = p - a.Center;
                double r = v.Length;
                if (r > 0 && OnArc(a, AngleOf(v))) return a.Center + v * (a.Radius / r);
                return (a.Start - p).Length <= (a.End - p).Length ? a.Start : a.End;
            }
            default: throw new ArgumentException("unknown segment", nameof(s));
        }
    }

    public static double PointLine(Vec2 p, LineSegment l)
    {
        var d = l.To - l.From;
        double len2 = d.Dot(d);
        if (len2 <= 0) return (p - l.From).Length;
        double t = Math.Clamp((p - l.From).Dot(d) / len2, 0, 1);
        return (p - (l.From + d * t)).Length;
    }

    public static double PointArc(Vec2 p, ArcSegment a)
    {
        var v = p - a.Center;
        double r = v.Length;
        if (r > 0 && OnArc(a, AngleOf(v))) return Math.Abs(r - a.Radius);
        if (r == 0 && Math.Abs(a.SweepDeg) >= 360 - 1e-12) return a.Radius;
        return Math.Min((p - a.Start).Length, (p - a.End).Length);
    }

    public static double PointSegment(Vec2 p, Segment s) => s switch
    {
        LineSegment l => PointLine(p, l),
        ArcSegment a => PointArc(p, a),
        _ => throw new ArgumentException("unknown segment", nameof(s)),
    };

    public static double PointContour(Vec2 p, Contour c)
    {
        double best = double.PositiveInfinity;
        foreach (var s in SegmentsOf(c)) best = Math.Min(best, PointSegment(p, s));
        return best;
    }

    public static double SegmentSegment(Segment a, Segment b) => (a, b) switch
    {
        (LineSegment la, LineSegment lb) => LineLine(la, lb),
        (LineSegment la, ArcSegment ab) => LineArc(la, ab),
        (ArcSegment aa, LineSegment lb) => LineArc(lb, aa),
        (ArcSegment aa, ArcSegment ab) => ArcArc(aa, ab),
        _ => throw new ArgumentException("unknown segment"),
    };

    public static double LineLine(LineSegment a, LineSegment b)
    {
        if (LinesIntersect(a.From, a.To, b.From, b.To)) return 0;
        return Math.Min(Math.Min(PointLine(a.From, b), PointLine(a.To, b)), Math.Min(PointLine(b.From, a), PointLine(b.To, a)));
    }

    private static bool LinesIntersect(Vec2 p1, Vec2 p2, Vec2 q1, Vec2 q2)
    {
        double d1 = (p2 - p1).Cross(q1 - p1), d2 = (p2 - p1).Cross(q2 - p1);
        double d3 = (q2 - q1).Cross(p1 - q1), d4 = (q2 - q1).Cross(p2 - q1);
        return ((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0));
    }

    public static double LineArc(LineSegment l, ArcSegment a)
    {
        // Intersections of the segment with the circle that fall on the arc.
        var d = l.To - l.From;
        var f = l.From - a.Center;
        double A = d.Dot(d), B = 2 * f.Dot(d), C = f.Dot(f) - a.Radius * a.Radius;
        if (A > 0)
        {
            double disc = B * B - 4 * A * C;
            if (disc >= 0)
            {
                double sq = Math.Sqrt(disc);
                foreach (double t in new[] { (-B - sq) / (2 * A), (-B + sq) / (2 * A) })
                    if (t >= 0 && t <= 1 && OnArc(a, AngleOf(f + d * t))) return 0;
            }
        }
        double best = Math.Min(Math.Min(PointArc(l.From, a), PointArc(l.To, a)), Math.Min(PointLine(a.Start, l), PointLine(a.End, l)));
        // Interior critical points: the arc points on the normal of the line through the centre.
        if (A > 0)
        {
            var n = new Vec2(-d.Y, d.X) * (1 / Math.Sqrt(A));
            foreach (var dir in new[] { n, n * -1 })
            {
                if (OnArc(a, AngleOf(dir))) best = Math.Min(best, PointLine(a.Center + dir * a.Radius, l));
            }
        }
        return best;
    }

    public static double ArcArc(ArcSegment p, ArcSegment q)
    {
        var cc = q.Center - p.Center;
        double dist = cc.Length;
        // Intersections of the two circles that fall on both arcs.
        if (dist > 0 && dist <= p.Radius + q.Radius && dist >= Math.Abs(p.Radius - q.Radius))
        {
            double x = (dist * dist + p.Radius * p.Radius - q.Radius * q.Radius) / (2 * dist);
            double h = Math.Sqrt(Math.Max(0, p.Radius * p.Radius - x * x));
            var u = cc * (1 / dist);
            var perp = new Vec2(-u.Y, u.X);
            foreach (var pt in new[] { p.Center + u * x + perp * h, p.Center + u * x - perp * h })
                if (OnArc(p, AngleOf(pt - p.Center)) && OnArc(q, AngleOf(pt - q.Center))) return 0;
        }
        double best = Math.Min(Math.Min(PointArc(p.Start, q), PointArc(p.End, q)), Math.Min(PointArc(q.Start, p), PointArc(q.End, p)));
        if (dist > 0)
        {
            var u = cc * (1 / dist);
            foreach (var dir in new[] { u, u * -1 })
            {
                if (OnArc(p, AngleOf(dir))) best = Math.Min(best, PointArc(p.Center + dir * p.Radius, q));
                if (OnArc(q, AngleOf(dir))) best = Math.Min(best, PointArc(q.Center + dir * q.Radius, p));
            }
        }
        else if (Math.Abs(p.Radius - q.Radius) <= Epsilon && (OnArc(q, p.StartDeg) || OnArc(p, q.StartDeg)))
        {
            return 0;
        }
        return best;
    }

    /// <summary>Minimum distance between the boundaries of two contours (0 when they cross or touch).</summary>
    public static double ContourContour(Contour a, Contour b)
    {
        double best = double.PositiveInfinity;
        var sa = SegmentsOf(a);
        var sb = SegmentsOf(b);
        foreach (var x in sa)
        {
            var bx = Box2.Of(x);
            foreach (var y in sb)
            {
                if (bx.DistanceTo(Box2.Of(y)) >= best) continue;
                best = Math.Min(best, SegmentSegment(x, y));
                if (best <= Epsilon) return 0;
            }
        }
        return best;
    }

    /// <summary>
    /// True when the point is inside the region bounded by the contour (crossing rule on a ray in a fixed
    /// oblique direction, exact for arcs). Points on the boundary may go either way: callers test the
    /// boundary distance first.
    /// </summary>
    public static bool InsideContour(Vec2 p, Contour c)
    {
        if (c.Circle is { } circle) return (p - circle.Center).Length <= circle.Radius;
        // Ray p + s * dir, s > 0, in a direction unlikely to hit vertices of our grid-aligned shapes exactly.
        var dir = new Vec2(0.8191520442889918, 0.5735764363510461); // 35 degrees
        int crossings = 0;
        foreach (var seg in c.Segments)
        {
            switch (seg)
            {
                case LineSegment l:
                {
                    var e = l.To - l.From;
                    double den = dir.Cross(e);
                    if (den == 0) break;
                    var w = l.From - p;
                    double s = w.Cross(e) / den;      // along the ray
                    double t = w.Cross(dir) / den;    // along the segment
                    if (s > 0 && t >= 0 && t < 1) crossings++;
                    break;
                }
                case ArcSegment a:
                {
                    var f = p - a.Center;
                    double B = 2 * f.Dot(dir), C = f.Dot(f) - a.Radius * a.Radius;
                    double disc = B * B - 4 * C;
                    if (disc <= 0) break;
                    double sq = Math.Sqrt(disc);
                    foreach (double s in new[] { (-B - sq) / 2, (-B + sq) / 2 })
                    {
                        if (s <= 0) continue;
                        var hit = f + dir * s;
                        double ang = AngleOf(hit);
                        // Half-open at the arc's end so a shared vertex is counted once.
                        if (OnArc(a, ang) && (hit - (a.End - a.Center)).Length > 1e-12) crossings++;
                    }
                    break;
                }
            }
        }
        return (crossings & 1) == 1;
    }

    /// <summary>
    /// Distance between two filled shapes: 0 when they overlap or touch, else the minimum distance between
    /// their boundaries. <paramref name="overlap"/> tells the two zero cases apart from a true clearance.
    /// </summary>
    public static double ShapeShape(Shape2D a, Shape2D b, double cutoff, out bool overlap)
    {
        overlap = false;
        if (a.Bounds.DistanceTo(b.Bounds) >= cutoff) return double.PositiveInfinity;
        // Containment first (two point tests): a point of one inside the other means they overlap.
        var pa = SegmentsOf(a.Outer)[0].Start;
        var pb = SegmentsOf(b.Outer)[0].Start;
        if (b.Contains(pa) || a.Contains(pb)) { overlap = true; return 0; }
        double best = double.PositiveInfinity;
        foreach (var ca in a.Boundaries())
        {
            var ba = Box2.Of(ca);
            foreach (var cb in b.Boundaries())
            {
                if (ba.DistanceTo(Box2.Of(cb)) >= Math.Min(best, cutoff)) continue;
                best = Math.Min(best, ContourContour(ca, cb));
                if (best <= Epsilon) { overlap = true; return 0; }
            }
        }
        return best;
    }

    /// <summary>Distance between two filled shapes without a cutoff.</summary>
    public static double ShapeShape(Shape2D a, Shape2D b) => ShapeShape(a, b, double.PositiveInfinity, out _);
}
