using NetTopologySuite.Geometries;
using PartForge.Geometry.Fabrication;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Tests.Layout;
using LineSegment = PartForge.Geometry.Profiles.LineSegment;

namespace PartForge.Geometry.Tests.Fabrication;

public class CornerReliefTests
{
    private static readonly Precision P = Precision.FromChordalTolerance(0.001);

    // ---- exact geometry written in the test ----

    /// <summary>Exact distance from a point to a line or arc piece.</summary>
    private static double Distance(Vec2 p, Segment s)
    {
        switch (s)
        {
            case LineSegment l:
                return ConvexDistance(p, l.From, l.To);
            case ArcSegment a:
            {
                double ang = Math.Atan2(p.Y - a.Center.Y, p.X - a.Center.X) * 180 / Math.PI;
                double rel = ((Math.Sign(a.SweepDeg) * (ang - a.StartDeg)) % 360 + 360) % 360;
                if (rel <= Math.Abs(a.SweepDeg)) return Math.Abs((p - a.Center).Length - a.Radius);
                return Math.Min((p - a.Start).Length, (p - a.End).Length);
            }
            default: throw new InvalidOperationException();
        }
    }

    private static double ConvexDistance(Vec2 p, Vec2 a, Vec2 b)
    {
        Vec2 d = b - a;
        double t = Math.Clamp((p - a).Dot(d) / d.Dot(d), 0, 1);
        return (p - (a + d * t)).Length;
    }

    /// <summary>Exact signed area: shoelace over the chords plus each arc's circular segment, r^2 (phi - sin phi) / 2.</summary>
    private static double Area(Contour c)
    {
        double twice = 0;
        foreach (var s in c.Segments)
        {
            twice += s.Start.X * s.End.Y - s.End.X * s.Start.Y;
            if (s is ArcSegment a) { double phi = a.SweepDeg * Math.PI / 180; twice += a.Radius * a.Radius * (phi - Math.Sin(phi)); }
        }
        return twice / 2;
    }

    private static Contour Polygon(params (double X, double Y)[] p) => Contour.Polygon(p.Select(q => new Vec2(q.X, q.Y)).ToArray());

    /// <summary>
    /// The tool can cut the nominal corner v: a disc of radius rho centred rho from v along the bisector
    /// into the cut touches v, lies inside the relieved cut (its centre is inside and at least rho from every
    /// piece of the relieved contour, exactly).
    /// </summary>
    private static void AssertToolReaches(Contour relieved, Vec2 v, Vec2 bisector, double rho)
    {
        Vec2 q = v + bisector * rho;
        Assert.Equal(rho, (q - v).Length, 12);
        double d = relieved.Segments.Min(s => Distance(q, s));
        Assert.True(d >= rho - 1e-9, $"the tool of radius {rho} at ({q.X}, {q.Y}) would cut {rho - d} mm into the material");
        Assert.True(TestShapes.OuterPolygon(relieved).Contains(new GeometryFactory().CreatePoint(new Coordinate(q.X, q.Y))));
    }

    private static void AssertJoined(Contour c)
    {
        for (int i = 0; i < c.Segments.Count; i++)
        {
            var s = c.Segments[i]; var t = c.Segments[(i + 1) % c.Segments.Count];
            if (s is LineSegment || t is LineSegment) Assert.Equal(s.End, t.Start); // bit for bit
            else Assert.True((s.End - t.Start).Length < 1e-12);
        }
    }

    private static readonly Vec2[] RectCorners = { new(0, 0), new(20, 0), new(20, 10), new(0, 10) };
    private static readonly Vec2[] RectBisectors = { new(Math.Sqrt(0.5), Math.Sqrt(0.5)), new(-Math.Sqrt(0.5), Math.Sqrt(0.5)), new(-Math.Sqrt(0.5), -Math.Sqrt(0.5)), new(Math.Sqrt(0.5), -Math.Sqrt(0.5)) };

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void DogBonesLetTheToolCutEveryCornerOfARectangularHole(bool clockwise)
    {
        var hole = Polygon((0, 0), (20, 0), (20, 10), (0, 10));
        if (clockwise) hole = ContourOffset.Reversed(hole);
        double r = 1.5;
        var rule = new DogBoneRelief(r);
        var relieved = CornerRelief.RelieveHole(hole, rule, P);

        Assert.Equal(8, relieved.Segments.Count);
        Assert.Equal(4, relieved.Segments.OfType<ArcSegment>().Count());
        Assert.Equal(Math.Sign(Area(hole)), Math.Sign(Area(relieved))); // loop direction kept
        AssertJoined(relieved);
        double big = r + rule.ClearanceMm;
        foreach (var a in relieved.Segments.OfType<ArcSegment>())
        {
            Assert.Equal(big, a.Radius, 12);
            Assert.Equal(180, Math.Abs(a.SweepDeg), 9); // a half circle at a right angle
            // The notch circle passes through its corner.
            Assert.Contains(RectCorners, v => Math.Abs((v - a.Center).Length - big) < 1e-12);
        }
        for (int k = 0; k < 4; k++) AssertToolReaches(relieved, RectCorners[k], RectBisectors[k], r);

        // Source: area of a circular segment, R^2 acos(d / R) - d sqrt(R^2 - d^2); each right-angle notch adds
        // two segments at d = R / sqrt(2): R^2 (pi / 2 - 1).
        Assert.Equal(200 + 4 * big * big * (Math.PI / 2 - 1), Math.Abs(Area(relieved)), 9);

        // Independent numeric check (NTS, its own buffer): the opening by r of the relieved hole (what a tool
        // of radius r sweeps) covers the nominal rectangle; without reliefs it misses the four corner rounds,
        // 4 r^2 (1 - pi / 4) = 1.93 mm^2.
        var nominal = TestShapes.OuterPolygon(hole);
        var swept = TestShapes.OuterPolygon(relieved).Buffer(-r, 64).Buffer(r, 64);
        Assert.True(nominal.Difference(swept).Area < 1e-3);
        var sweptPlain = nominal.Buffer(-r, 64).Buffer(r, 64);
        Assert.Equal(4 * r * r * (1 - Math.PI / 4), nominal.Difference(sweptPlain).Area, 2);
    }

    [Fact]
    public void KerfCompensationOfADogBonedHoleTakesTheBeamIntoTheCorner()
    {
        // The beam's centre path is the hole offset inward by the kerf half-width; with the notch's
        // clearance it keeps a small arc, and it passes r from the corner on the bisector (so the beam's edge
        // reaches the corner).
        double r = 0.1;
        var relieved = CornerRelief.RelieveHole(Polygon((0, 0), (20, 0), (20, 10), (0, 10)), new DogBoneRelief(r), P);
        var path = ContourOffset.Offset(relieved, -r);
        for (int k = 0; k < 4; k++)
        {
            Vec2 q = RectCorners[k] + RectBisectors[k] * r;
            Assert.True(path.Segments.Min(s => Distance(q, s)) < 1e-9);
        }
    }

    [Fact]
    public void CornersConvexFromTheMaterialAreLeftAlone()
    {
        // An L-shaped hole: five corners under 180 degrees seen from the hole, one reflex (20, 10).
        var hole = Polygon((0, 0), (30, 0), (30, 10), (20, 10), (20, 20), (0, 20));
        var relieved = CornerRelief.RelieveHole(hole, new DogBoneRelief(1), P);
        Assert.Equal(5, relieved.Segments.OfType<ArcSegment>().Count());
        // The reflex corner is still a corner of two unchanged-direction lines, exactly where it was.
        Assert.Contains(relieved.Segments, s => s is LineSegment && s.End == new Vec2(20, 10));
        Assert.Contains(relieved.Segments, s => s is LineSegment && s.Start == new Vec2(20, 10));
        Assert.True(TestShapes.OuterPolygon(relieved).IsValid);
        Assert.True(TestShapes.OuterPolygon(relieved).Contains(TestShapes.OuterPolygon(hole).Buffer(-1e-6)));
    }

    [Fact]
    public void AnOuterOutlineIsRelievedAtTheInnerCornersOfItsSlot()
    {
        // A block 40 x 30 with a square-bottomed slot 10 wide, 15 deep: the slot's two bottom corners are
        // reflex corners of the outer (the tool can't reach them); its mouth corners and the block's four
        // corners are convex from the material and stay.
        var outer = Polygon((0, 0), (40, 0), (40, 30), (25, 30), (25, 15), (15, 15), (15, 30), (0, 30));
        var relieved = CornerRelief.RelieveOuter(outer, new DogBoneRelief(2), P);
        var arcs = relieved.Segments.OfType<ArcSegment>().ToArray();
        Assert.Equal(2, arcs.Length);
        Assert.True(Math.Abs(Area(relieved)) < Math.Abs(Area(outer))); // material was removed
        // A tool of radius 2 in the slot reaches (25, 15) and (15, 15): its centre is inside the cut (outside the part).
        foreach (var (v, b) in new[] { (new Vec2(25, 15), new Vec2(-Math.Sqrt(0.5), Math.Sqrt(0.5))), (new Vec2(15, 15), new Vec2(Math.Sqrt(0.5), Math.Sqrt(0.5))) })
        {
            Vec2 q = v + b * 2;
            Assert.True(relieved.Segments.Min(s => Distance(q, s)) >= 2 - 1e-9);
            Assert.False(TestShapes.OuterPolygon(relieved).Contains(new GeometryFactory().CreatePoint(new Coordinate(q.X, q.Y))));
        }
    }

    [Fact]
    public void ArcsBesideACornerAreTrimmedOnTheirCircle()
    {
        // A D-shaped hole: a half circle of radius 10 closed by its diameter; two right-angle corners.
        var arc = new ArcSegment(new Vec2(0, 0), 10, 0, 180);
        var hole = Contour.FromSegments(new Segment[] { arc, new LineSegment(arc.End, arc.Start) });
        double r = 1;
        var relieved = CornerRelief.RelieveHole(hole, new DogBoneRelief(r) { ClearanceMm = 0 }, P);
        Assert.Equal(4, relieved.Segments.Count);
        AssertJoined(relieved);
        var trimmed = relieved.Segments.OfType<ArcSegment>().Single(a => a.Radius == 10);
        Assert.Equal(new Vec2(0, 0), trimmed.Center);
        AssertToolReaches(relieved, new Vec2(10, 0), Unit(new Vec2(-1, 1)), r);
        AssertToolReaches(relieved, new Vec2(-10, 0), Unit(new Vec2(1, 1)), r);
        Assert.True(TestShapes.OuterPolygon(relieved).IsValid);
    }

    [Fact]
    public void PrintedCornerCirclesKeepTheNominalCornerClearOfTheBeadsRound()
    {
        var hole = Polygon((0, 0), (20, 0), (20, 10), (0, 10));
        double w = 0.4, rho = w / 2;
        var relieved = CornerRelief.RelieveHole(hole, new CornerCircleRelief(w), P);
        AssertJoined(relieved);
        var arcs = relieved.Segments.OfType<ArcSegment>().ToArray();
        Assert.Equal(4, arcs.Length);
        double bigR = rho * Math.Sqrt(2); // rho max(1, 2 cos 45)
        foreach (var a in arcs)
        {
            Assert.Contains(RectCorners, v => v == a.Center); // centred on the corner
            Assert.Equal(bigR, a.Radius, 12);
            Assert.Equal(270, Math.Abs(a.SweepDeg), 9);
        }
        for (int k = 0; k < 4; k++) AssertToolReaches(relieved, RectCorners[k], RectBisectors[k], rho);
        // Independent numeric check: the relieved hole rounded by rho (the model of the printed corner)
        // still covers the nominal rectangle.
        var nominal = TestShapes.OuterPolygon(hole);
        Assert.True(nominal.Difference(TestShapes.OuterPolygon(relieved).Buffer(-rho, 64).Buffer(rho, 64)).Area < 1e-4);
        // Source: area of a circle: each corner adds three quarters of pi R^2.
        Assert.Equal(200 + 4 * 0.75 * Math.PI * bigR * bigR, Math.Abs(Area(relieved)), 9);
    }

    [Fact]
    public void ObtuseCornersGetAtLeastHalfALineWidth()
    {
        // A regular hexagonal hole: corners of 120 degrees, 2 cos(60) = 1, so R = rho exactly.
        var pts = Enumerable.Range(0, 6).Select(i => Vec2.FromAngleDeg(60 * i) * 8).ToArray();
        var relieved = CornerRelief.RelieveHole(Contour.Polygon(pts), new CornerCircleRelief(0.4), P);
        Assert.All(relieved.Segments.OfType<ArcSegment>(), a => Assert.Equal(0.2, a.Radius, 12));
        Assert.Equal(6, relieved.Segments.OfType<ArcSegment>().Count());
    }

    [Fact]
    public void AFinelyPolygonisedRoundHoleIsNotNotched()
    {
        // 400 corners of 0.9 degrees: the round a 1.5 mm tool leaves is 1.5 (1 / cos(0.45 deg) - 1) = 5e-5 mm,
        // below the 0.001 mm tolerance.
        var pts = Enumerable.Range(0, 400).Select(i => Vec2.FromAngleDeg(0.9 * i) * 20).ToArray();
        var hole = Contour.Polygon(pts);
        Assert.Same(hole, CornerRelief.RelieveHole(hole, new DogBoneRelief(1.5), P));
        var circle = Contour.FullCircle(new Vec2(0, 0), 5);
        Assert.Same(circle, CornerRelief.RelieveHole(circle, new DogBoneRelief(1.5), P));
    }

    [Fact]
    public void AFeatureTooSmallForTheToolIsAnError()
    {
        var tiny = Polygon((0, 0), (2, 0), (2, 2), (0, 2));
        Assert.Throws<ArgumentException>(() => CornerRelief.RelieveHole(tiny, new DogBoneRelief(1.5), P));
        // Two notches on a 3 mm side with R = 1.5: each takes sqrt(2) 1.5 = 2.12 mm of it.
        var narrow = Polygon((0, 0), (30, 0), (30, 3), (0, 3));
        Assert.Throws<ArgumentException>(() => CornerRelief.RelieveHole(narrow, new DogBoneRelief(1.5) { ClearanceMm = 0 }, P));
        Assert.Throws<ArgumentOutOfRangeException>(() => CornerRelief.RelieveHole(narrow, new DogBoneRelief(-1), P));
    }

    private static Vec2 Unit(Vec2 v) => v * (1 / v.Length);
}
