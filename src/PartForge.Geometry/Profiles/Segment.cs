using PartForge.Geometry.Primitives;

namespace PartForge.Geometry.Profiles;

/// <summary>One exact piece of a closed contour: a straight line or a circular arc.</summary>
public abstract record Segment
{
    public abstract Vec2 Start { get; }
    public abstract Vec2 End { get; }
}

/// <summary>A straight line from Start to End.</summary>
public sealed record LineSegment(Vec2 From, Vec2 To) : Segment
{
    public override Vec2 Start => From;
    public override Vec2 End => To;
}

/// <summary>
/// A circular arc about Center, starting at StartDeg and sweeping SweepDeg (positive = counter-clockwise).
/// </summary>
public sealed record ArcSegment(Vec2 Center, double Radius, double StartDeg, double SweepDeg) : Segment
{
    public override Vec2 Start => Center + Vec2.FromAngleDeg(StartDeg) * Radius;
    public override Vec2 End => Center + Vec2.FromAngleDeg(StartDeg + SweepDeg) * Radius;
    public double EndDeg => StartDeg + SweepDeg;
}
