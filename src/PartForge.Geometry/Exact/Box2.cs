using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Exact;

/// <summary>An axis-aligned box in the plane, mm.</summary>
public readonly record struct Box2(double MinX, double MinY, double MaxX, double MaxY)
{
    public static Box2 Empty => new(double.PositiveInfinity, double.PositiveInfinity, double.NegativeInfinity, double.NegativeInfinity);

    public Box2 Include(Vec2 p) => new(Math.Min(MinX, p.X), Math.Min(MinY, p.Y), Math.Max(MaxX, p.X), Math.Max(MaxY, p.Y));
    public Box2 Union(Box2 o) => new(Math.Min(MinX, o.MinX), Math.Min(MinY, o.MinY), Math.Max(MaxX, o.MaxX), Math.Max(MaxY, o.MaxY));
    public Box2 Expanded(double d) => new(MinX - d, MinY - d, MaxX + d, MaxY + d);

    /// <summary>Distance between two boxes (0 when they overlap).</summary>
    public double DistanceTo(Box2 o)
    {
        double dx = Math.Max(0, Math.Max(o.MinX - MaxX, MinX - o.MaxX));
        double dy = Math.Max(0, Math.Max(o.MinY - MaxY, MinY - o.MaxY));
        return Math.Sqrt(dx * dx + dy * dy);
    }

    /// <summary>Largest distance of the box from the origin (bounds the radius of anything inside it).</summary>
    public double MaxRadius()
    {
        double x = Math.Max(Math.Abs(MinX), Math.Abs(MaxX)), y = Math.Max(Math.Abs(MinY), Math.Abs(MaxY));
        return Math.Sqrt(x * x + y * y);
    }

    public double Width => MaxX - MinX;
    public double Height => MaxY - MinY;
    public Vec2 Center => new((MinX + MaxX) / 2, (MinY + MaxY) / 2);

    /// <summary>Exact bounds of a contour: line endpoints, arc endpoints and the arc's axis extremes inside its sweep.</summary>
    public static Box2 Of(Contour c)
    {
        if (c.Circle is { } circle)
            return new(circle.Center.X - circle.Radius, circle.Center.Y - circle.Radius, circle.Center.X + circle.Radius, circle.Center.Y + circle.Radius);
        var b = Empty;
        foreach (var s in c.Segments) b = b.Union(Of(s));
        return b;
    }

    public static Box2 Of(Segment s)
    {
        var b = Empty.Include(s.Start).Include(s.End);
        if (s is ArcSegment a)
        {
            for (int k = 0; k < 4; k++)
                if (Exact2D.OnArc(a, 90.0 * k)) b = b.Include(a.Center + Vec2.FromAngleDeg(90.0 * k) * a.Radius);
        }
        return b;
    }
}
