using NetTopologySuite.Algorithm;
using NetTopologySuite.Geometries;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using NtsGeometry = NetTopologySuite.Geometries.Geometry;

namespace PartForge.Geometry.Regions;

/// <summary>
/// One discretised contour with a bounding circle (centre, largest vertex distance) and, for full circles,
/// an inscribed radius, so that the usual "round holes strictly inside a round disc" case is checked for
/// validity in O(h log h) instead of running a general validity test.
/// </summary>
internal sealed class Disc
{
    private Disc(List<Vec2> ring, Vec2 center, double rMax, double rMin, bool isCircle, double grid)
    {
        Ring = ring;
        Center = center;
        RMax = rMax;
        RMin = rMin;
        IsCircle = isCircle;
        Grid = grid;
    }

    public List<Vec2> Ring { get; }
    public Vec2 Center { get; }
    /// <summary>Largest distance of a vertex from the centre: the polygon lies inside this circle.</summary>
    public double RMax { get; }
    /// <summary>For circles: the polygon contains the circle of this radius; 0 otherwise.</summary>
    public double RMin { get; }
    public bool IsCircle { get; }
    public double Grid { get; }

    public static Disc Make(Contour c, Precision prec, bool asHole, int symmetry)
    {
        var ring = ContourDiscretiser.Discretise(c, prec, asHole, symmetry);
        Vec2 center;
        bool isCircle = c.Circle is not null;
        if (c.Circle is { } ci) center = ci.Center;
        else if (ring.Count > 0)
        {
            double x0 = ring.Min(p => p.X), x1 = ring.Max(p => p.X), y0 = ring.Min(p => p.Y), y1 = ring.Max(p => p.Y);
            center = new Vec2((x0 + x1) / 2, (y0 + y1) / 2);
        }
        else center = new Vec2(0, 0);
        double rMax = 0;
        foreach (var p in ring) rMax = Math.Max(rMax, (p - center).Length);
        double rMin = 0;
        if (isCircle && ring.Count >= 3)
        {
            double vMin = double.PositiveInfinity;
            foreach (var p in ring) vMin = Math.Min(vMin, (p - center).Length);
            rMin = vMin * Math.Cos(Math.PI / ring.Count) - prec.GridMm;
        }
        return new Disc(ring, center, rMax + prec.GridMm, rMin, isCircle, prec.GridMm);
    }

    public LinearRing ToRing(GeometryFactory f, bool ccw)
    {
        var coords = new Coordinate[Ring.Count + 1];
        for (int i = 0; i < Ring.Count; i++) coords[i] = new Coordinate(Ring[i].X, Ring[i].Y);
        coords[^1] = coords[0].Copy();
        if (Orientation.IsCCW(coords) != ccw) Array.Reverse(coords);
        return f.CreateLinearRing(coords);
    }

    public Polygon ToPolygon(GeometryFactory f) => f.CreatePolygon(ToRing(f, true));

    /// <summary>
    /// Builds the region directly when it is evidently valid; null when a boolean is needed.
    /// </summary>
    public static NtsGeometry? TryAssemble(List<Disc> outers, List<Disc> holes, GeometryFactory f)
    {
        // Each outer must be a simple ring.
        foreach (var o in outers)
            if (!o.IsCircle && !f.CreateLineString(o.ToRing(f, true).Coordinates).IsSimple) return null;
        foreach (var h in holes)
            if (!h.IsCircle && !f.CreateLineString(h.ToRing(f, true).Coordinates).IsSimple) return null;

        bool allOutersRound = outers.All(o => o.IsCircle);
        var owner = new int[holes.Count];
        for (int i = 0; i < holes.Count; i++)
        {
            owner[i] = -1;
            var h = holes[i];
            for (int k = 0; k < outers.Count; k++)
            {
                var o = outers[k];
                if (o.IsCircle && (h.Center - o.Center).Length + h.RMax < o.RMin) { owner[i] = k; break; }
            }
            if (owner[i] < 0 && allOutersRound) return null;
        }
        if (!PairwiseApart(outers) || !PairwiseApart(holes)) return null;

        var polys = new Polygon[outers.Count];
        for (int k = 0; k < outers.Count; k++)
        {
            var rings = new List<LinearRing>();
            for (int i = 0; i < holes.Count; i++) if (owner[i] == k) rings.Add(holes[i].ToRing(f, false));
            polys[k] = f.CreatePolygon(outers[k].ToRing(f, true), rings.ToArray());
        }
        if (allOutersRound) return polys.Length == 1 ? polys[0] : f.CreateMultiPolygon(polys);

        // General shapes: assign the remaining holes by a point test and let the validity test decide.
        var shells = outers.Select(o => f.CreatePolygon(o.ToRing(f, true))).ToArray();
        var holeLists = outers.Select(_ => new List<LinearRing>()).ToArray();
        for (int i = 0; i < holes.Count; i++)
        {
            int k = owner[i];
            if (k < 0)
            {
                var pt = f.CreatePoint(new Coordinate(holes[i].Ring[0].X, holes[i].Ring[0].Y));
                for (int j = 0; j < shells.Length && k < 0; j++) if (shells[j].Contains(pt)) k = j;
                if (k < 0) return null;
            }
            holeLists[k].Add(holes[i].ToRing(f, false));
        }
        for (int k = 0; k < outers.Count; k++) polys[k] = f.CreatePolygon(outers[k].ToRing(f, true), holeLists[k].ToArray());
        NtsGeometry g = polys.Length == 1 ? polys[0] : f.CreateMultiPolygon(polys);
        return g.IsValid ? g : null;
    }

    /// <summary>True when every pair of bounding circles is clearly apart (sweep over x).</summary>
    private static bool PairwiseApart(List<Disc> ds)
    {
        if (ds.Count < 2) return true;
        var order = ds.OrderBy(d => d.Center.X - d.RMax).ToArray();
        var active = new List<Disc>();
        foreach (var d in order)
        {
            double left = d.Center.X - d.RMax;
            active.RemoveAll(a => a.Center.X + a.RMax < left - d.Grid);
            foreach (var a in active)
                if ((a.Center - d.Center).Length <= a.RMax + d.RMax + d.Grid) return false;
            active.Add(d);
        }
        return true;
    }
}
