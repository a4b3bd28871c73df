using PartForge.Geometry.Fabrication;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;

namespace PartForge.Geometry.Tests.Fabrication;

public class OverhangAnalysisTests
{
    private static readonly Precision P = Precision.FromChordalTolerance(0.001);
    private static readonly OverhangOptions Opt = new();
    private const double SpanTol = 0.01; // OverhangOptions.SpanToleranceMm default: the search's stated accuracy

    private static Region Rect(double x0, double y0, double x1, double y1) =>
        Region.FromContour(Contour.Polygon(new[] { new Vec2(x0, y0), new Vec2(x1, y0), new Vec2(x1, y1), new Vec2(x0, y1) }), P);

    private static Region Square(double half) => Rect(-half, -half, half, half);

    private static void AssertSpan(double expected, OverhangRegion r)
    {
        Assert.NotNull(r.SpanMm);
        Assert.InRange(r.SpanMm!.Value, expected - SpanTol - 1e-9, expected + 1e-9);
    }

    [Fact]
    public void ATeeOverhangsAllAroundItsStem()
    {
        // Stem 10 x 10 (z 0..10), cap 30 x 30 (z 10..15), centred.
        // Source: geometry: the cap's underside outside the stem is 900 - 100 = 800 mm^2; its point farthest
        // from the stem is a cap corner, (15, 15) to the stem corner (5, 5): 10 sqrt(2) = 14.142 mm.
        var tee = new LayeredSolid(new[] { new Layer(0, 10, Square(5)), new Layer(10, 15, Square(15)) });
        foreach (var rep in new[] { OverhangAnalysis.OfSolid(tee, Opt), OverhangAnalysis.OfMesh(Mesher.Build(tee, P), Opt) })
        {
            var r = Assert.Single(rep.Regions);
            Assert.Equal(10, r.ZMm, 9);
            Assert.Equal(800, r.AreaMm2, 6);
            Assert.True(r.IsHorizontal);
            Assert.False(r.IsIsland);
            AssertSpan(10 * Math.Sqrt(2), r);
            // The farthest point is near one of the cap's corners.
            var far = r.FarthestXY!.Value;
            Assert.InRange(Math.Abs(far.X), 15 - 2 * SpanTol, 15 + 1e-9);
            Assert.InRange(Math.Abs(far.Y), 15 - 2 * SpanTol, 15 + 1e-9);
            Assert.Equal(new Vec2(-15, -15), r.MinXY);
            Assert.Equal(new Vec2(15, 15), r.MaxXY);
            Assert.Same(r, rep.Largest);
            Assert.Equal(800, rep.TotalAreaMm2, 6);
        }
    }

    [Fact]
    public void ARoundTeeHasAnAnnularOverhang()
    {
        // Stem r = 5, cap r = 15. Source: geometry: annulus pi (15^2 - 5^2) = 628.3 mm^2, span 10 mm. The
        // discretised circles differ from the true ones by at most the chordal tolerance e, so the area by at
        // most e times the perimeters.
        var tee = new LayeredSolid(new[]
        {
            new Layer(0, 10, Region.FromContour(Contour.FullCircle(new Vec2(0, 0), 5), P)),
            new Layer(10, 12, Region.FromContour(Contour.FullCircle(new Vec2(0, 0), 15), P)),
        });
        double e = P.ChordalToleranceMm;
        foreach (var rep in new[] { OverhangAnalysis.OfSolid(tee, Opt), OverhangAnalysis.OfMesh(Mesher.Build(tee, P), Opt) })
        {
            var r = Assert.Single(rep.Regions);
            Assert.InRange(r.AreaMm2, Math.PI * 200 - 2 * Math.PI * 20 * e, Math.PI * 200 + 1e-6);
            Assert.InRange(r.SpanMm!.Value, 10 - SpanTol - e, 10 + e);
        }
    }

    [Fact]
    public void AnUpsideDownStepPyramidOverhangsAtEveryLevel()
    {
        // 20 x 20, 30 x 30, 40 x 40, centred, 5 mm each. Source: geometry: 900 - 400 = 500 mm^2 at z = 5 and
        // 1600 - 900 = 700 mm^2 at z = 10, each sticking out 5 mm (5 sqrt(2) = 7.071 at the corners).
        var stack = new LayeredSolid(new[] { new Layer(0, 5, Square(10)), new Layer(5, 10, Square(15)), new Layer(10, 15, Square(20)) });
        foreach (var rep in new[] { OverhangAnalysis.OfSolid(stack, Opt), OverhangAnalysis.OfMesh(Mesher.Build(stack, P), Opt) })
        {
            Assert.Equal(2, rep.Regions.Count);
            Assert.Equal(5, rep.Regions[0].ZMm, 9);
            Assert.Equal(500, rep.Regions[0].AreaMm2, 6);
            Assert.Equal(10, rep.Regions[1].ZMm, 9);
            Assert.Equal(700, rep.Regions[1].AreaMm2, 6);
            AssertSpan(5 * Math.Sqrt(2), rep.Regions[0]);
            AssertSpan(5 * Math.Sqrt(2), rep.Regions[1]);
            Assert.Equal(700, rep.Largest!.AreaMm2, 6);
            Assert.Equal(1200, rep.TotalAreaMm2, 6);
        }
        // The same steps the right way up (largest at the bottom) need no support.
        var pyramid = new LayeredSolid(new[] { new Layer(0, 5, Square(20)), new Layer(5, 10, Square(15)), new Layer(10, 15, Square(10)) });
        Assert.True(OverhangAnalysis.OfSolid(pyramid, Opt).IsSelfSupporting);
        Assert.True(OverhangAnalysis.OfMesh(Mesher.Build(pyramid, P), Opt).IsSelfSupporting);
    }

    [Fact]
    public void AOneSidedStepSticksOutByItsWidth()
    {
        // Bottom 20 x 10, top 30 x 10 flush on three sides. Source: geometry: a 10 x 10 ledge, 10 mm from its
        // only support (the line x = 20) at its free edge x = 30.
        var step = new LayeredSolid(new[] { new Layer(0, 4, Rect(0, 0, 20, 10)), new Layer(4, 6, Rect(0, 0, 30, 10)) });
        foreach (var rep in new[] { OverhangAnalysis.OfSolid(step, Opt), OverhangAnalysis.OfMesh(Mesher.Build(step, P), Opt) })
        {
            var r = Assert.Single(rep.Regions);
            Assert.Equal(100, r.AreaMm2, 6);
            AssertSpan(10, r);
            Assert.InRange(r.FarthestXY!.Value.X, 30 - 2 * SpanTol, 30 + 1e-9);
        }
    }

    [Fact]
    public void ABridgeBetweenTwoPillarsSpansHalfItsGap()
    {
        // Pillars [0,10] and [30,40] (x) under a deck [0,40], all 10 deep. Source: geometry: the deck's
        // free part is 20 x 10 = 200 mm^2 and its middle is 10 mm from either pillar.
        var pillars = Rect(0, 0, 10, 10).Union(Rect(30, 0, 40, 10));
        var bridge = new LayeredSolid(new[] { new Layer(0, 8, pillars), new Layer(8, 10, Rect(0, 0, 40, 10)) });
        foreach (var rep in new[] { OverhangAnalysis.OfSolid(bridge, Opt), OverhangAnalysis.OfMesh(Mesher.Build(bridge, P), Opt) })
        {
            var r = Assert.Single(rep.Regions);
            Assert.Equal(200, r.AreaMm2, 6);
            AssertSpan(10, r);
            Assert.InRange(r.FarthestXY!.Value.X, 20 - SpanTol, 20 + SpanTol);
        }
    }

    [Fact]
    public void APlainPlateNeedsNoSupport()
    {
        var plate = LayeredSolid.Extrude(Region.FromProfile(Profile.Of(Contour.FullCircle(new Vec2(0, 0), 40), Contour.FullCircle(new Vec2(0, 0), 10)), P), 0, 3);
        var solidRep = OverhangAnalysis.OfSolid(plate, Opt);
        var meshRep = OverhangAnalysis.OfMesh(Mesher.Build(plate, P), Opt);
        Assert.True(solidRep.IsSelfSupporting);
        Assert.True(meshRep.IsSelfSupporting);
        Assert.Equal(0, meshRep.TotalAreaMm2);
        Assert.Null(meshRep.Largest);
        Assert.Equal(0, meshRep.MaxSpanMm);
    }

    [Fact]
    public void ALayerWithNothingUnderItsEdgeIsAnIsland()
    {
        // A ring (inner radius 12) on a post of radius 8: the ring touches nothing below it.
        var post = Region.FromContour(Contour.FullCircle(new Vec2(0, 0), 8), P);
        var ring = Region.FromProfile(Profile.Of(Contour.FullCircle(new Vec2(0, 0), 20), Contour.FullCircle(new Vec2(0, 0), 12)), P);
        var s = new LayeredSolid(new[] { new Layer(0, 5, post), new Layer(5, 7, ring) });
        var r = Assert.Single(OverhangAnalysis.OfSolid(s, Opt).Regions);
        Assert.True(r.IsIsland);
        Assert.Null(r.SpanMm);
        // A layer above a gap floats too.
        var gap = new LayeredSolid(new[] { new Layer(0, 5, Square(10)), new Layer(6, 8, Square(5)) });
        var g = Assert.Single(OverhangAnalysis.OfSolid(gap, Opt).Regions);
        Assert.True(g.IsIsland);
        Assert.Equal(100, g.AreaMm2, 6);
        Assert.Equal(1, OverhangAnalysis.OfMesh(Mesher.Build(gap, P), Opt).IslandCount);
    }

    /// <summary>
    /// A convex prism: the polygon (x, z) extruded along y from 0 to length; each triangle turned to face
    /// away from the centroid (right for a convex solid).
    /// </summary>
    private static Mesh Prism((double X, double Z)[] section, double length)
    {
        var v = new List<Vec3>();
        foreach (var (x, z) in section) v.Add(new Vec3(x, 0, z));
        foreach (var (x, z) in section) v.Add(new Vec3(x, length, z));
        int n = section.Length;
        var tris = new List<(int, int, int)>();
        for (int i = 0; i < n; i++)
        {
            int j = (i + 1) % n;
            tris.Add((i, j, n + j)); tris.Add((i, n + j, n + i));
        }
        for (int i = 1; i + 1 < n; i++) { tris.Add((0, i, i + 1)); tris.Add((n, n + i, n + i + 1)); }
        var centre = new Vec3(v.Average(p => p.X), v.Average(p => p.Y), v.Average(p => p.Z));
        var idx = new List<int>();
        foreach (var (a, b, c) in tris)
        {
            var nrm = (v[b] - v[a]).Cross(v[c] - v[a]);
            var mid = (v[a] + v[b] + v[c]) * (1.0 / 3);
            if (nrm.Dot(mid - centre) > 0) idx.AddRange(new[] { a, b, c }); else idx.AddRange(new[] { a, c, b });
        }
        return new Mesh(v, idx);
    }

    [Theory]
    [InlineData(60, true)]
    [InlineData(46, true)]
    [InlineData(44, false)]
    [InlineData(30, false)]
    public void ASlopedUndersideIsFlaggedOnlyBeyondTheLimit(double angleFromVerticalDeg, bool flagged)
    {
        // Section (0,0), (10,0), (10 + a, h), (0, h): the face from (10,0) to (10 + a, h) faces down at
        // atan(a / h) from vertical. Source: trigonometry: its area is L sqrt(a^2 + h^2).
        double h = 10, a = h * Math.Tan(angleFromVerticalDeg * Math.PI / 180), L = 7;
        var mesh = Prism(new[] { (0.0, 0.0), (10.0, 0.0), (10 + a, h), (0.0, h) }, L);
        Assert.True(MeshValidator.Validate(mesh).IsValid);
        var rep = OverhangAnalysis.OfMesh(mesh, Opt);
        if (!flagged) { Assert.True(rep.IsSelfSupporting); return; }
        var r = Assert.Single(rep.Regions);
        Assert.False(r.IsHorizontal);
        Assert.Null(r.SpanMm);
        Assert.Equal(L * Math.Sqrt(a * a + h * h), r.AreaMm2, 9);
        Assert.Equal(0, r.ZMm, 12);
        Assert.Equal(new Vec2(10, 0), r.MinXY);
        Assert.Equal(new Vec2(10 + a, L), r.MaxXY);
    }

    [Fact]
    public void TheLimitIsAParameter()
    {
        double h = 10, a = 10 * Math.Tan(30 * Math.PI / 180);
        var mesh = Prism(new[] { (0.0, 0.0), (10.0, 0.0), (10 + a, h), (0.0, h) }, 5);
        Assert.True(OverhangAnalysis.OfMesh(mesh, Opt).IsSelfSupporting);
        Assert.Single(OverhangAnalysis.OfMesh(mesh, new OverhangOptions { MaxAngleFromVerticalDeg = 20 }).Regions);
        Assert.Throws<ArgumentOutOfRangeException>(() => OverhangAnalysis.OfMesh(mesh, new OverhangOptions { MaxAngleFromVerticalDeg = 90 }));
    }
}
