using PartForge.Geometry.Profiles;
using PartForge.Geometry.Regions;

namespace PartForge.Geometry.Layout;

/// <summary>
/// One part to lay out: an exact outline (outers and holes, lines and true arcs) in part-local
/// coordinates, how many copies, and an id that the placements carry back. Holes travel with their part.
/// </summary>
/// <param name="Id">Unique among the items of one layout.</param>
/// <param name="Profile">The part's outline on the sheet or bed (for printed parts: the footprint in the printing orientation).</param>
/// <param name="Quantity">Copies to place (0 places none).</param>
public sealed record LayoutItem(string Id, Profile Profile, int Quantity)
{
    /// <summary>An item from a polygonal footprint (e.g. the union of a printed part's layers): each ring
    /// becomes an exact polygon contour, so the layout is exact for the polygon.</summary>
    public static LayoutItem FromRegion(string id, Region footprint, int quantity)
    {
        ArgumentNullException.ThrowIfNull(footprint);
        var outers = new List<Contour>();
        var holes = new List<Contour>();
        foreach (var poly in footprint.Polygons)
        {
            outers.Add(RingContour(poly.Shell.Coordinates));
            for (int i = 0; i < poly.NumInteriorRings; i++) holes.Add(RingContour(poly.GetInteriorRingN(i).Coordinates));
        }
        return new LayoutItem(id, new Profile(outers, holes), quantity);
    }

    private static Contour RingContour(NetTopologySuite.Geometries.Coordinate[] closed) =>
        Contour.Polygon(closed.Take(closed.Length - 1).Select(c => new Primitives.Vec2(c.X, c.Y)).ToArray());
}
