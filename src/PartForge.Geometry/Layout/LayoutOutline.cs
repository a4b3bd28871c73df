using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Layout;

/// <summary>
/// What the layout engine needs of an exact profile: points whose convex hull contains its outers (arcs
/// replaced by tangent polygons, which lie outside the arc), the exact axis-aligned bounds, and the exact
/// area (outers minus holes).
/// </summary>
internal static class LayoutOutline
{
    /// <summary>
    /// Points whose convex hull contains every outer contour. An arc is covered by its end points and the
    /// corners of a tangent polygon (radius r / cos(phi / 2), at most <paramref name="tolMm"/> outside the
    /// arc): each piece of arc lies in the triangle of its two ends and the tangents' meeting point. Full
    /// circles use a tangent polygon whose side count is a multiple of 4 with sides touching the circle at
    /// 0, 90, 180 and 270 degrees, so the hull's box is the circle's box.
    /// </summary>
    public static List<Vec2> CoveringPoints(IReadOnlyList<Contour> outers, double tolMm)
    {
        var pts = new List<Vec2>();
        foreach (var c in outers)
        {
            if (c.Circle is { } circle)
            {
                int n = TangentPieces(circle.Radius, 2 * Math.PI, tolMm);
                n = Math.Max(4, (n + 3) / 4 * 4);
                double step = 2 * Math.PI / n;
                double r = circle.Radius / Math.Cos(step / 2);
                for (int i = 0; i < n; i++)
                {
                    double a = step * (i + 0.5);
                    pts.Add(new Vec2(circle.Center.X + r * Math.Cos(a), circle.Center.Y + r * Math.Sin(a)));
                }
                continue;
            }
            foreach (var s in c.Segments)
            {
                pts.Add(s.Start);
                if (s is ArcSegment arc && arc.Radius > 0 && arc.SweepDeg != 0)
                {
                    double sweep = arc.SweepDeg * Math.PI / 180.0;
                    int k = TangentPieces(arc.Radius, Math.Abs(sweep), tolMm);
                    double phi = sweep / k;
                    double r = arc.Radius / Math.Cos(phi / 2);
                    double a0 = arc.StartDeg * Math.PI / 180.0;
                    for (int j = 0; j < k; j++)
                    {
                        double a = a0 + phi * (j + 0.5);
                        pts.Add(new Vec2(arc.Center.X + r * Math.Cos(a), arc.Center.Y + r * Math.Sin(a)));
                    }
                    pts.Add(arc.End);
                }
            }
        }
        foreach (var p in pts)
            if (!double.IsFinite(p.X) || !double.IsFinite(p.Y)) throw new ArgumentException("an outline has a non-finite coordinate");
        return pts;
    }

    /// <summary>Pieces of tangent polygon for an arc so that its corners are at most tol outside: r / cos(phi/2) - r &lt;= tol.</summary>
    private static int TangentPieces(double radius, double sweepRad, double tolMm)
    {
        double phiMax = 2 * Math.Acos(radius / (radius + tolMm));
        // An acute piece at most: keeps the tangent corners well conditioned whatever the tolerance.
        phiMax = Math.Min(phiMax, Math.PI / 4);
        double k = Math.Ceiling(sweepRad / phiMax - 1e-12);
        return (int)Math.Clamp(k, 1, 1 << 16);
    }

    /// <summary>Exact axis-aligned bounds of the contours (arcs by their end points and the axis extremes they pass).</summary>
    public static (Vec2 Min, Vec2 Max) ExactBounds(IReadOnlyList<Contour> contours)
    {
        double x0 = double.PositiveInfinity, y0 = x0, x1 = double.NegativeInfinity, y1 = x1;
        void Add(Vec2 p)
        {
            x0 = Math.Min(x0, p.X); y0 = Math.Min(y0, p.Y);
            x1 = Math.Max(x1, p.X); y1 = Math.Max(y1, p.Y);
        }
        foreach (var c in contours)
        {
            if (c.Circle is { } circle)
            {
                Add(circle.Center - new Vec2(circle.Radius, circle.Radius));
                Add(circle.Center + new Vec2(circle.Radius, circle.Radius));
                continue;
            }
            foreach (var s in c.Segments)
            {
                Add(s.Start);
                Add(s.End);
                if (s is ArcSegment a)
                {
                    double lo = Math.Min(a.StartDeg, a.EndDeg), hi = Math.Max(a.StartDeg, a.EndDeg);
                    for (double q = Math.Ceiling(lo / 90.0) * 90.0; q <= hi; q += 90.0)
                        Add(a.Center + Vec2.FromAngleDeg(q) * a.Radius);
                }
            }
        }
        return (new Vec2(x0, y0), new Vec2(x1, y1));
    }

    /// <summary>Exact area, mm^2: the outers' areas minus the holes' (holes lie inside outers).</summary>
    public static double Area(Profile p) =>
        p.Outers.Sum(c => Math.Abs(ContourOffset.SignedArea(c))) - p.Holes.Sum(c => Math.Abs(ContourOffset.SignedArea(c)));
}
