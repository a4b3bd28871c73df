using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Formats.Cutting;

/// <summary>Exact axis-aligned bounds of contours (arcs contribute their extreme points, not their chords).</summary>
internal static class ContourBounds
{
    public static void Extend(Contour c, ref Vec2 min, ref Vec2 max)
    {
        if (c.Circle is { } k)
        {
            Add(k.Center - new Vec2(k.Radius, k.Radius), ref min, ref max);
            Add(k.Center + new Vec2(k.Radius, k.Radius), ref min, ref max);
            return;
        }
        foreach (var s in c.Segments)
        {
            Add(s.Start, ref min, ref max);
            Add(s.End, ref min, ref max);
            if (s is ArcSegment a)
            {
                double lo = Math.Min(a.StartDeg, a.EndDeg), hi = Math.Max(a.StartDeg, a.EndDeg);
                for (double q = Math.Ceiling(lo / 90) * 90; q <= hi; q += 90)
                    Add(a.Center + Vec2.FromAngleDeg(q) * a.Radius, ref min, ref max);
            }
        }
    }

    private static void Add(Vec2 p, ref Vec2 min, ref Vec2 max)
    {
        min = new Vec2(Math.Min(min.X, p.X), Math.Min(min.Y, p.Y));
        max = new Vec2(Math.Max(max.X, p.X), Math.Max(max.Y, p.Y));
    }
}
