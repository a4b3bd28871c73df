using PartForge.Geometry.Fabrication;
using PartForge.Geometry.Layout;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;

namespace PartForge.Geometry.Tests.Layout;

public class PlatePackerTests
{
    private static readonly Precision P = Precision.FromChordalTolerance(0.01);

    [Fact]
    public void FootprintsOfOrientedSolidsPackWithoutOverlapOnTheBed()
    {
        // Invented printed parts: a tee (prints flipped onto its cap), a flanged ring, a block.
        var stem = Region.FromContour(Contour.FullCircle(new Vec2(0, 0), 8), P);
        var cap = Region.FromContour(Contour.FullCircle(new Vec2(0, 0), 25), P);
        var tee = new LayeredSolid(new[] { new Layer(0, 10, stem), new Layer(10, 13, cap) });
        var flange = Region.FromProfile(Profile.Of(Contour.FullCircle(new Vec2(0, 0), 30), Contour.FullCircle(new Vec2(0, 0), 12)), P);
        var ringBody = Region.FromProfile(Profile.Of(Contour.FullCircle(new Vec2(0, 0), 18), Contour.FullCircle(new Vec2(0, 0), 12)), P);
        var ring = new LayeredSolid(new[] { new Layer(0, 3, flange), new Layer(3, 15, ringBody) });
        var block = LayeredSolid.Extrude(Region.FromContour(Contour.Rectangle(new Vec2(0, 0), 60, 25, 0), P), 0, 8);

        var parts = new List<(LayoutItem Item, double Area)>();
        foreach (var (name, solid, q) in new[] { ("tee", tee, 3), ("ring", ring, 2), ("block", block, 4) })
        {
            var o = PrintOrientation.Choose(solid);
            var foot = PrintOrientation.Footprint(o.Apply(solid));
            var item = LayoutItem.FromRegion(name, foot, q);
            // Area from the region's polygons (NTS), independent of the layout engine.
            parts.Add((item, foot.Geometry.Area));
        }
        var opt = new PlateOptions(180, 180) { SpacingMm = 4 };
        var res = PlatePacker.Pack(parts.Select(p => p.Item).ToArray(), opt, P);
        Assert.True(res.AllPlaced);
        LayoutChecks.AssertValid(res, parts, 4, 0);
        Assert.All(res.Bins, b => Assert.Equal((180.0, 180.0), (b.WidthMm, b.HeightMm)));
        // The three parts' footprints (about 5,900 + 5,650 + 6,000 mm^2) fit one 180 x 180 plate.
        Assert.Single(res.Bins);
    }

    [Fact]
    public void APartLargerThanTheBedIsReportedNotPlaced()
    {
        var big = new LayoutItem("big", Profile.Of(Contour.Rectangle(new Vec2(0, 0), 260, 100, 0)), 1);
        var small = new LayoutItem("small", Profile.Of(Contour.Rectangle(new Vec2(0, 0), 50, 50, 0)), 9);
        var res = PlatePacker.Pack(new[] { big, small }, new PlateOptions(220, 220) { SpacingMm = 3, EdgeMarginMm = 2 }, P);
        Assert.Equal(new[] { new LayoutMiss("big", 0, LayoutMissReason.LargerThanEveryBin) }, res.NotPlaced);
        // Source: geometry: with a 2 mm margin and 3 mm spacing, 4 x 50 + 3 x 3 + 2 x 2 = 213 <= 220, so
        // four fit per row and per column: all nine on one plate.
        Assert.Single(res.Bins);
        LayoutChecks.AssertValid(res, new[] { (big, 260.0 * 100), (small, 2500.0) }, 3, 2);
    }

    [Fact]
    public void ManyCopiesOpenMorePlates()
    {
        // 100 x 100 squares with 5 mm spacing on a 210 x 210 bed: two per row (205 mm), four per plate;
        // ten copies need three plates (4 + 4 + 2).
        var sq = new LayoutItem("sq", Profile.Of(Contour.Rectangle(new Vec2(0, 0), 100, 100, 0)), 10);
        var res = PlatePacker.Pack(new[] { sq }, new PlateOptions(210, 210) { SpacingMm = 5 }, P);
        Assert.Equal(3, res.Bins.Count);
        Assert.Equal(new[] { 4, 4, 2 }, res.Bins.Select(b => b.PartCount).ToArray());
        Assert.Equal(4 * 10000 / (210.0 * 210.0), res.Bins[0].Utilisation, 12);
        LayoutChecks.AssertValid(res, new[] { (sq, 10000.0) }, 5, 0);
    }
}
