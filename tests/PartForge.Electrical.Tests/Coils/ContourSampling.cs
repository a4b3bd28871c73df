using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Electrical.Tests.Coils;

/// <summary>Test helpers: dense point samples of an exact contour, its shoelace area and perimeter.</summary>
public static class ContourSampling
{
    public static List<Vec2> Sample(Contour c, int perSegment = 400)
    {
        var pts = new List<Vec2>();
        if (c.Circle is { } circle)
        {
            for (int i = 0; i < perSegment * 4; i++) pts.Add(circle.Center + Vec2.FromAngleDeg(360.0 * i / (perSegment * 4)) * circle.Radius);
            return pts;
        }
        foreach (var s in c.Segments)
        {
            switch (s)
            {
                case LineSegment l:
                    for (int i = 0; i < perSegment; i++) pts.Add(l.From + (l.To - l.From) * (i / (double)perSegment));
                    break;
                case ArcSegment a:
                    for (int i = 0; i < perSegment; i++) pts.Add(a.Center + Vec2.FromAngleDeg(a.StartDeg + a.SweepDeg * i / perSegment) * a.Radius);
                    break;
            }
        }
        return pts;
    }

    public static double Area(IReadOnlyList<Vec2> p)
    {
        double s = 0;
        for (int i = 0; i < p.Count; i++) s += p[i].Cross(p[(i + 1) % p.Count]);
        return s / 2;
    }

    public static double Perimeter(IReadOnlyList<Vec2> p)
    {
        double s = 0;
        for (int i = 0; i < p.Count; i++) s += (p[(i + 1) % p.Count] - p[i]).Length;
        return s;
    }
}
