using CsCheck;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;

namespace PartForge.Geometry.Tests.Meshes;

/// <summary>
/// Kernel invariants on random solids. The checks are facts of topology and calculus, not project values:
/// a closed orientable surface has every directed edge paired with its reverse and V - E + F = 2 - 2g per
/// shell (Euler-Poincare formula); the enclosed volume by the divergence theorem equals the sum of the layer
/// prisms' area x height.
/// </summary>
public class MesherPropertyTests
{
    private static readonly Precision Prec = Precision.FromChordalTolerance(0.01);

    /// <summary>
    /// Every random stack either meshes validly with the layer volume, or is refused with
    /// InvalidOperationException (never an invalid mesh). Refusals happen only where boundaries of touching
    /// layers cross within one grid step and even the heal passes (thin patches over such edges) leave a
    /// ring that does not close; 1 in 3,000 seeds did so when measured, so the bound of 2% shows a regression. Volume allowance: snap rounding moves an edge by at most one grid step, so the volume
    /// may change by at most wall area x grid.
    /// </summary>
    [Fact]
    public void RandomStacksGiveValidMeshesWithTheLayerVolume()
    {
        int refused = 0, total = 0;
        Gen.Int.Sample(seed =>
        {
            var rnd = new Random(seed);
            var solid = RandomScenes.RandomStack(rnd, Prec);
            Interlocked.Increment(ref total);
            Mesh mesh;
            try { mesh = Mesher.Build(solid, Prec); }
            catch (InvalidOperationException) { Interlocked.Increment(ref refused); return; }
            var rep = MeshValidator.Validate(mesh);
            Assert.True(rep.IsValid, $"seed {seed}: {rep}");
            double v = solid.AnalyticVolume;
            Assert.True(Math.Abs(mesh.SignedVolume() - v) <= mesh.SurfaceArea() * Prec.GridMm, $"seed {seed}: mesh {mesh.SignedVolume()} vs layers {v}");
        }, iter: 300, threads: 1);
        Assert.True(refused <= total / 50, $"{refused} of {total} random stacks refused");
    }

    [Fact]
    public void GenusEqualsTheNumberOfThroughHoles()
    {
        // Disc with k through holes on one circle and m blind pockets on another: genus k, one shell.
        Gen.Select(Gen.Int[0, 12], Gen.Int[0, 12], Gen.Double[1, 6], Gen.Double[0.2, 0.8]).Sample((k, m, dHole, floorFrac) =>
        {
            var outer = Contour.FullCircle(new Vec2(0, 0), 50);
            var holes = Enumerable.Range(0, k).Select(i => Contour.FullCircle(Vec2.FromAngleDeg(360.0 * i / Math.Max(k, 1) + 7) * 20, dHole / 2)).ToArray();
            var pockets = Enumerable.Range(0, m).Select(i => Contour.FullCircle(Vec2.FromAngleDeg(360.0 * i / Math.Max(m, 1)) * 38, 4)).ToArray();
            var floor = Region.FromProfile(Profile.Of(outer, holes), Prec);
            var top = Region.FromProfile(Profile.Of(outer, holes.Concat(pockets).ToArray()), Prec);
            double zf = 10 * floorFrac;
            var solid = new LayeredSolid(new[] { new Layer(0, zf, floor), new Layer(zf, 10, top) });
            var rep = MeshValidator.Validate(Mesher.Build(solid, Prec));
            Assert.True(rep.IsValid, rep.ToString());
            Assert.Equal(1, rep.ShellCount);
            Assert.Equal(k, rep.Genus);
            Assert.Equal(2 - 2 * k, rep.EulerCharacteristic);
        }, iter: 60);
    }

    [Fact]
    public void PocketsOverlappingHolesAndBossesMeshThroughTheNodingPath()
    {
        int refused = 0, total = 0;
        // Upper layer features cross the lower layer's rings: the level must be noded.
        Gen.Int.Sample(seed =>
        {
            var rnd = new Random(seed);
            var disc = Region.FromContour(Contour.FullCircle(new Vec2(0, 0), 30), Prec);
            var lower = disc;
            for (int i = 0; i < 3; i++) lower = lower.Difference(Region.FromContour(RandomScenes.RandomShape(rnd, 20, 3, 10), Prec, asHole: true));
            var upper = lower;
            for (int i = 0; i < 3; i++) upper = upper.Difference(Region.FromContour(RandomScenes.RandomShape(rnd, 25, 3, 12), Prec, asHole: true));
            var boss = upper.Intersection(Region.FromContour(RandomScenes.RandomShape(rnd, 10, 20, 40), Prec));
            var layers = new List<Layer> { new(0, 2, lower), new(2, 5, upper) };
            if (!boss.IsEmpty) layers.Add(new Layer(5, 7, boss));
            var solid = new LayeredSolid(layers);
            Interlocked.Increment(ref total);
            Mesh mesh;
            try { mesh = Mesher.Build(solid, Prec); }
            catch (InvalidOperationException) { Interlocked.Increment(ref refused); return; }
            var rep = MeshValidator.Validate(mesh);
            Assert.True(rep.IsValid, $"seed {seed}: {rep}");
            Assert.True(Math.Abs(mesh.SignedVolume() - solid.AnalyticVolume) <= mesh.SurfaceArea() * Prec.GridMm, $"seed {seed}");
        }, iter: 200, threads: 1);
        // Where a feature of the upper layer cuts a ring of the lower one within half a grid step, noding alone
        // made a non-manifold edge in 25% of these cases; the mesher's heal passes fix them (0 of 1,000 seeds
        // refused when measured). The 2% bound leaves room for a rare seed and still shows a regression.
        Assert.True(refused <= total / 50, $"{refused} of {total} noded stacks refused");
    }

    /// <summary>A block below and a block above that meet only along one edge at their common level (x = 10):
    /// four faces would share that edge. The mesher's heal pass joins them with a patch a few grid steps wide,
    /// so the result is one 2-manifold shell whose volume differs from the layers' by less than the patch.</summary>
    [Fact]
    public void SolidsMeetingAlongAnEdgeAcrossALevelAreJoinedIntoOneManifoldShell()
    {
        var below = Region.FromContour(Contour.Rectangle(new Vec2(5, 5), 10, 10, 0), Prec);
        var above = Region.FromContour(Contour.Rectangle(new Vec2(15, 5), 10, 10, 0), Prec);
        var solid = new LayeredSolid(new[] { new Layer(0, 2, below), new Layer(2, 4, above) });
        var mesh = Mesher.Build(solid, Prec);
        var rep = MeshValidator.Validate(mesh);
        Assert.True(rep.IsValid, rep.ToString());
        Assert.Equal(1, rep.ShellCount);
        Assert.Equal(0, rep.NonManifoldEdges);
        // patch: at most (10 mm + w) x w on the 2 mm layer, w = 4 grid steps on the first pass
        double w = 4 * Prec.GridMm;
        Assert.InRange(mesh.SignedVolume() - solid.AnalyticVolume, 0, (10 + w) * w * 2 * (1 << Mesher.MaxHealPasses));
    }

    /// <summary>A through pocket touching the rim at one point: the pinch is opened by one grid step, so the
    /// part stays 2-manifold (one through hole, genus 1) and the face triangulates.</summary>
    [Fact]
    public void HoleTouchingTheOuterRingAtAPointGivesAValidMesh()
    {
        var sq = Region.FromContour(Contour.Rectangle(new Vec2(0, 0), 20, 20, 0), Prec);
        var diamond = Region.FromContour(Contour.Polygon(new[] { new Vec2(0, -10), new Vec2(5, -5), new Vec2(0, 0), new Vec2(-5, -5) }), Prec);
        var r = sq.Difference(diamond);
        Assert.True(r.Geometry.IsValid);
        Assert.Equal(400 - 50, r.Area, 2);
        var one = MeshValidator.Validate(Mesher.Build(LayeredSolid.Extrude(r, 0, 2), Prec));
        Assert.True(one.IsValid, one.ToString());
        Assert.Equal(1, one.Genus);
        var blind = MeshValidator.Validate(Mesher.Build(new LayeredSolid(new[] { new Layer(0, 2, sq), new Layer(2, 4, r) }), Prec));
        Assert.True(blind.IsValid, blind.ToString());
        Assert.Equal(0, blind.Genus);
    }

    [Fact]
    public void GapsInZGiveSeparateShells()
    {
        var r = Region.FromContour(Contour.Rectangle(new Vec2(0, 0), 10, 10, 0), Prec);
        var solid = new LayeredSolid(new[] { new Layer(0, 1, r), new Layer(2, 3, r), new Layer(3, 4, r.Offset(-2)) });
        var rep = MeshValidator.Validate(Mesher.Build(solid, Prec));
        Assert.True(rep.IsValid, rep.ToString());
        Assert.Equal(2, rep.ShellCount);
        Assert.Equal(0, rep.Genus);
    }

    [Fact]
    public void MirroredAndMovedSolidsStayValidWithTheSameVolume()
    {
        var solid = ReferenceRotors.Build(ReferenceRotors.R1);
        var prec = Precision.FromChordalTolerance(ReferenceRotors.R1.E);
        double v = Mesher.Build(solid, prec).SignedVolume();
        foreach (var s in new[] { solid.MirroredZ(), solid.Translated(-3.5), solid.MapRegions(r => r.MirroredY()), solid.MapRegions(r => r.RotatedDeg(90)) })
        {
            var m = Mesher.Build(s, prec);
            var rep = MeshValidator.Validate(m);
            Assert.True(rep.IsValid, rep.ToString());
            Assert.Equal(v, m.SignedVolume(), 3);
        }
    }

    [Fact]
    public void TrianglesAreOutwardOnTopAndBottom()
    {
        var r = Region.FromContour(Contour.FullCircle(new Vec2(0, 0), 5), Prec);
        var m = Mesher.Build(LayeredSolid.Extrude(r, 0, 2), Prec);
        for (int t = 0; t < m.TriangleCount; t++)
        {
            var (a, b, c) = m.Triangle(t);
            var n = (b - a).Cross(c - a);
            if (a.Z == 2 && b.Z == 2 && c.Z == 2) Assert.True(n.Z > 0);
            else if (a.Z == 0 && b.Z == 0 && c.Z == 0) Assert.True(n.Z < 0);
            else
            {
                // Wall: the normal points away from the axis.
                var mid = (a + b + c) * (1.0 / 3);
                Assert.True(n.X * mid.X + n.Y * mid.Y > 0);
            }
        }
    }

    [Fact]
    public void TooLargeForFloat32IsRefused()
    {
        var r = Region.FromContour(Contour.Rectangle(new Vec2(1500, 0), 10, 10, 0), Prec);
        Assert.Throws<ArgumentOutOfRangeException>(() => Mesher.Build(LayeredSolid.Extrude(r, 0, 1), Prec));
    }
}
