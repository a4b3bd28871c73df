using CsCheck;
using PartForge.Geometry.Exact;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Tests.Exact;

public class Exact2DDistanceTests
{
    [Fact]
    public void Two_discs_side_by_side_are_centre_distance_minus_radii_apart()
    {
        // Closed form: |c1 - c2| - r1 - r2.
        var a = Shape2D.Disc(new Vec2(0, 0), 5);
        var b = Shape2D.Disc(new Vec2(13, 4), 3);
        Assert.Equal(Math.Sqrt(13 * 13 + 4 * 4) - 8, Exact2D.ShapeShape(a, b), 9);
    }

    [Fact]
    public void A_disc_inside_an_annulus_hole_is_hole_radius_minus_offset_minus_radius_away()
    {
        var ring = Shape2D.Annulus(10, 20);
        var disc = Shape2D.Disc(new Vec2(2, 0), 5);
        Assert.Equal(10 - 2 - 5, Exact2D.ShapeShape(ring, disc), 9);
        Assert.Equal(10 - 2 - 5, Exact2D.ShapeShape(disc, ring), 9);
    }

    [Fact]
    public void Overlapping_and_nested_shapes_are_zero_apart()
    {
        var big = Shape2D.Disc(new Vec2(0, 0), 10);
        var small = Shape2D.Disc(new Vec2(1, 1), 2);
        Assert.Equal(0, Exact2D.ShapeShape(big, small, double.PositiveInfinity, out bool o1));
        Assert.True(o1);
        var crossing = Shape2D.Disc(new Vec2(11, 0), 2);
        Assert.Equal(0, Exact2D.ShapeShape(big, crossing, double.PositiveInfinity, out bool o2));
        Assert.True(o2);
    }

    [Fact]
    public void Rectangle_to_disc_and_rectangle_to_rectangle()
    {
        // Axis-aligned square [-5,5]^2 and a disc r 2 at (10, 0): 10 - 5 - 2 = 3.
        var sq = new Shape2D(Contour.Rectangle(new Vec2(0, 0), 10, 10, 0));
        Assert.Equal(3, Exact2D.ShapeShape(sq, Shape2D.Disc(new Vec2(10, 0), 2)), 9);
        // Disc at (10, 10): corner (5,5) to centre is 5 sqrt 2, minus 2.
        Assert.Equal(5 * Math.Sqrt(2) - 2, Exact2D.ShapeShape(sq, Shape2D.Disc(new Vec2(10, 10), 2)), 9);
        // A square turned 45 degrees with its corner 2 mm from the first square's right side.
        var diamond = new Shape2D(Contour.Rectangle(new Vec2(7 + 5 * Math.Sqrt(2), 0), 10, 10, 45));
        Assert.Equal(2, Exact2D.ShapeShape(sq, diamond), 9);
    }

    [Fact]
    public void Annular_sector_to_concentric_arc_gap()
    {
        // Two annular sectors on the same axis, 30 degrees apart in angle, radii 20..30: the gap between the
        // nearest radial edges is at the inner radius, 2 r sin(15 deg) ... for edges meeting at the axis the
        // closest points are the inner corners: chord 2 * 20 * sin(gap/2).
        var s1 = new Shape2D(Contour.AnnularSector(20, 30, 0, 40));
        var s2 = new Shape2D(Contour.AnnularSector(20, 30, 70, 40));
        Assert.Equal(2 * 20 * Math.Sin(15 * Math.PI / 180), Exact2D.ShapeShape(s1, s2), 9);
        // A circle of radius 32 about the axis (the rim) is 2 from the sectors' outer arcs.
        var rimInside = new Shape2D(Contour.FullCircle(new Vec2(0, 0), 40), new[] { Contour.FullCircle(new Vec2(0, 0), 32) });
        Assert.Equal(2, Exact2D.ShapeShape(s1, rimInside), 9);
    }

    [Fact]
    public void Radial_range_of_discs_rings_and_offset_circles()
    {
        // A ring about the axis: its radii. An off-axis disc: |c| - r .. |c| + r. A disc over the axis: 0 .. |c| + r.
        Assert.Equal((20.0, 95.0), Exact2D.RadialRange(Shape2D.Annulus(20, 95)));
        var (a, b) = Exact2D.RadialRange(Shape2D.Disc(new Vec2(30, 40), 5));
        Assert.Equal(45, a, 12);
        Assert.Equal(55, b, 12);
        Assert.Equal((0.0, 7.0), Exact2D.RadialRange(Shape2D.Disc(new Vec2(2, 0), 5)));
        // A square [10,20]^2: nearest corner (10,10), farthest (20,20).
        var sq = new Shape2D(Contour.Rectangle(new Vec2(15, 15), 10, 10, 0));
        var (c, d) = Exact2D.RadialRange(sq);
        Assert.Equal(10 * Math.Sqrt(2), c, 12);
        Assert.Equal(20 * Math.Sqrt(2), d, 12);
    }

    // Property: the exact segment distance never exceeds, and is within the sampling error of, the brute-force
    // minimum over densely sampled points of the two segments (the test's own independent estimate).
    [Fact]
    public void Segment_distance_agrees_with_dense_sampling()
    {
        var gen = Gen.Select(Gen.Double[-20, 20].Array[4], Gen.Double[1, 10], Gen.Double[0, 360], Gen.Double[-300, 300], Gen.Bool);
        gen.Sample(t =>
        {
            var (xy, r, start, sweep, lineFirst) = t;
            double x1 = xy[0], y1 = xy[1], x2 = xy[2], y2 = xy[3];
            if (Math.Abs(sweep) < 1) sweep = 1;
            Segment s1 = new LineSegment(new Vec2(x1, y1), new Vec2(x2, y2));
            Segment s2 = new ArcSegment(new Vec2(x2 * 0.3, y1 * 0.3), r, start, sweep);
            if (!lineFirst) s1 = new ArcSegment(new Vec2(y2 * 0.5, x1 * 0.5), r * 0.7 + 0.5, start * 0.5, -sweep * 0.8);
            double exact = Exact2D.SegmentSegment(s1, s2);
            var p1 = Sample(s1, 700);
            var p2 = Sample(s2, 700);
            double brute = double.PositiveInfinity;
            foreach (var a in p1) foreach (var b in p2) brute = Math.Min(brute, (a - b).Length);
            // Sampling error bound: half the largest sample spacing on each segment.
            double err = Spacing(s1, 700) + Spacing(s2, 700);
            Assert.True(exact <= brute + 1e-9, $"exact {exact} > brute {brute}");
            Assert.True(brute - exact <= err + 1e-9, $"exact {exact}, brute {brute}, err {err}");
        }, iter: 40);
    }

    private static List<Vec2> Sample(Segment s, int n)
    {
        var pts = new List<Vec2>(n + 1);
        for (int i = 0; i <= n; i++)
        {
            double t = (double)i / n;
            pts.Add(s switch
            {
                LineSegment l => l.From + (l.To - l.From) * t,
                ArcSegment a => a.Center + Vec2.FromAngleDeg(a.StartDeg + a.SweepDeg * t) * a.Radius,
                _ => throw new InvalidOperationException(),
            });
        }
        return pts;
    }

    private static double Spacing(Segment s, int n) => s switch
    {
        LineSegment l => (l.To - l.From).Length / n,
        ArcSegment a => a.Radius * Math.Abs(a.SweepDeg) * Math.PI / 180 / n,
        _ => 0,
    };
}
