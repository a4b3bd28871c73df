using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Exact;

namespace PartForge.Geometry.Tests.Exact;

public class Exact2DTests
{
    [Theory]
    [InlineData(10, 0.6, 135)]
    [InlineData(5, 2.0, 0)]
    [InlineData(7, 6.5, -60)]
    public void ClippedCircleHasTheSegmentArea(double r, double k, double dirDeg)
    {
        var u = Vec2.FromAngleDeg(dirDeg);
        var c = Exact2D.ClipConvex(Contour.FullCircle(new Vec2(1, 2), r), u, new Vec2(1, 2).Dot(u) + r - k);
        // Source: circular segment area r^2 acos((r-k)/r) - (r-k) sqrt(2rk - k^2).
        Assert.Equal(Math.PI * r * r - SegmentArea(r, k), ContourOffset.SignedArea(c), 9);
    }

    [Fact]
    public void ClippedPolygonKeepsOrientationAndArea()
    {
        var sq = Contour.Rectangle(new Vec2(0, 0), 4, 4, 0);
        var c = Exact2D.ClipConvex(sq, Vec2.FromAngleDeg(45), Math.Sqrt(2)); // cuts the (2,2) corner 1 mm in from each side... 
        // The line x + y = 2 removes the triangle with legs 2: area 16 - 2.
        Assert.Equal(14, ContourOffset.SignedArea(c), 9);
    }

    [Fact]
    public void RadialExtentAndDistanceOfAnArcSector()
    {
        var s = Contour.AnnularSector(30, 45, -15, 30);
        var (mn, mx) = Exact2D.RadialExtent(s);
        Assert.Equal(30, mn, 12);
        Assert.Equal(45, mx, 12);
        Assert.Equal(5, Exact2D.PointContour(new Vec2(50, 0), s), 12);
        Assert.Equal(45, Exact2D.RayExit(s, new Vec2(0, 0), new Vec2(1, 0)), 12);
        Assert.Equal(45, Exact2D.Support(s, new Vec2(1, 0)), 12);
    }

    /// <summary>Area of a circular segment of depth k: r^2 acos((r-k)/r) - (r-k) sqrt(2rk - k^2) (geometry).</summary>
    private static double SegmentArea(double r, double k) => r * r * Math.Acos((r - k) / r) - (r - k) * Math.Sqrt(2 * r * k - k * k);
}
