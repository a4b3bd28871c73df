using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Parts.Tests;

/// <summary>Closed-form plane geometry the tests compute independently of the code under test.</summary>
internal static class Geo
{
    /// <summary>Area of a circular segment of depth k cut from a circle of radius r: r^2 acos((r-k)/r) - (r-k) sqrt(2rk - k^2) (standard formula).</summary>
    public static double SegmentArea(double r, double k) => r * r * Math.Acos((r - k) / r) - (r - k) * Math.Sqrt(2 * r * k - k * k);

    /// <summary>Arc length removed by a segment of depth k: 2 r acos((r-k)/r); its chord: 2 sqrt(2rk - k^2).</summary>
    public static (double Arc, double Chord) SegmentArcChord(double r, double k) =>
        (2 * r * Math.Acos((r - k) / r), 2 * Math.Sqrt(2 * r * k - k * k));

    /// <summary>Lens area of two circles r1, r2 with centres d apart (standard circle-circle intersection formula).</summary>
    public static double LensArea(double r1, double r2, double d)
    {
        double a = r1 * r1 * Math.Acos((d * d + r1 * r1 - r2 * r2) / (2 * d * r1));
        double b = r2 * r2 * Math.Acos((d * d + r2 * r2 - r1 * r1) / (2 * d * r2));
        double c = 0.5 * Math.Sqrt((-d + r1 + r2) * (d + r1 - r2) * (d - r1 + r2) * (d + r1 + r2));
        return a + b - c;
    }

    /// <summary>Integral of sqrt(r^2 - y^2) over y in [-a, a]: a sqrt(r^2 - a^2) + r^2 asin(a / r).</summary>
    public static double ChordStrip(double r, double a) => a * Math.Sqrt(r * r - a * a) + r * r * Math.Asin(a / r);

    public static double Circle(double r) => Math.PI * r * r;

    /// <summary>Points along a contour (n per segment, or n on a full circle), exact.</summary>
    public static IEnumerable<Vec2> Sample(Contour c, int n = 64)
    {
        if (c.Circle is { } circle)
        {
            for (int i = 0; i < n; i++) yield return circle.Center + Vec2.FromAngleDeg(360.0 * i / n) * circle.Radius;
            yield break;
        }
        foreach (var s in c.Segments)
        {
            for (int i = 0; i < n; i++)
            {
                double t = (double)i / n;
                yield return s switch
                {
                    LineSegment l => l.From + (l.To - l.From) * t,
                    ArcSegment a => a.Center + Vec2.FromAngleDeg(a.StartDeg + a.SweepDeg * t) * a.Radius,
                    _ => throw new InvalidOperationException(),
                };
            }
        }
    }

    /// <summary>Exact distance from a point to a contour (nearest point on each line or arc), computed here independently.</summary>
    public static double Distance(Contour c, Vec2 p)
    {
        if (c.Circle is { } circle) return Math.Abs((p - circle.Center).Length - circle.Radius);
        double best = double.PositiveInfinity;
        foreach (var s in c.Segments)
        {
            double d = s switch
            {
                LineSegment l => SegDist(l.From, l.To, p),
                ArcSegment a => ArcDist(a, p),
                _ => throw new InvalidOperationException(),
            };
            best = Math.Min(best, d);
        }
        return best;
    }

    private static double SegDist(Vec2 a, Vec2 b, Vec2 p)
    {
        var d = b - a;
        double t = Math.Clamp((p - a).Dot(d) / d.Dot(d), 0, 1);
        return (a + d * t - p).Length;
    }

    private static double ArcDist(ArcSegment a, Vec2 p)
    {
        var v = p - a.Center;
        double ang = Math.Atan2(v.Y, v.X) * 180 / Math.PI;
        double rel = a.SweepDeg >= 0 ? Mod(ang - a.StartDeg) : Mod(a.StartDeg - ang);
        if (rel <= Math.Abs(a.SweepDeg)) return Math.Abs(v.Length - a.Radius);
        return Math.Min((a.Start - p).Length, (a.End - p).Length);
    }

    private static double Mod(double x) => ((x % 360) + 360) % 360;

    /// <summary>Smallest angular distance, degrees.</summary>
    public static double AngleDiff(double a, double b)
    {
        double x = Mod(a - b);
        return Math.Min(x, 360 - x);
    }

    public static double AngleOf(Vec2 v) => Mod(Math.Atan2(v.Y, v.X) * 180 / Math.PI);

    /// <summary>Centroid of the vertices of a polygon contour (a rectangle's centre).</summary>
    public static Vec2 VertexCentroid(Contour c)
    {
        var pts = c.Segments.Select(s => s.Start).ToArray();
        return new Vec2(pts.Average(p => p.X), pts.Average(p => p.Y));
    }
}
