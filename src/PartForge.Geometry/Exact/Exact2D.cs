using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Exact;

/// <summary>
/// Exact measurements on contours of lines and true arcs (never on their polygons): distances between points,
/// segments, contours and filled shapes; radial extents, support in a direction, where a ray leaves a contour,
/// bounds; and the half-plane clip of a convex contour. The one home of these queries in the kernel, with one
/// tolerance (<see cref="Epsilon"/> for lengths, <see cref="AngleEpsilonDeg"/> for the sweep tests of arcs).
/// Split by concern: Exact2D.Distance.cs, Exact2D.Extent.cs, Exact2D.Clip.cs.
/// </summary>
public static partial class Exact2D
{
    /// <summary>Lengths below this (mm) count as zero: touching shapes, degenerate segments.</summary>
    public const double Epsilon = 1e-9;

    /// <summary>An angle within this of an arc's sweep (degrees) counts as on the arc.</summary>
    public const double AngleEpsilonDeg = 1e-9;

    /// <summary>The segments of a contour; a full circle becomes one 360-degree arc.</summary>
    public static IReadOnlyList<Segment> SegmentsOf(Contour c) =>
        c.Circle is { } circle ? new Segment[] { new ArcSegment(circle.Center, circle.Radius, 0, 360) } : c.Segments;

    /// <summary>True when the direction angle (degrees) lies within the arc's sweep (ends included).</summary>
    public static bool OnArc(ArcSegment a, double deg)
    {
        double sweep = a.SweepDeg;
        if (Math.Abs(sweep) >= 360 - 1e-12) return true;
        double delta = sweep >= 0 ? Angle.Normalize360(deg - a.StartDeg) : Angle.Normalize360(a.StartDeg - deg);
        if (delta > 360 - AngleEpsilonDeg) delta -= 360;
        return delta <= Math.Abs(sweep) + AngleEpsilonDeg;
    }

    /// <summary>Angle of a vector in degrees, (-180, 180].</summary>
    public static double AngleOf(Vec2 v) => Math.Atan2(v.Y, v.X) * 180.0 / Math.PI;

    /// <summary>The point of a segment at its middle (arcs: at half the sweep).</summary>
    public static Vec2 Midpoint(Segment s) => s switch
    {
        LineSegment l => (l.From + l.To) * 0.5,
        ArcSegment a => a.Center + Vec2.FromAngleDeg(a.StartDeg + a.SweepDeg / 2) * a.Radius,
        _ => throw new ArgumentException("unknown segment", nameof(s)),
    };
}
