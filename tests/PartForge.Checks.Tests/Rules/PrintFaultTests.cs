using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Parts;

namespace PartForge.Checks.Tests.Rules;

/// <summary>
/// Printability and fit with the real part builders' parts: each planted fault fails exactly its check, the
/// near miss does not fail. Expected walls are computed here from the design's closed-form geometry, or by
/// densely sampling the two features' boundaries (independent of the checker's exact distance code).
/// </summary>
public class PrintFaultTests
{
    private static readonly TestMachine Base = new();

    private static CheckResult One(CheckReport r, string id, string? part = null) =>
        r.Checks.First(c => c.Id == id && (part is null || c.PartName == part));

    private static void AssertOnlyFailure(CheckReport report, string id)
    {
        var fails = report.Checks.Where(c => c.Status == CheckStatus.Fail).Select(c => $"{c.Id}: {c.Message}").ToList();
        Assert.True(fails.Count > 0 && report.Checks.Where(c => c.Status == CheckStatus.Fail).All(c => c.Id == id),
            $"expected only {id} to fail, got: {string.Join(" | ", fails)}");
    }

    private static void AssertNoFailure(CheckReport report)
    {
        var fails = report.Checks.Where(c => c.Status == CheckStatus.Fail).Select(c => $"{c.Id}: {c.Message}").ToList();
        Assert.True(fails.Count == 0, string.Join(" | ", fails));
    }

    /// <summary>
    /// Brute-force boundary distance by sampling both contours every 0.01 mm (error below 0.01), only for
    /// pairs whose bounding boxes are near each other.
    /// </summary>
    private static double Sampled(Contour a, Contour b)
    {
        var pa = Points(a, 0.01);
        var pb = Points(b, 0.01);
        double best = double.PositiveInfinity;
        foreach (var p in pa) foreach (var q in pb) best = Math.Min(best, (p - q).Length);
        return best;
    }

    private static bool Near(Contour a, Contour b, double d) =>
        PartForge.Geometry.Exact.Box2.Of(a).DistanceTo(PartForge.Geometry.Exact.Box2.Of(b)) < d;

    private static List<Vec2> Points(Contour c, double step)
    {
        var pts = new List<Vec2>();
        if (c.Circle is { } circle)
        {
            int n = (int)Math.Ceiling(2 * Math.PI * circle.Radius / step);
            for (int i = 0; i < n; i++) pts.Add(circle.Center + Vec2.FromAngleDeg(360.0 * i / n) * circle.Radius);
            return pts;
        }
        foreach (var s in c.Segments)
        {
            double len = s is ArcSegment a ? a.Radius * Math.Abs(a.SweepDeg) * Math.PI / 180 : (s.End - s.Start).Length;
            int n = Math.Max(1, (int)Math.Ceiling(len / step));
            for (int i = 0; i <= n; i++)
            {
                double t = (double)i / n;
                pts.Add(s switch
                {
                    LineSegment l => l.From + (l.To - l.From) * t,
                    ArcSegment arc => arc.Center + Vec2.FromAngleDeg(arc.StartDeg + arc.SweepDeg * t) * arc.Radius,
                    _ => throw new InvalidOperationException(),
                });
            }
        }
        return pts;
    }

    [Fact]
    public void Baseline_with_parts_does_not_fail()
    {
        var r = Base.CheckWithParts();
        AssertNoFailure(r);
        foreach (var id in new[] { CheckIds.PocketWeb, CheckIds.PocketRimWall, CheckIds.PocketBoreWall, CheckIds.PocketBoltWall, CheckIds.PocketFloor,
                     CheckIds.SeatWall, CheckIds.BoltEdgeDistance, CheckIds.SensorSeatClearance })
            Assert.Contains(r.Checks, c => c.Id == id);
    }

    [Fact]
    public void Pocket_web()
    {
        // 12 disc pockets of 19.55 + 0.15 on r 40: web = 2 r sin(15 deg) - D.
        var bad = Base.With(m => m.MagnetD = 19.55);
        var r = bad.CheckWithParts();
        var c = One(r, CheckIds.PocketWeb);
        Assert.Equal(2 * 40 * Math.Sin(Math.PI / 12) - 19.7, c.Value, 6);
        Assert.Equal(3 * 0.4, c.Limit, 12);   // press fit (clearance 0.15 <= 0.2): 3 lines of 0.4 mm
        AssertOnlyFailure(r, CheckIds.PocketWeb);
        AssertNoFailure(Base.With(m => m.MagnetD = 19.0).CheckWithParts());
    }

    [Fact]
    public void Pocket_rim_wall()
    {
        // Rim 1.0 mm outside the pockets: OD = 2 (40 + 6.075 + 1); too thin for an index notch.
        var bad = Base.With(m => m.RotorOd = 2 * (40 + 6.075 + 1.0));
        var r = bad.CheckWithParts();
        var c = One(r, CheckIds.PocketRimWall);
        Assert.Equal(1.0, c.Value, 6);
        AssertOnlyFailure(r, CheckIds.PocketRimWall);
        AssertNoFailure(Base.With(m => m.RotorOd = 2 * (40 + 6.075 + 2.7)).CheckWithParts());
    }

    [Fact]
    public void Pocket_bore_wall()
    {
        // Bore radius 1.0 mm inside the pockets' inner edge (40 - 6.075), no bolt circle.
        var bad = Base.With(m => { m.BoltCount = 0; m.Bore = 2 * (40 - 6.075 - 1.0); });
        var r = bad.CheckWithParts();
        var c = One(r, CheckIds.PocketBoreWall);
        Assert.Equal(1.0, c.Value, 6);
        AssertOnlyFailure(r, CheckIds.PocketBoreWall);
        AssertNoFailure(Base.With(m => { m.BoltCount = 0; m.Bore = 2 * (40 - 6.075 - 1.6); }).CheckWithParts());
    }

    [Fact]
    public void Pocket_bolt_wall()
    {
        // Bolt holes 3.4 on a 62.4 mm circle: the nearest pocket-bolt pair, from the parts' feature centres, is
        // |c_p - c_b| - 6.075 - 1.7 (circle to circle).
        var bad = Base.With(m => m.BoltCircleD = 62.4);
        var parts = bad.Parts();
        var rotor = parts.Get(PartForge.Design.Parts.PartId.Rotor);
        double expected = rotor.FeaturesOf(FeatureKind.MagnetPocket)
            .SelectMany(p => rotor.FeaturesOf(FeatureKind.BoltHole).Select(b => (p.Position - b.Position).Length - 6.075 - 1.7)).Min();
        var r = bad.Check(CheckRunner.ViewsFrom(parts));
        var c = One(r, CheckIds.PocketBoltWall);
        Assert.Equal(expected, c.Value, 6);
        AssertOnlyFailure(r, CheckIds.PocketBoltWall);
        AssertNoFailure(Base.With(m => m.BoltCircleD = 56).CheckWithParts());
    }

    [Fact]
    public void Pocket_floor()
    {
        var r = Base.With(m => m.PocketFloor = 0.6).CheckWithParts();
        var c = One(r, CheckIds.PocketFloor);
        Assert.Equal(0.6, c.Value, 12);
        Assert.Equal(Math.Max(2 * 0.4, 4 * 0.2), c.Limit, 12);   // 2 lines of 0.4 mm, 4 layers of 0.2 mm
        AssertOnlyFailure(r, CheckIds.PocketFloor);
        AssertNoFailure(Base.With(m => m.PocketFloor = 1.0).CheckWithParts());
    }

    [Fact]
    public void Bolt_edge_distance()
    {
        // Bolt holes 3.4 on a 24 mm circle around an 18.8 mm bore: 12 - 1.7 - 9.4 = 0.9; a printed screw hole
        // needs 3 lines of 0.4 mm.
        var r = Base.With(m => m.Bore = 18.8).CheckWithParts();
        var c = One(r, CheckIds.BoltEdgeDistance, "rotor");
        Assert.Equal(0.9, c.Value, 6);
        Assert.Equal(1.2, c.Limit, 12);
        AssertOnlyFailure(r, CheckIds.BoltEdgeDistance);
        AssertNoFailure(Base.With(m => m.Bore = 14).CheckWithParts());
    }

    [Fact]
    public void Seat_wall()
    {
        // Stator rim close to the seats: the wall is the stator radius minus the seat's outer reach, sampled.
        var bad = Base.With(m => { m.StatorOd = 2 * (40 + 9.9); m.MountCount = 0; });
        var parts = bad.Parts();
        var stator = parts.Get(PartForge.Design.Parts.PartId.Stator);
        // The rim is a circle about the axis: the wall from a sampled seat point p is R - |p|.
        double rimR = 40 + 9.9;
        double expected = stator.FeaturesOf(FeatureKind.CoilSeat).SelectMany(s => Points(s.Contour, 0.005)).Min(p => rimR - p.Length);
        var r = bad.Check(CheckRunner.ViewsFrom(parts));
        var c = One(r, CheckIds.SeatWall);
        Assert.Equal(expected, c.Value, 2);
        Assert.Equal(CheckStatus.Fail, c.Status);
        AssertOnlyFailure(r, CheckIds.SeatWall);
        AssertNoFailure(Base.With(m => { m.StatorOd = 2 * (40 + 11.5); m.MountCount = 0; }).CheckWithParts());
    }

    [Fact]
    public void Sensor_seat_clearance()
    {
        // A wide sensor body between coils: the wall to the nearest seat, sampled from both boundaries.
        var bad = Base.With(m => m.SensorWidth = 7.5);
        var parts = bad.Parts();
        var stator = parts.Get(PartForge.Design.Parts.PartId.Stator);
        double expected = stator.FeaturesOf(FeatureKind.SensorPocket)
            .SelectMany(s => stator.FeaturesOf(FeatureKind.CoilSeat).Where(q => Near(s.Contour, q.Contour, 3)).Select(q => Sampled(s.Contour, q.Contour))).Min();
        var r = bad.Check(CheckRunner.ViewsFrom(parts));
        var c = One(r, CheckIds.SensorSeatClearance);
        Assert.Equal(expected, c.Value, 2);
        AssertOnlyFailure(r, CheckIds.SensorSeatClearance);
        AssertNoFailure(Base.CheckWithParts());
    }
}
