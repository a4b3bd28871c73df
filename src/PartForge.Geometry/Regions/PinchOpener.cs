using NetTopologySuite.Algorithm;
using NetTopologySuite.Geometries;
using NtsGeometry = NetTopologySuite.Geometries.Geometry;

namespace PartForge.Geometry.Regions;

/// <summary>
/// Rings of a valid polygon may touch at a point (a hole touching the outer ring, a through pocket at the rim;
/// two holes or two outers touching). Extruded, such a point becomes an edge shared by four walls, which no
/// 2-manifold mesh can have. The touching vertex of the later ring is moved one grid step into that ring's
/// own area (into the hole, or into the outer's material), which separates the rings by about one grid step
/// (1e-4 mm on the default grid) and changes the area by less than a grid cell per touch.
/// </summary>
internal static class PinchOpener
{
    public static NtsGeometry Open(NtsGeometry g, GeometryFactory f)
    {
        if (g.IsEmpty) return g;
        var seen = new HashSet<(double, double)>();
        bool any = false;
        for (int p = 0; p < g.NumGeometries && !any; p++)
        {
            var poly = (Polygon)g.GetGeometryN(p);
            foreach (var ring in Rings(poly))
            {
                var local = new HashSet<(double, double)>();
                var c = ring.Coordinates;
                for (int i = 0; i < c.Length - 1; i++) local.Add((c[i].X, c[i].Y));
                foreach (var k in local) if (!seen.Add(k)) { any = true; break; }
                if (any) break;
            }
        }
        if (!any) return g;

        seen.Clear();
        double step = 1.0 / f.PrecisionModel.Scale;
        var polys = new List<Polygon>();
        for (int p = 0; p < g.NumGeometries; p++)
        {
            var poly = (Polygon)g.GetGeometryN(p);
            var rings = Rings(poly).Select(r => Fix(r, seen, step, f)).ToArray();
            polys.Add(f.CreatePolygon(rings[0], rings.Skip(1).ToArray()));
        }
        NtsGeometry res = polys.Count == 1 ? polys[0] : f.CreateMultiPolygon(polys.ToArray());
        return res.IsValid ? res : g;
    }

    private static IEnumerable<LinearRing> Rings(Polygon p)
    {
        yield return (LinearRing)p.Shell;
        for (int i = 0; i < p.NumInteriorRings; i++) yield return (LinearRing)p.GetInteriorRingN(i);
    }

    private static LinearRing Fix(LinearRing ring, HashSet<(double, double)> seen, double step, GeometryFactory f)
    {
        var c = ring.Coordinates.Select(x => new Coordinate(x.X, x.Y)).ToArray();
        int n = c.Length - 1;
        bool ccw = Orientation.IsCCW(c);
        var moved = false;
        for (int i = 0; i < n; i++)
        {
            if (!seen.Contains((c[i].X, c[i].Y))) continue;
            // Candidate neighbours of the grid point, nearest first, inside this ring's own area:
            // left of both adjacent edges for a counter-clockwise ring, right of them for a clockwise one.
            var prev = c[(i + n - 1) % n]; var next = c[i + 1];
            foreach (var (dx, dy) in new[] { (0, 1), (1, 0), (0, -1), (-1, 0), (1, 1), (1, -1), (-1, -1), (-1, 1) })
            {
                var q = new Coordinate(c[i].X + dx * step, c[i].Y + dy * step);
                int s1 = (int)Orientation.Index(prev, c[i], q), s2 = (int)Orientation.Index(c[i], next, q);
                int want = ccw ? 1 : -1;
                if (s1 == want && s2 == want && !seen.Contains((q.X, q.Y)))
                {
                    c[i] = q;
                    moved = true;
                    break;
                }
            }
        }
        if (moved) c[n] = c[0].Copy();
        for (int i = 0; i < n; i++) seen.Add((c[i].X, c[i].Y));
        return moved ? f.CreateLinearRing(c) : ring;
    }
}
