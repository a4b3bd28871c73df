using System.Diagnostics.Contracts;
using NetTopologySuite.Algorithm.Construct;
using NetTopologySuite.Geometries;
using NetTopologySuite.Operation.Overlay;
using NetTopologySuite.Operation.OverlayNG;
using NetTopologySuite.Operation.Polygonize;
using NetTopologySuite.Operation.Union;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;
using NtsGeometry = NetTopologySuite.Geometries.Geometry;

namespace PartForge.Geometry.Fabrication;

/// <summary>
/// Which down-facing surfaces of a part in its printing orientation need support: on a mesh (any shape), or
/// exactly on a layered solid (see the kernel README, "Overhang analysis").
/// </summary>
public static class OverhangAnalysis
{
    /// <summary>
    /// The layered solid's unsupported faces, exactly on its regions: at every level, the layer above minus
    /// the layer below (all of the layer above when the layer below ends more than the z tolerance lower). Each connected piece
    /// is one region; its span is the largest distance from a point of it to the part of its boundary that
    /// lies on the layer below (where it rests), found with the geometry library's largest-empty-circle
    /// search within <see cref="OverhangOptions.SpanToleranceMm"/>. The lowest layer rests on the bed. Pass
    /// the solid in its printing orientation (<see cref="PrintOrientation.Apply(LayeredSolid)"/>).
    /// </summary>
    [Pure]
    public static OverhangReport OfSolid(LayeredSolid solid, OverhangOptions options)
    {
        ArgumentNullException.ThrowIfNull(solid);
        ArgumentNullException.ThrowIfNull(options);
        options.Validate();
        var regions = new List<OverhangRegion>();
        var layers = solid.Layers;
        int first = 0;
        while (first < layers.Count && layers[first].Region.IsEmpty) first++;
        for (int k = first + 1; k < layers.Count; k++)
        {
            var above = layers[k].Region;
            if (above.IsEmpty) continue;
            var below = layers[k - 1];
            Region? support = Math.Abs(below.Z1 - layers[k].Z0) <= options.ZToleranceMm && !below.Region.IsEmpty ? below.Region : null;
            var free = support is null ? above : above.Difference(support);
            var pm = new PrecisionModel(above.Precision.Scale);
            foreach (var poly in free.Polygons)
            {
                if (poly.Area < options.MinAreaMm2) continue;
                NtsGeometry? contact = null;
                if (support is not null)
                {
                    var touching = OverlayNG.Overlay(poly.Boundary, support.Geometry, SpatialFunction.Intersection, pm);
                    contact = Lineal(touching, above.Precision.GridMm);
                }
                regions.Add(Describe(poly, layers[k].Z0, poly.Area, isHorizontal: true, contact, options));
            }
        }
        return new OverhangReport(Ordered(regions));
    }

    /// <summary>
    /// The mesh's triangles that face down more than <see cref="OverhangOptions.MaxAngleFromVerticalDeg"/>
    /// from vertical (the angle between the surface and the vertical: asin(-n_z) for a unit normal n facing
    /// down) and are not on the bed (some vertex above the lowest z by more than the z tolerance), grouped
    /// into regions of triangles that share an edge (vertices matched by exact coordinates). For a
    /// horizontal region the span is measured as for a solid, with the region's boundary edges whose
    /// neighbouring triangle goes down from them (a wall below) as the place where it rests. The mesh is in
    /// its printing orientation; it should be closed (an open edge is treated as resting on nothing).
    /// </summary>
    [Pure]
    public static OverhangReport OfMesh(Mesh mesh, OverhangOptions options)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        ArgumentNullException.ThrowIfNull(options);
        options.Validate();
        int nt = mesh.TriangleCount;
        if (nt == 0) return new OverhangReport(Array.Empty<OverhangRegion>());

        // Weld by exact coordinates, so that a mesh read from a file (copied vertices) has its edges shared.
        var ids = new Dictionary<Vec3, int>();
        var pos = new List<Vec3>();
        var tri = new int[3 * nt];
        double zMin = double.PositiveInfinity;
        for (int t = 0; t < nt; t++)
        {
            for (int k = 0; k < 3; k++)
            {
                var p = mesh.Vertices[mesh.Indices[3 * t + k]];
                if (!ids.TryGetValue(p, out int id)) { id = pos.Count; ids[p] = id; pos.Add(p); }
                tri[3 * t + k] = id;
                zMin = Math.Min(zMin, p.Z);
            }
        }

        double sinLimit = Angle.SinDeg(options.MaxAngleFromVerticalDeg);
        double tolZ = options.ZToleranceMm;
        var flagged = new bool[nt];
        for (int t = 0; t < nt; t++)
        {
            Vec3 a = pos[tri[3 * t]], b = pos[tri[3 * t + 1]], c = pos[tri[3 * t + 2]];
            var n = (b - a).Cross(c - a);
            double len = n.Length;
            if (!(len > 0)) continue;
            if (!(-n.Z / len > sinLimit + 1e-9)) continue;
            if (a.Z <= zMin + tolZ && b.Z <= zMin + tolZ && c.Z <= zMin + tolZ) continue; // on the bed
            flagged[t] = true;
        }

        // Edge -> up to two triangles.
        var edgeTris = new Dictionary<long, (int A, int B)>(MixedLongComparer.Instance);
        for (int t = 0; t < nt; t++)
        {
            for (int k = 0; k < 3; k++)
            {
                long key = EdgeKey(tri[3 * t + k], tri[3 * t + (k + 1) % 3]);
                edgeTris[key] = edgeTris.TryGetValue(key, out var e) ? (e.A, e.B < 0 ? t : e.B) : (t, -1);
            }
        }

        // Regions: flagged triangles joined across shared edges (union-find).
        var parent = Enumerable.Range(0, nt).ToArray();
        int Find(int x) { while (parent[x] != x) { parent[x] = parent[parent[x]]; x = parent[x]; } return x; }
        foreach (var (_, (ta, tb)) in edgeTris)
        {
            if (tb < 0 || !flagged[ta] || !flagged[tb]) continue;
            int ra = Find(ta), rb = Find(tb);
            if (ra != rb) parent[Math.Max(ra, rb)] = Math.Min(ra, rb);
        }
        var groups = new SortedDictionary<int, List<int>>();
        for (int t = 0; t < nt; t++)
        {
            if (!flagged[t]) continue;
            int r = Find(t);
            if (!groups.TryGetValue(r, out var list)) groups[r] = list = new List<int>();
            list.Add(t);
        }

        var f = new GeometryFactory();
        var regions = new List<OverhangRegion>();
        foreach (var (_, members) in groups)
        {
            double area = 0, z0 = double.PositiveInfinity, z1 = double.NegativeInfinity;
            foreach (int t in members)
            {
                Vec3 a = pos[tri[3 * t]], b = pos[tri[3 * t + 1]], c = pos[tri[3 * t + 2]];
                area += (b - a).Cross(c - a).Length / 2;
                z0 = Math.Min(z0, Math.Min(a.Z, Math.Min(b.Z, c.Z)));
                z1 = Math.Max(z1, Math.Max(a.Z, Math.Max(b.Z, c.Z)));
            }
            if (area < options.MinAreaMm2) continue;
            bool horizontal = z1 - z0 <= tolZ;
            var plan = Plan(members, tri, pos, horizontal, area, f);
            NtsGeometry? contact = null;
            if (horizontal)
            {
                var inRegion = new HashSet<int>(members);
                var lines = new List<LineString>();
                foreach (int t in members)
                {
                    for (int k = 0; k < 3; k++)
                    {
                        int u = tri[3 * t + k], v = tri[3 * t + (k + 1) % 3];
                        var (ta, tb) = edgeTris[EdgeKey(u, v)];
                        int other = ta == t ? tb : ta;
                        if (other < 0 || inRegion.Contains(other)) continue;
                        // The neighbour's corner off this edge: below it means a wall goes down from here.
                        double edgeZ = Math.Min(pos[u].Z, pos[v].Z);
                        bool down = false;
                        for (int m = 0; m < 3; m++)
                        {
                            int w = tri[3 * other + m];
                            if (w != u && w != v && pos[w].Z < edgeZ - tolZ) down = true;
                        }
                        if (down) lines.Add(f.CreateLineString(new[] { XY(pos[u]), XY(pos[v]) }));
                    }
                }
                contact = lines.Count == 0 ? f.CreateMultiLineString() : f.CreateMultiLineString(lines.ToArray());
            }
            regions.Add(Describe(plan, z0, area, horizontal, contact, options));
        }
        return new OverhangReport(Ordered(regions));
    }

    /// <summary>
    /// A region's triangles in plan. A flat region: its boundary edges (those of one triangle of the region
    /// only) polygonised, O(n log n), kept when its area matches the triangles'; otherwise, and for sloped
    /// regions (whose triangles may overlap in plan), the union of the triangles.
    /// </summary>
    private static NtsGeometry Plan(List<int> members, int[] tri, List<Vec3> pos, bool horizontal, double area, GeometryFactory f)
    {
        if (horizontal)
        {
            var count = new Dictionary<long, int>(MixedLongComparer.Instance);
            foreach (int t in members)
                for (int k = 0; k < 3; k++)
                {
                    long key = EdgeKey(tri[3 * t + k], tri[3 * t + (k + 1) % 3]);
                    count[key] = count.TryGetValue(key, out int c) ? c + 1 : 1;
                }
            var lines = new List<NtsGeometry>();
            foreach (var (key, c) in count)
            {
                if (c != 1) continue;
                int u = (int)(key >> 32), v = (int)(key & 0xFFFFFFFF);
                lines.Add(f.CreateLineString(new[] { XY(pos[u]), XY(pos[v]) }));
            }
            var pz = new Polygonizer(extractOnlyPolygonal: true);
            pz.Add(lines);
            var polys = pz.GetGeometry();
            if (!polys.IsEmpty && Math.Abs(polys.Area - area) <= 1e-9 * Math.Max(1, area)) return polys;
        }
        return UnaryUnionOp.Union((NtsGeometry)f.CreateGeometryCollection(members.Select(t => (NtsGeometry)f.CreatePolygon(new[]
        {
            XY(pos[tri[3 * t]]), XY(pos[tri[3 * t + 1]]), XY(pos[tri[3 * t + 2]]), XY(pos[tri[3 * t]]),
        })).Where(p => p.Area > 0).ToArray()));
    }

    private static OverhangRegion Describe(NtsGeometry plan, double z, double area, bool isHorizontal, NtsGeometry? contact, OverhangOptions options)
    {
        var env = plan.EnvelopeInternal;
        var cen = plan.Centroid;
        var min = new Vec2(env.MinX, env.MinY);
        var max = new Vec2(env.MaxX, env.MaxY);
        var centroid = cen.IsEmpty ? (min + max) * 0.5 : new Vec2(cen.X, cen.Y);
        if (!isHorizontal) return new OverhangRegion(z, area, min, max, centroid, false, false, null, null);
        if (contact is null || contact.IsEmpty) return new OverhangRegion(z, area, min, max, centroid, true, true, null, null);
        var radius = LargestEmptyCircle.GetRadiusLine(contact, plan, options.SpanToleranceMm);
        var c = radius.GetCoordinateN(0);
        return new OverhangRegion(z, area, min, max, centroid, true, false, radius.Length, new Vec2(c.X, c.Y));
    }

    /// <summary>The line work of an overlay result longer than a grid step (points and specks dropped), or null.</summary>
    private static NtsGeometry? Lineal(NtsGeometry g, double gridMm)
    {
        var lines = new List<LineString>();
        for (int i = 0; i < g.NumGeometries; i++)
            if (g.GetGeometryN(i) is LineString l && l.Length > gridMm) lines.Add(l);
        return lines.Count == 0 ? null : g.Factory.CreateMultiLineString(lines.ToArray());
    }

    private static List<OverhangRegion> Ordered(List<OverhangRegion> regions) =>
        regions.OrderBy(r => r.ZMm).ThenByDescending(r => r.AreaMm2).ThenBy(r => r.MinXY.X).ThenBy(r => r.MinXY.Y).ToList();

    private static Coordinate XY(Vec3 p) => new(p.X, p.Y);

    private static long EdgeKey(int u, int v) => u < v ? ((long)u << 32) | (uint)v : ((long)v << 32) | (uint)u;
}
