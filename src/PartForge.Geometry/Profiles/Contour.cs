using PartForge.Geometry.Primitives;

namespace PartForge.Geometry.Profiles;

/// <summary>
/// A closed loop of exact segments (each segment's End is the next one's Start), or a full circle.
/// Kept beside the polygons so that DXF/SVG get true arcs and the checker gets exact distances.
/// </summary>
public sealed record Contour
{
    /// <summary>Segments in order; empty when the contour is a full circle.</summary>
    public IReadOnlyList<Segment> Segments { get; }

    /// <summary>Set when the contour is a full circle.</summary>
    public (Vec2 Center, double Radius)? Circle { get; }

    private Contour(IReadOnlyList<Segment> segments, (Vec2, double)? circle)
    {
        Segments = segments;
        Circle = circle;
    }

    public static Contour FullCircle(Vec2 center, double radius)
    {
        if (!(radius > 0) || !double.IsFinite(radius)) throw new ArgumentOutOfRangeException(nameof(radius));
        return new Contour(Array.Empty<Segment>(), (center, radius));
    }

    public static Contour FromSegments(IReadOnlyList<Segment> segments)
    {
        if (segments.Count == 0) throw new ArgumentException("a contour needs segments", nameof(segments));
        return new Contour(segments.ToArray(), null);
    }

    /// <summary>A closed polygon of straight lines through the points (not repeated at the end).</summary>
    public static Contour Polygon(IReadOnlyList<Vec2> points)
    {
        var segs = new Segment[points.Count];
        for (int i = 0; i < points.Count; i++) segs[i] = new LineSegment(points[i], points[(i + 1) % points.Count]);
        return new Contour(segs, null);
    }

    /// <summary>A rectangle centred on the origin, width along x, height along y, rotated by angleDeg then moved to center.</summary>
    public static Contour Rectangle(Vec2 center, double width, double height, double angleDeg)
    {
        double hw = width / 2, hh = height / 2;
        var pts = new[] { new Vec2(-hw, -hh), new Vec2(hw, -hh), new Vec2(hw, hh), new Vec2(-hw, hh) }
            .Select(p => center + p.RotatedDeg(angleDeg)).ToArray();
        return Polygon(pts);
    }

    /// <summary>
    /// An annular sector about the origin between radii rIn and rOut, from startDeg sweeping sweepDeg (CCW).
    /// rIn = 0 gives a pie slice.
    /// </summary>
    public static Contour AnnularSector(double rIn, double rOut, double startDeg, double sweepDeg)
    {
        var o = new Vec2(0, 0);
        var segs = new List<Segment>();
        var outer = new ArcSegment(o, rOut, startDeg, sweepDeg);
        segs.Add(outer);
        if (rIn > 0)
        {
            var inner = new ArcSegment(o, rIn, startDeg + sweepDeg, -sweepDeg);
            segs.Add(new LineSegment(outer.End, inner.Start));
            segs.Add(inner);
            segs.Add(new LineSegment(inner.End, outer.Start));
        }
        else
        {
            segs.Add(new LineSegment(outer.End, o));
            segs.Add(new LineSegment(o, outer.Start));
        }
        return new Contour(segs, null);
    }

    /// <summary>This contour rotated about the origin (exact: arcs stay arcs).</summary>
    public Contour RotatedDeg(double deg)
    {
        if (Circle is { } c) return FullCircle(c.Center.RotatedDeg(deg), c.Radius);
        return new Contour(Segments.Select(s => Rotate(s, deg)).ToArray(), null);
    }

    /// <summary>This contour mirrored in the x axis (y -> -y); the loop direction is reversed so the orientation is kept.</summary>
    public Contour MirroredY()
    {
        if (Circle is { } c) return FullCircle(new Vec2(c.Center.X, -c.Center.Y), c.Radius);
        var segs = new List<Segment>(Segments.Count);
        for (int i = Segments.Count - 1; i >= 0; i--)
        {
            segs.Add(Segments[i] switch
            {
                LineSegment l => new LineSegment(new Vec2(l.To.X, -l.To.Y), new Vec2(l.From.X, -l.From.Y)),
                ArcSegment a => new ArcSegment(new Vec2(a.Center.X, -a.Center.Y), a.Radius, -(a.StartDeg + a.SweepDeg), a.SweepDeg),
                _ => throw new InvalidOperationException("unknown segment"),
            });
        }
        return new Contour(segs, null);
    }

    public Contour Translated(Vec2 d)
    {
        if (Circle is { } c) return FullCircle(c.Center + d, c.Radius);
        return new Contour(Segments.Select(s => s switch
        {
            LineSegment l => (Segment)new LineSegment(l.From + d, l.To + d),
            ArcSegment a => new ArcSegment(a.Center + d, a.Radius, a.StartDeg, a.SweepDeg),
            _ => throw new InvalidOperationException("unknown segment"),
        }).ToArray(), null);
    }

    private static Segment Rotate(Segment s, double deg) => s switch
    {
        LineSegment l => new LineSegment(l.From.RotatedDeg(deg), l.To.RotatedDeg(deg)),
        ArcSegment a => new ArcSegment(a.Center.RotatedDeg(deg), a.Radius, a.StartDeg + deg, a.SweepDeg),
        _ => throw new InvalidOperationException("unknown segment"),
    };
}
