using PartForge.Design.Machines;
using PartForge.Electrical.Coils;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Electrical.Tests.Coils;

public class CoilOutlineTests
{
    // Geometry: a closed contour's segments join end to start.
    [Fact]
    public void KeystoneContoursAreClosedAndCounterClockwise()
    {
        var o = CoilOutline.Keystone(60, 6, 10, 20, 3);
        foreach (var c in new[] { o.Window, o.Outer })
        {
            for (int i = 0; i < c.Segments.Count; i++)
            {
                var a = c.Segments[i].End;
                var b = c.Segments[(i + 1) % c.Segments.Count].Start;
                Assert.True((a - b).Length < 1e-9, $"gap at segment {i}");
            }
            Assert.True(ContourSampling.Area(ContourSampling.Sample(c)) > 0);
        }
    }

    // Geometry (exact): keystone window = annular sector; outer = Minkowski offset; areas and perimeters.
    [Fact]
    public void KeystoneAreasAndPerimetersMatchTheOffsetGeometry()
    {
        var o = CoilOutline.Keystone(60, 6, 10, 20, 3);
        double half = Math.Asin(10.0 / 120);
        Assert.Equal(Math.Asin(10.0 / 120) * 180 / Math.PI, o.WindowHalfAngleDeg, 12);
        // The window's chord at the pitch radius is the core width.
        Assert.Equal(10, 2 * 60 * Math.Sin(half), 9);
        var win = ContourSampling.Sample(o.Window, 2000);
        var outer = ContourSampling.Sample(o.Outer, 2000);
        Assert.Equal(o.WindowAreaMm2, ContourSampling.Area(win), 1e-3);
        Assert.Equal(o.WindowAreaMm2 + o.WindingPlanAreaMm2, ContourSampling.Area(outer), 1e-3);
        Assert.Equal(o.WindowPerimeterMm, ContourSampling.Perimeter(win), 1e-3);
        Assert.Equal(o.TurnPerimeterMm(3), ContourSampling.Perimeter(outer), 1e-3);
        Assert.Equal(50 - 3, o.OuterMinRadiusMm, 12);
        Assert.Equal(70 + 3, o.OuterMaxRadiusMm, 12);
    }

    // Geometry: every point of the outer contour lies at the build distance from the window (Minkowski offset).
    [Fact]
    public void OuterContourIsAtBuildDistance()
    {
        var o = CoilOutline.Keystone(45, 5, 7, 14, 2.5);
        foreach (var p in ContourSampling.Sample(o.Outer, 200))
            Assert.Equal(2.5, o.DistanceToWindowMm(p), 9);
        var r = CoilOutline.Round(40, 5, 8, 4);
        Assert.Equal(16, r.OuterDiameterMm!.Value, 12);
        foreach (var p in ContourSampling.Sample(r.Outer, 50)) Assert.Equal(4, r.DistanceToWindowMm(p), 9);
    }

    // Geometry: the half-angle at a radius is where the circle of that radius leaves the outline.
    [Fact]
    public void HalfAngleAtRadiusIsTheBoundary()
    {
        foreach (var o in new[] { CoilOutline.Keystone(45, 5, 7, 14, 2.5), CoilOutline.Round(40, 5, 8, 4) })
            foreach (double r in new[] { o.PitchRadiusMm - 3, o.PitchRadiusMm, o.PitchRadiusMm + 4 })
            {
                double h = o.OuterHalfAngleDegAt(r)!.Value;
                var p = Vec2.FromAngleDeg(h) * r;
                Assert.Equal(o.RadialBuildMm, o.DistanceToWindowMm(p), 6);
            }
    }

    // Geometry: the neighbour gap against a brute-force distance between dense samples of two neighbouring outlines.
    [Theory]
    [InlineData("keystone", 12, 2.0)]
    [InlineData("keystone", 18, 3.5)]
    [InlineData("round", 9, 4.0)]
    [InlineData("round", 12, 1.0)]
    public void NeighbourGapMatchesBruteForce(string shape, int coils, double build)
    {
        var wire = PartForge.Electrical.Wire.WireSpec.OfAwg(28, 2);
        var spec = new CoilSpec
        {
            Shape = shape == "round" ? CoilShape.Round : CoilShape.Keystone, PitchRadiusMm = 50, HeightMm = 5, CoreMm = 8,
            WindowRadialLengthMm = 16, FillFactor = 0.45, Wire = wire, CoilCount = coils, LeadAllowanceMm = 150, MaxTemperatureC = 60,
        };
        int turns = (int)Math.Round(build * 0.45 * 5 / wire.CopperAreaMm2);
        var c = spec.Wind(turns);
        var a = ContourSampling.Sample(c.Outline.Outer, 400);
        var b = ContourSampling.Sample(c.Outline.Outer.RotatedDeg(360.0 / coils), 400);
        double best = double.MaxValue;
        foreach (var p in a) foreach (var q in b) best = Math.Min(best, (p - q).Length);
        Assert.Equal(best, c.NeighbourGapMm!.Value, 0.01);
        // The largest build closes the gap exactly.
        double maxB = spec.MaxBuildMm()!.Value;
        Assert.Equal(c.NeighbourGapMm.Value, 2 * (maxB - c.Outline.RadialBuildMm), 1e-9);
    }
}
