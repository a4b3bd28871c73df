using NetTopologySuite.Geometries;
using NetTopologySuite.Operation.Distance;
using PartForge.Geometry.Layout;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Tests.Layout;

/// <summary>
/// The properties every layout must have, checked on the test's own polygons of the exact parts
/// (<see cref="TestShapes"/>), not on anything the layout engine made.
/// </summary>
internal static class LayoutChecks
{
    /// <summary>Slack for the test polygons: their edges are within ChordMm of the exact outline, on either side for concave arcs.</summary>
    public const double SlackMm = 2 * TestShapes.ChordMm + 1e-6;

    public static void AssertValid(LayoutResult res, IReadOnlyList<(LayoutItem Item, double Area)> parts, double spacingMm, double edgeMarginMm)
    {
        var byId = parts.ToDictionary(p => p.Item.Id, p => p);

        // Every copy placed or reported, once.
        var seen = new HashSet<(string, int)>();
        foreach (var p in res.Placements) Assert.True(seen.Add((p.PartId, p.Copy)), $"{p.PartId}#{p.Copy} placed twice");
        foreach (var m in res.NotPlaced) Assert.True(seen.Add((m.PartId, m.Copy)), $"{m.PartId}#{m.Copy} both placed and missed");
        var expected = parts.SelectMany(p => Enumerable.Range(0, p.Item.Quantity).Select(c => (p.Item.Id, c))).ToHashSet();
        Assert.True(expected.SetEquals(seen), "the placed and missed copies are not exactly the copies asked for");

        foreach (var bin in res.Bins)
        {
            var on = res.Placements.Where(p => p.BinIndex == bin.Index).ToList();
            Assert.Equal(bin.PartCount, on.Count);
            var polys = new List<(Polygon Outer, Envelope Env, string Name)>();
            double areaSum = 0;
            foreach (var p in on)
            {
                var (item, area) = byId[p.PartId];
                var placed = p.Place(item.Profile);
                areaSum += area;

                // Inside the bin by the edge margin, on exact bounds.
                var (x0, y0, x1, y1) = TestShapes.Bounds(placed.Outers);
                Assert.True(x0 >= edgeMarginMm - 1e-6 && y0 >= edgeMarginMm - 1e-6, $"{p.PartId}#{p.Copy} closer than {edgeMarginMm} to the lower/left edge: ({x0}, {y0})");
                Assert.True(x1 <= bin.WidthMm - edgeMarginMm + 1e-6 && y1 <= bin.HeightMm - edgeMarginMm + 1e-6, $"{p.PartId}#{p.Copy} closer than {edgeMarginMm} to the upper/right edge: ({x1}, {y1})");

                // Holes inside their own part (they moved with it).
                var outer = TestShapes.OuterPolygon(placed.Outers[0]);
                foreach (var h in placed.Holes) Assert.True(outer.Contains(TestShapes.OuterPolygon(h)), $"a hole of {p.PartId}#{p.Copy} left its part");
                polys.Add((outer, outer.EnvelopeInternal, $"{p.PartId}#{p.Copy}"));
            }

            // No overlap, and at least the spacing apart.
            for (int i = 0; i < polys.Count; i++)
            {
                for (int j = i + 1; j < polys.Count; j++)
                {
                    var a = polys[i]; var b = polys[j];
                    if (a.Env.Distance(b.Env) > spacingMm + 1) continue;
                    Assert.True(a.Outer.Intersection(b.Outer).Area <= 1e-9, $"{a.Name} overlaps {b.Name}");
                    double d = DistanceOp.Distance(a.Outer, b.Outer);
                    Assert.True(d >= spacingMm - SlackMm, $"{a.Name} and {b.Name} are {d} mm apart (spacing {spacingMm})");
                }
            }

            // Utilisation from the analytic areas.
            Assert.Equal(areaSum, bin.PartAreaMm2, 6);
            Assert.Equal(areaSum / (bin.WidthMm * bin.HeightMm), bin.Utilisation, 9);
        }
    }
}
