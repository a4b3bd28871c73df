using CsCheck;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Tests.Profiles;

public class ContourOffsetTests
{
    private const double Tol = 1e-9;

    private static Contour LShape() =>
        // 30 x 20 with a 10 x 10 notch out of the top-right corner: 5 convex corners, 1 concave.
        Contour.Polygon(new[] { new Vec2(0, 0), new Vec2(30, 0), new Vec2(30, 10), new Vec2(20, 10), new Vec2(20, 20), new Vec2(0, 20) });

    private static Contour Stadium(Vec2 c, double straight, double r)
    {
        // A slot: two half circles joined by straight sides, counter-clockwise.
        var right = new ArcSegment(c + new Vec2(straight / 2, 0), r, -90, 180);
        var left = new ArcSegment(c + new Vec2(-straight / 2, 0), r, 90, 180);
        return Contour.FromSegments(new Segment[] { right, new LineSegment(right.End, left.Start), left, new LineSegment(left.End, right.Start) });
    }

    private static double Perimeter(Contour c) => c.Circle is { } k ? 2 * Math.PI * k.Radius : c.Segments.Sum(s => s switch
    {
        LineSegment l => (l.To - l.From).Length,
        ArcSegment a => a.Radius * Math.Abs(a.SweepDeg) * Math.PI / 180,
        _ => throw new InvalidOperationException(),
    });

    [Fact]
    public void CircleGrowsAndShrinksByTheRadius()
    {
        var c = Contour.FullCircle(new Vec2(3, 4), 2.5);
        Assert.Equal(2.575, ContourOffset.Offset(c, 0.075).Circle!.Value.Radius, 12);
        Assert.Equal(2.425, ContourOffset.Offset(c, -0.075).Circle!.Value.Radius, 12);
        Assert.Equal(new Vec2(3, 4), ContourOffset.Offset(c, -0.075).Circle!.Value.Center);
    }

    [Fact]
    public void VanishingHoleIsAClearError()
    {
        var tiny = Contour.FullCircle(new Vec2(0, 0), 0.05);
        var ex = Assert.Throws<ArgumentException>(() => ContourOffset.Offset(tiny, -0.075));
        Assert.Contains("vanishes", ex.Message);
        // A slot narrower than twice the offset: its end arcs collapse.
        Assert.Throws<ArgumentException>(() => ContourOffset.Offset(Stadium(new Vec2(0, 0), 5, 0.05), -0.075));
        // A thin rectangle whose short sides are trimmed away.
        Assert.Throws<ArgumentException>(() => ContourOffset.Offset(Contour.Rectangle(new Vec2(0, 0), 5, 0.1, 0), -0.075));
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void ConvexGrowthFollowsSteinersFormula(bool clockwise)
    {
        // Source: Steiner's formula for the outer parallel body of a convex plane set,
        // A(d) = A + P d + pi d^2 (a standard fact of convex geometry).
        var rect = Contour.Rectangle(new Vec2(5, -2), 40, 25, 30);
        if (clockwise) rect = ContourOffset.Reversed(rect);
        double d = 0.075;
        var grown = ContourOffset.Offset(rect, d);
        double expected = 40 * 25 + 2 * (40 + 25) * d + Math.PI * d * d;
        Assert.Equal(expected, Math.Abs(ContourOffset.SignedArea(grown)), 9);
        Assert.Equal(Math.Sign(ContourOffset.SignedArea(rect)), Math.Sign(ContourOffset.SignedArea(grown)));
        // Four straight sides and four round corners of radius d.
        Assert.Equal(4, grown.Segments.OfType<ArcSegment>().Count(a => Math.Abs(a.Radius - d) < Tol && Math.Abs(Math.Abs(a.SweepDeg) - 90) < 1e-9));
        Assert.Equal(4, grown.Segments.OfType<LineSegment>().Count());
    }

    [Fact]
    public void ShrunkRectangleKeepsSharpCorners()
    {
        var rect = Contour.Rectangle(new Vec2(0, 0), 12, 6, 0);
        var shrunk = ContourOffset.Offset(rect, -0.5);
        Assert.All(shrunk.Segments, s => Assert.IsType<LineSegment>(s));
        Assert.Equal(11 * 5, ContourOffset.SignedArea(shrunk), 9);
        Assert.Contains(shrunk.Segments, s => (s.Start - new Vec2(-5.5, -2.5)).Length < Tol);
    }

    [Fact]
    public void SlotShrinksAndGrowsConcentrically()
    {
        // A stadium offset by d is the stadium with radius r + d and the same straight length (exact).
        var slot = Stadium(new Vec2(10, 10), 8, 2.5);
        foreach (double d in new[] { 0.075, -0.075, 1.0, -2.0 })
        {
            var o = ContourOffset.Offset(slot, d);
            double r = 2.5 + d;
            Assert.Equal(2 * r * 8 + Math.PI * r * r, ContourOffset.SignedArea(o), 9);
            Assert.Equal(4, o.Segments.Count);
            Assert.All(o.Segments.OfType<ArcSegment>(), a => Assert.Equal(r, a.Radius, 12));
        }
    }

    [Fact]
    public void ConcaveCornerIsTrimmedWhenGrowing()
    {
        // Outer parallel set of a polygon with right-angle corners: each convex corner adds a quarter
        // disc (pi d^2 / 4) and each concave corner removes the doubly counted d x d square
        // (elementary geometry of parallel strips).
        var l = LShape();
        double d = 0.4;
        var grown = ContourOffset.Offset(l, d);
        double a = 30 * 20 - 10 * 10, p = Perimeter(l);
        Assert.Equal(a + p * d + (5 * Math.PI / 4 - 1) * d * d, ContourOffset.SignedArea(grown), 9);
        Assert.Equal(5, grown.Segments.OfType<ArcSegment>().Count());
        Assert.Contains(grown.Segments, s => (s.Start - new Vec2(20 + d, 10 + d)).Length < Tol);
    }

    [Fact]
    public void ConcaveCornerIsRoundedWhenShrinking()
    {
        // Inner parallel set: each convex right-angle corner leaves a d x d square counted twice by the
        // strips (+d^2), the concave corner removes an extra quarter disc (-pi d^2 / 4).
        var l = LShape();
        double d = 0.4;
        var shrunk = ContourOffset.Offset(l, -d);
        double a = 30 * 20 - 10 * 10, p = Perimeter(l);
        Assert.Equal(a - p * d + (5 - Math.PI / 4) * d * d, ContourOffset.SignedArea(shrunk), 9);
        var arc = Assert.Single(shrunk.Segments.OfType<ArcSegment>());
        Assert.Equal(new Vec2(20, 10), arc.Center);
        Assert.Equal(d, arc.Radius, 12);
    }

    [Theory]
    [InlineData(2000)]
    [InlineData(20000)]
    public void FinelyPolygonisedCircleOffsetsExactly(int n)
    {
        // Regular n-gon of circumradius R. Outward: Steiner's formula A + P d + pi d^2 (every corner rounded,
        // the corner arcs sum to a full turn). Inward: the n-gon with its inradius reduced by d, A (1 - d / r)^2.
        double bigR = 50, d = 0.075;
        var pts = Enumerable.Range(0, n).Select(i => Vec2.FromAngleDeg(360.0 * i / n) * bigR).ToArray();
        var poly = Contour.Polygon(pts);
        double a = ContourOffset.SignedArea(poly), p = Perimeter(poly), rIn = bigR * Math.Cos(Math.PI / n);
        double tol = 1e-7 * a;
        Assert.Equal(a + p * d + Math.PI * d * d, ContourOffset.SignedArea(ContourOffset.Offset(poly, d)), tol);
        Assert.Equal(a * Math.Pow(1 - d / rIn, 2), ContourOffset.SignedArea(ContourOffset.Offset(poly, -d)), tol);
    }

    [Fact]
    public void NarrowNeckIsAClearError()
    {
        // A keyhole notch cut into a 40 x 30 plate from the top: a neck 0.1 mm wide and 6 mm long opening into
        // a 6 x 6 pocket. Growing by 0.075 mm makes the neck walls run into each other (0.1 < 2 x 0.075), while
        // every piece on its own survives: only the pairwise test can see it.
        var pts = new[]
        {
            new Vec2(0, 0), new Vec2(40, 0), new Vec2(40, 30), new Vec2(20.05, 30), new Vec2(20.05, 24), new Vec2(23, 24),
            new Vec2(23, 18), new Vec2(17, 18), new Vec2(17, 24), new Vec2(19.95, 24), new Vec2(19.95, 30), new Vec2(0, 30),
        };
        var keyhole = Contour.Polygon(pts);
        var ex = Assert.Throws<ArgumentException>(() => ContourOffset.Offset(keyhole, 0.075));
        Assert.Contains("narrower", ex.Message);
        // A wider neck is fine, and the same neck survives an inward offset (the walls move apart).
        ContourOffset.Offset(keyhole, 0.04);
        ContourOffset.Offset(keyhole, -0.075);
    }

    [Fact]
    public void OpenContourIsRejected()
    {
        var open = Contour.FromSegments(new Segment[] { new LineSegment(new(0, 0), new(1, 0)), new LineSegment(new(1, 0), new(1, 1)) , new LineSegment(new(1, 1), new(0.5, 0.5)) });
        Assert.Throws<ArgumentException>(() => ContourOffset.Offset(open, 0.1));
    }

    [Fact]
    public void SignedAreaIsExactForArcs()
    {
        // Annular sector: (sweep / 360) * pi * (R^2 - r^2).
        var sector = Contour.AnnularSector(20, 35, 10, 50);
        Assert.Equal(50.0 / 360 * Math.PI * (35 * 35 - 20 * 20), ContourOffset.SignedArea(sector), 9);
        Assert.Equal(-ContourOffset.SignedArea(sector), ContourOffset.SignedArea(ContourOffset.Reversed(sector)), 9);
    }

    [Fact]
    public void EveryOffsetPointLiesAtTheOffsetDistance()
    {
        // Property: the offset curve of a valid offset is the set of points at distance |d| from the
        // original boundary; sample it and measure against the exact original segments.
        var shapes = Gen.Int[0, 3].Select(Gen.Double[1, 30], Gen.Double[1, 30], Gen.Double[0, 360]);
        shapes.Select(Gen.Double[-0.45, 0.45]).Sample((shape, d) =>
        {
            var (kind, w, h, rot) = shape;
            if (Math.Abs(d) < 1e-3) return;
            Contour c = kind switch
            {
                0 => Contour.Rectangle(new Vec2(1, 2), w, h, rot),
                1 => Stadium(new Vec2(-3, 1), w, Math.Min(w, h) / 2 + 0.5).RotatedDeg(rot),
                2 => Contour.AnnularSector(h + 5, h + 5 + w, rot, Math.Clamp(w * 6, 30, 300)),
                _ => LShape().RotatedDeg(rot),
            };
            var o = ContourOffset.Offset(c, d);
            foreach (var s in o.Segments)
                for (int k = 0; k <= 8; k++)
                {
                    var p = PointAt(s, k / 8.0);
                    double dist = c.Segments.Min(q => Distance(q, p));
                    Assert.True(Math.Abs(dist - Math.Abs(d)) < 1e-7, FormattableString.Invariant($"kind {kind}: point at {dist}, expected {Math.Abs(d)}"));
                }
        }, iter: 300);
    }

    private static Vec2 PointAt(Segment s, double t) => s switch
    {
        LineSegment l => l.From + (l.To - l.From) * t,
        ArcSegment a => a.Center + Vec2.FromAngleDeg(a.StartDeg + a.SweepDeg * t) * a.Radius,
        _ => throw new InvalidOperationException(),
    };

    private static double Distance(Segment s, Vec2 p)
    {
        switch (s)
        {
            case LineSegment l:
            {
                Vec2 d = l.To - l.From;
                double t = Math.Clamp((p - l.From).Dot(d) / d.Dot(d), 0, 1);
                return (p - (l.From + d * t)).Length;
            }
            case ArcSegment a:
            {
                double ang = Math.Atan2(p.Y - a.Center.Y, p.X - a.Center.X) * 180 / Math.PI;
                double lo = Math.Min(a.StartDeg, a.EndDeg);
                double rel = ((ang - lo) % 360 + 360) % 360;
                if (rel <= Math.Abs(a.SweepDeg)) return Math.Abs((p - a.Center).Length - a.Radius);
                return Math.Min((p - a.Start).Length, (p - a.End).Length);
            }
            default:
                throw new InvalidOperationException();
        }
    }
}
