using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Exact;

/// <summary>
/// A filled planar shape made of exact contours: one outer boundary and the holes cut out of it. Used by
/// the checker for exact distances (true lines and arcs, no facets).
/// </summary>
public sealed record Shape2D
{
    public Contour Outer { get; }
    public IReadOnlyList<Contour> Holes { get; }

    /// <summary>Axis-aligned bounding box of the outer boundary (exact for arcs).</summary>
    public Box2 Bounds { get; }

    public Shape2D(Contour outer, IReadOnlyList<Contour>? holes = null)
    {
        Outer = outer;
        Holes = holes ?? Array.Empty<Contour>();
        Bounds = Box2.Of(outer);
    }

    public static Shape2D Disc(Vec2 center, double radius) => new(Contour.FullCircle(center, radius));

    /// <summary>An annulus about the origin (rIn = 0 gives a disc).</summary>
    public static Shape2D Annulus(double rIn, double rOut) =>
        new(Contour.FullCircle(new Vec2(0, 0), rOut), rIn > 0 ? new[] { Contour.FullCircle(new Vec2(0, 0), rIn) } : null);

    /// <summary>An annulus centred at a point (a round coil's winding seen from above).</summary>
    public static Shape2D Ring(Vec2 center, double rIn, double rOut) =>
        new(Contour.FullCircle(center, rOut), rIn > 0 ? new[] { Contour.FullCircle(center, rIn) } : null);

    /// <summary>This shape rotated about the origin, exactly (arcs stay arcs).</summary>
    public Shape2D RotatedDeg(double deg) =>
        deg == 0 ? this : new(Outer.RotatedDeg(deg), Holes.Select(h => h.RotatedDeg(deg)).ToArray());

    /// <summary>Every boundary contour, outer first.</summary>
    public IEnumerable<Contour> Boundaries()
    {
        yield return Outer;
        foreach (var h in Holes) yield return h;
    }

    /// <summary>True when the point is inside the outer boundary and outside every hole (boundary counts as inside).</summary>
    public bool Contains(Vec2 p)
    {
        if (!Exact2D.InsideContour(p, Outer)) return false;
        foreach (var h in Holes)
            if (Exact2D.InsideContour(p, h) && Exact2D.PointContour(p, h) > Exact2D.Epsilon) return false;
        return true;
    }
}
