using CsCheck;
using NetTopologySuite.Algorithm;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Regions;

namespace PartForge.Geometry.Tests.Regions;

public class RegionTests
{
    /// <summary>
    /// Chordal error of the discretised circle (geometry of the regular polygon: a chord of half-angle pi/n
    /// lies r(1 - cos(pi/n)) inside the circle): outers stay within e (+ one grid step of snapping) inside the
    /// true circle; holes are never undersize and stay within e / cos(pi/n) + 2 grid steps outside it.
    /// </summary>
    [Fact]
    public void CirclesRespectTheChordalBoundAndHolesAreNeverUndersize()
    {
        Gen.Select(Gen.Double[0.5, 100], Gen.Double[0.0005, 0.05], Gen.Double[-50, 50], Gen.Double[-50, 50]).Sample((r, e, cx, cy) =>
        {
            var prec = Precision.FromChordalTolerance(e);
            var c = new Vec2(cx, cy);
            double g = prec.GridMm;
            foreach (bool hole in new[] { false, true })
            {
                var reg = Region.FromContour(Contour.FullCircle(c, r), prec, asHole: hole);
                var ring = reg.Polygons.Single().Shell.Coordinates;
                int n = ring.Length - 1;
                for (int i = 0; i < n; i++)
                {
                    var p = new Vec2(ring[i].X, ring[i].Y) - c; var q = new Vec2(ring[i + 1].X, ring[i + 1].Y) - c;
                    double vertexR = p.Length;
                    // distance from the centre to the chord (closest point of the segment)
                    var d = q - p; double t = Math.Clamp(-p.Dot(d) / d.Dot(d), 0, 1);
                    double chordR = (p + d * t).Length;
                    if (!hole)
                    {
                        Assert.InRange(vertexR, r - g, r + g);
                        Assert.True(r - chordR <= e + g, $"outer chord {r - chordR} > e {e}");
                    }
                    else
                    {
                        Assert.True(chordR >= r, $"hole undersize: {chordR} < {r}");
                        Assert.True(vertexR - r <= e / Math.Cos(Math.PI / n) + 2 * g, $"hole oversize {vertexR - r} for e {e}");
                    }
                }
            }
        }, iter: 100);
    }

    [Fact]
    public void RingsAreOrientedOuterCounterClockwiseHolesClockwise()
    {
        Gen.Int.Sample(seed =>
        {
            var prec = Precision.FromChordalTolerance(0.01);
            var reg = RandomScenes.RandomRegion(new Random(seed), prec);
            Assert.True(reg.Geometry.IsValid);
            foreach (var p in reg.Polygons)
            {
                Assert.True(Orientation.IsCCW(p.Shell.Coordinates));
                for (int i = 0; i < p.NumInteriorRings; i++) Assert.False(Orientation.IsCCW(p.GetInteriorRingN(i).Coordinates));
            }
            // every coordinate on the grid
            foreach (var co in reg.Geometry.Coordinates)
            {
                Assert.Equal(co.X, Math.Floor(co.X * prec.Scale + 0.5) / prec.Scale);
                Assert.Equal(co.Y, Math.Floor(co.Y * prec.Scale + 0.5) / prec.Scale);
            }
        }, iter: 100);
    }

    [Fact]
    public void BooleansAndTransformsKeepAreas()
    {
        var prec = Precision.FromChordalTolerance(0.001);
        var a = Region.FromContour(Contour.Rectangle(new Vec2(0, 0), 10, 10, 0), prec);
        var b = Region.FromContour(Contour.Rectangle(new Vec2(5, 0), 10, 10, 0), prec);
        Assert.Equal(150, a.Union(b).Area, 6);
        Assert.Equal(50, a.Difference(b).Area, 6);
        Assert.Equal(50, a.Intersection(b).Area, 6);
        Assert.Equal(100, a.RotatedDeg(90).Area, 6);
        Assert.Equal(100, a.MirroredY().Area, 6);
        Assert.Equal(100, a.Translated(new Vec2(3.3, -1)).Area, 6);
        Assert.Equal(5.0, a.DistanceTo(a.Translated(new Vec2(15, 0))), 6);
        Assert.Equal(0.0, a.DistanceTo(b));
        // offset of a square by d: area (10 + 2d)^2 - (4 - pi) d^2 (rounded corners)
        Assert.Equal(Math.Pow(12, 2) - (4 - Math.PI), a.Offset(1).Area, 2);
        Assert.True(Region.Empty.Union(a).Area == 100 && a.Difference(a).IsEmpty);
    }

    [Fact]
    public void OverlappingProfileHolesFallBackToBooleans()
    {
        var prec = Precision.FromChordalTolerance(0.01);
        var outer = Contour.FullCircle(new Vec2(0, 0), 20);
        var h1 = Contour.FullCircle(new Vec2(3, 0), 5);
        var h2 = Contour.FullCircle(new Vec2(-3, 0), 5);
        var r = Region.FromProfile(Profile.Of(outer, h1, h2), prec);
        Assert.True(r.Geometry.IsValid);
        Assert.Single(r.Polygons);
        Assert.Equal(1, r.Polygons[0].NumInteriorRings);
    }
}
