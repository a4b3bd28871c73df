using CsCheck;
using PartForge.Geometry.Layout;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Tests.Layout;

public class SheetNesterTests
{
    private static readonly Precision Fine = Precision.FromChordalTolerance(0.01);

    private static LayoutItem Item(string id, Profile p, int q) => new(id, p, q);

    private static (LayoutItem Item, double Area)[] Parts(params (LayoutItem Item, double Area)[] p) => p;

    [Fact]
    public void FourSquaresFillOneSheetExactly()
    {
        // Source: geometry: four 100 x 100 squares tile a 200 x 200 sheet, so the optimum is one sheet at 100%.
        var (sq, area) = TestShapes.Rectangle(100, 100);
        var parts = Parts((Item("sq", sq, 4), area));
        var res = SheetNester.Nest(parts.Select(p => p.Item).ToArray(), new[] { new SheetStock(200, 200) }, new NestOptions { SpacingMm = 0 }, Fine);
        Assert.Single(res.Bins);
        Assert.Equal(1.0, res.Bins[0].Utilisation, 12);
        LayoutChecks.AssertValid(res, parts, 0, 0);
        // Bottom-left order: lower row first, left to right.
        Assert.Equal(new[] { new Vec2(50, 50), new Vec2(150, 50), new Vec2(50, 150), new Vec2(150, 150) }, res.Placements.Select(p => p.OffsetMm).ToArray());
    }

    [Fact]
    public void DiscsInARowFillAStripExactly()
    {
        // Source: geometry: four discs of diameter 100 touching in a row fill a 400 x 100 strip.
        var disc = Profile.Of(Contour.FullCircle(new Vec2(0, 0), 50));
        var parts = Parts((Item("disc", disc, 4), Math.PI * 2500));
        var res = SheetNester.Nest(parts.Select(p => p.Item).ToArray(), new[] { new SheetStock(400, 100) }, new NestOptions { SpacingMm = 0 }, Fine);
        Assert.Single(res.Bins);
        Assert.True(res.AllPlaced);
        LayoutChecks.AssertValid(res, parts, 0, 0);
        Assert.Equal(new[] { 50.0, 150, 250, 350 }, res.Placements.Select(p => Math.Round(p.OffsetMm.X, 9)).ToArray());
    }

    [Fact]
    public void FiveDiscsTakeTheHexagonalPacking()
    {
        // Source: geometry of touching circles (hexagonal packing): a row of three discs of diameter D on
        // the bottom edge and two more in the hollows reach a height of D + D sqrt(3) / 2 = 186.60 for
        // D = 100. A 300 x 187 sheet holds all five only in that arrangement.
        var disc = Profile.Of(Contour.FullCircle(new Vec2(0, 0), 50));
        var parts = Parts((Item("disc", disc, 5), Math.PI * 2500));
        var res = SheetNester.Nest(parts.Select(p => p.Item).ToArray(), new[] { new SheetStock(300, 187) }, new NestOptions { SpacingMm = 0 }, Precision.FromChordalTolerance(0.005));
        Assert.Single(res.Bins);
        LayoutChecks.AssertValid(res, parts, 0, 0);
        Assert.Equal(5 * Math.PI * 2500 / (300 * 187.0), res.Bins[0].Utilisation, 9);
    }

    [Fact]
    public void ThreeDiscsNestInTheHollowOfTwo()
    {
        // Source: geometry of touching circles: two discs of diameter D side by side on the bottom edge and
        // a third resting in the hollow between them reach a height of D + D sqrt(3) / 2 (186.60 for D = 100).
        // A sheet 200 x 187 holds all three only if the third goes into the hollow (where two no-fit
        // polygons cross), not on top of one of them (height 200).
        var disc = Profile.Of(Contour.FullCircle(new Vec2(0, 0), 50));
        var parts = Parts((Item("disc", disc, 3), Math.PI * 2500));
        var res = SheetNester.Nest(parts.Select(p => p.Item).ToArray(), new[] { new SheetStock(200, 187) }, new NestOptions { SpacingMm = 0 }, Precision.FromChordalTolerance(0.005));
        Assert.Single(res.Bins);
        LayoutChecks.AssertValid(res, parts, 0, 0);
        var third = res.Placements[2].OffsetMm;
        Assert.Equal(100, third.X, 1);
        Assert.InRange(third.Y, 50 + 50 * Math.Sqrt(3), 50 + 50 * Math.Sqrt(3) + 0.05);
    }

    [Fact]
    public void SpacingIsKeptBetweenPartsAndFromTheEdge()
    {
        // With spacing s, two 100 x 100 squares need 100 + 100 + 3 s along x; at s = 5 a 315-wide sheet is
        // just enough for two side by side, a 314-wide one is not (geometry).
        var (sq, area) = TestShapes.Rectangle(100, 100);
        var parts = Parts((Item("sq", sq, 2), area));
        var opt = new NestOptions { SpacingMm = 5, RotationsDeg = LayoutRotations.None };
        var wide = SheetNester.Nest(parts.Select(p => p.Item).ToArray(), new[] { new SheetStock(215, 110) }, opt, Fine);
        Assert.Single(wide.Bins);
        LayoutChecks.AssertValid(wide, parts, 5, 5);
        var narrow = SheetNester.Nest(parts.Select(p => p.Item).ToArray(), new[] { new SheetStock(214.999, 110) }, opt, Fine);
        Assert.Equal(2, narrow.Bins.Count);
        LayoutChecks.AssertValid(narrow, parts, 5, 5);
    }

    [Fact]
    public void MixedPartsAreValidDeterministicAndAccounted()
    {
        var parts = MixedParts();
        var items = parts.Select(p => p.Item).ToArray();
        var sheets = new[] { new SheetStock(500, 400) };
        var opt = new NestOptions { SpacingMm = 3 };
        var a = SheetNester.Nest(items, sheets, opt, Fine);
        var b = SheetNester.Nest(items, sheets, opt, Fine);
        Assert.True(a.AllPlaced);
        LayoutChecks.AssertValid(a, parts, 3, 3);
        // Determinism: the same input gives the same placements, in the same order, to the last bit.
        Assert.Equal(a.Placements, b.Placements);
        Assert.Equal(a.Bins, b.Bins);
        // Sheets can't hold more than their area: a lower bound on the count.
        double total = parts.Sum(p => p.Area * p.Item.Quantity);
        Assert.True(a.Bins.Count >= Math.Ceiling(total / (500.0 * 400.0)));
    }

    [Fact]
    public void RotationsByAnyStepStayValid()
    {
        var parts = MixedParts().Take(3).ToArray();
        var res = SheetNester.Nest(parts.Select(p => p.Item).ToArray(), new[] { new SheetStock(400, 300) },
            new NestOptions { SpacingMm = 2, RotationsDeg = LayoutRotations.Every(30) }, Fine);
        LayoutChecks.AssertValid(res, parts, 2, 2);
        Assert.True(res.AllPlaced);
    }

    [Fact]
    public void PartsTooLargeOrSheetsUsedUpAreReportedNotPlaced()
    {
        var (big, bigArea) = TestShapes.Rectangle(300, 50);
        var (sq, area) = TestShapes.Rectangle(100, 100);
        var parts = Parts((Item("big", big, 1), bigArea), (Item("sq", sq, 3), area));
        var res = SheetNester.Nest(parts.Select(p => p.Item).ToArray(), new[] { new SheetStock(110, 110, 2) }, new NestOptions { SpacingMm = 2 }, Fine);
        Assert.Equal(2, res.Bins.Count);
        Assert.Contains(res.NotPlaced, m => m.PartId == "big" && m.Reason == LayoutMissReason.LargerThanEveryBin);
        Assert.Contains(res.NotPlaced, m => m.PartId == "sq" && m.Reason == LayoutMissReason.NoBinLeft);
        LayoutChecks.AssertValid(res, parts, 2, 2);
    }

    [Fact]
    public void SheetSizesAreTriedInTheOrderGiven()
    {
        // The rule: a new sheet is the first size in the list that still has sheets and holds the part.
        var (sq, area) = TestShapes.Rectangle(100, 100);
        var (big, bigArea) = TestShapes.Rectangle(150, 150);
        var parts = Parts((Item("big", big, 1), bigArea), (Item("sq", sq, 2), area));
        var stocks = new[] { new SheetStock(120, 120, 5), new SheetStock(400, 400, 1) };
        var res = SheetNester.Nest(parts.Select(p => p.Item).ToArray(), stocks, new NestOptions { SpacingMm = 2 }, Fine);
        // big does not fit the first size: it opens the second; the squares then fit beside it there.
        Assert.Single(res.Bins);
        Assert.Equal(1, res.Bins[0].StockIndex);
        LayoutChecks.AssertValid(res, parts, 2, 2);
    }

    [Fact]
    public void RandomScenesAreAlwaysValid()
    {
        // Random parts (shapes, sizes, quantities, placed at random local offsets), spacing, sheet sizes and
        // rotation sets: every layout must pass the same exact checks.
        Gen.Int.Sample(seed =>
        {
            var rnd = new Random(seed);
            var parts = new List<(LayoutItem Item, double Area)>();
            int kinds = 1 + rnd.Next(5);
            for (int k = 0; k < kinds; k++)
            {
                double u = 5 + 60 * rnd.NextDouble();
                (Profile P, double A) shape = rnd.Next(5) switch
                {
                    0 => TestShapes.DiscWithHoles(u, 0.1 * u, 0.05 * u),
                    1 => TestShapes.PolygonDisc(u, 3 + rnd.Next(300), 0.2 * u),
                    2 => TestShapes.Ring(u, 0.6 * u),
                    3 => TestShapes.Fork(u, 0.7 * u, 0.2 * u, 0.4 * u),
                    _ => TestShapes.Rectangle(u, u * (0.1 + rnd.NextDouble())),
                };
                // Part-local origin anywhere: the layout must not assume a centred part.
                var shift = new Vec2(rnd.NextDouble() * 100 - 50, rnd.NextDouble() * 100 - 50);
                var moved = new Profile(shape.P.Outers.Select(c => c.Translated(shift)).ToArray(), shape.P.Holes.Select(c => c.Translated(shift)).ToArray());
                parts.Add((new LayoutItem($"p{k}", moved, 1 + rnd.Next(6)), shape.A));
            }
            double spacing = rnd.Next(3) == 0 ? 0 : 5 * rnd.NextDouble();
            var sheets = Enumerable.Range(0, 1 + rnd.Next(2)).Select(_ => new SheetStock(60 + 300 * rnd.NextDouble(), 60 + 300 * rnd.NextDouble(), rnd.Next(3) == 0 ? 1 + rnd.Next(3) : null)).ToArray();
            var rotations = rnd.Next(3) switch { 0 => LayoutRotations.None, 1 => LayoutRotations.QuarterTurns, _ => LayoutRotations.Every(15 + rnd.Next(60)) };
            var res = SheetNester.Nest(parts.Select(p => p.Item).ToArray(), sheets, new NestOptions { SpacingMm = spacing, RotationsDeg = rotations }, Fine);
            LayoutChecks.AssertValid(res, parts, spacing, spacing);
        }, iter: 40);
    }

    [Fact]
    public void BadInputIsAnArgumentError()
    {
        var (sq, _) = TestShapes.Rectangle(10, 10);
        var one = new[] { Item("a", sq, 1) };
        var sheet = new[] { new SheetStock(100, 100) };
        Assert.Throws<ArgumentOutOfRangeException>(() => SheetNester.Nest(one, sheet, new NestOptions { SpacingMm = -1 }, Fine));
        Assert.Throws<ArgumentException>(() => SheetNester.Nest(new[] { Item("a", sq, 1), Item("a", sq, 1) }, sheet, new NestOptions(), Fine));
        Assert.Throws<ArgumentException>(() => SheetNester.Nest(one, new[] { new SheetStock(0, 100) }, new NestOptions(), Fine));
        Assert.Throws<ArgumentException>(() => SheetNester.Nest(one, sheet, new NestOptions { RotationsDeg = Array.Empty<double>() }, Fine));
        Assert.Throws<ArgumentException>(() => SheetNester.Nest(new[] { Item("a", sq, -1) }, sheet, new NestOptions(), Fine));
    }

    /// <summary>A mixed set: discs with holes, polygon discs of 100-400 segments, rings, forks, rectangles.</summary>
    internal static (LayoutItem Item, double Area)[] MixedParts()
    {
        var list = new List<(LayoutItem, double)>();
        void Add(string id, (Profile P, double A) s, int q) => list.Add((new LayoutItem(id, s.P, q), s.A));
        Add("disc60", TestShapes.DiscWithHoles(60, 10, 3), 2);
        Add("disc35", TestShapes.DiscWithHoles(35, 6, 2.5), 3);
        Add("poly100", TestShapes.PolygonDisc(45, 100, 8), 2);
        Add("poly400", TestShapes.PolygonDisc(55, 400, 12), 1);
        Add("ring", TestShapes.Ring(40, 30), 3);
        Add("fork", TestShapes.Fork(60, 40, 12, 25), 4);
        Add("rect", TestShapes.Rectangle(80, 30), 4);
        Add("tab", TestShapes.Rectangle(25, 12), 6);
        return list.ToArray();
    }
}
