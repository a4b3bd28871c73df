using System.Diagnostics;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Tests.Meshes;

public class MeshBudgetTests
{
    private static IReadOnlyList<Profile> R1Profiles()
    {
        var s = ReferenceRotors.R1;
        var outer = Contour.FullCircle(new Vec2(0, 0), s.Od / 2);
        var holes = new List<Contour> { Contour.FullCircle(new Vec2(0, 0), s.Bore / 2) };
        for (int i = 0; i < s.Bolts; i++) holes.Add(Contour.FullCircle(Vec2.FromAngleDeg(360.0 * i / s.Bolts) * (s.BoltCircleD / 2), s.BoltD / 2));
        var pockets = Enumerable.Range(0, s.Pockets).Select(i => Contour.FullCircle(Vec2.FromAngleDeg(360.0 * i / s.Pockets) * s.PitchR, s.PocketD / 2));
        return new[] { Profile.Of(outer, holes.ToArray()), Profile.Of(outer, holes.Concat(pockets).ToArray()) };
    }

    [Fact]
    public void EstimateBoundsTheMesherFromAbove()
    {
        var est = MeshBudget.EstimateTriangles(R1Profiles(), ReferenceRotors.R1.E);
        var actual = Mesher.Build(ReferenceRotors.Build(ReferenceRotors.R1), Precision.FromChordalTolerance(ReferenceRotors.R1.E)).TriangleCount;
        Assert.InRange(est, actual, actual * 1.5);
    }

    [Fact]
    public void AbsurdToleranceIsEstimatedInstantlyAndTheSmallestFittingToleranceFits()
    {
        var sw = Stopwatch.StartNew();
        double est = MeshBudget.EstimateTriangles(R1Profiles(), 1e-9);
        double e = MeshBudget.SmallestTolerance(R1Profiles(), MeshBudget.DefaultTrianglesPerPart);
        Assert.True(sw.Elapsed.TotalSeconds < 1);
        Assert.True(est > MeshBudget.DefaultTrianglesPerPart);
        Assert.True(MeshBudget.EstimateTriangles(R1Profiles(), e) <= MeshBudget.DefaultTrianglesPerPart);
        Assert.True(MeshBudget.EstimateTriangles(R1Profiles(), e * 0.99) > MeshBudget.DefaultTrianglesPerPart);
    }
}
