using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Exact;

// Extents: radial range about the origin, support in a direction, where a ray leaves a contour.
public static partial class Exact2D
{
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
                double phiFar = dc > Epsilon ? AngleOf(a.Center) : a.StartDeg;
                if (dc <= Epsilon || OnArc(a, phiFar)) max = Math.Max(max, dc + a.Radius);
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
            if (s is ArcSegment a && OnArc(a, AngleOf(u))) best = Math.Max(best, a.Center.Dot(u) + a.Radius * ul);
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
        void Take(double t) { if (t >= -Epsilon && (double.IsNaN(best) || t > best)) best = t; }
        if (c.Circle is { } circle) { foreach (var t in RayCircle(origin, dir, circle.Center, circle.Radius)) Take(t); return best; }
        foreach (var s in c.Segments)
        {
            switch (s)
            {
                case LineSegment l:
                {
                    var e = l.To - l.From;
                    double den = dir.Cross(e);
                    if (Math.Abs(den) < Epsilon) break;
                    var w = l.From - origin;
                    double t = w.Cross(e) / den, u = w.Cross(dir) / den;
                    if (u >= -1e-12 && u <= 1 + 1e-12) Take(t);
                    break;
                }
                case ArcSegment a:
                    foreach (var t in RayCircle(origin, dir, a.Center, a.Radius))
                        if (OnArc(a, AngleOf(origin + dir * t - a.Center))) Take(t);
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

    /// <summary>Largest distance of a contour from the origin (exact: line ends, arc ends and the arc point facing away).</summary>
    public static double MaxRadius(Contour c)
    {
        double best = 0;
        foreach (var s in SegmentsOf(c))
        {
            best = Math.Max(best, Math.Max(s.Start.Length, s.End.Length));
            if (s is ArcSegment a)
            {
                double cl = a.Center.Length;
                var dir = cl > 0 ? a.Center * (1 / cl) : new Vec2(1, 0);
                if (OnArc(a, AngleOf(dir))) best = Math.Max(best, cl + a.Radius);
            }
        }
        return best;
    }

    /// <summary>
    /// Radial range of a shape's material about the origin: (0 when the origin is in the material, else the
    /// distance to the nearest boundary; the outer boundary's largest radius). Rotation about the origin leaves
    /// it unchanged, so the gap between two shapes' ranges bounds their distance at every angle.
    /// </summary>
    public static (double Min, double Max) RadialRange(Shape2D s)
    {
        var o = new Vec2(0, 0);
        double min = double.PositiveInfinity;
        if (s.Contains(o)) min = 0;
        else foreach (var c in s.Boundaries()) min = Math.Min(min, PointContour(o, c));
        return (min, MaxRadius(s.Outer));
    }

}
