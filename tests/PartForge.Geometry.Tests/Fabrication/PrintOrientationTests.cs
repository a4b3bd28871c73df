using PartForge.Geometry.Fabrication;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;

namespace PartForge.Geometry.Tests.Fabrication;

public class PrintOrientationTests
{
    private static readonly Precision P = Precision.FromChordalTolerance(0.01);

    private static Region Rect(double x0, double y0, double x1, double y1) =>
        Region.FromContour(Contour.Polygon(new[] { new Vec2(x0, y0), new Vec2(x1, y0), new Vec2(x1, y1), new Vec2(x0, y1) }), P);

    [Fact]
    public void ATeeWithItsCapOnTopIsFlippedOntoTheCap()
    {
        // Stem 10 x 10 from z = 2 to 12, cap 30 x 30 from 12 to 17 (areas 100 and 900 mm^2).
        var solid = new LayeredSolid(new[] { new Layer(2, 12, Rect(-5, -5, 5, 5)), new Layer(12, 17, Rect(-15, -15, 15, 15)) });
        var o = PrintOrientation.Choose(solid);
        Assert.True(o.Flipped);
        Assert.Equal(100, o.BottomAreaMm2, 9);
        Assert.Equal(900, o.TopAreaMm2, 9);
        // Source: a half turn about x maps (x, y, z) to (x, -y, -z); then z shifts by the old top (17).
        Assert.Equal(new Vec3(1, -2, 0), o.ToBed(new Vec3(1, 2, 17)));
        Assert.Equal(new Vec3(3, 4, 15), o.ToBed(new Vec3(3, -4, 2)));
        var bed = o.Apply(solid);
        Assert.Equal((0.0, 15.0), bed.ZRange);
        Assert.Equal(900, bed.Layers[0].Region.Area, 9);
        Assert.Equal(solid.AnalyticVolume, bed.AnalyticVolume, 9);
        // The mesh of the oriented solid is the mesh of the part moved by the same transform: closed and outward.
        var mesh = Mesher.Build(bed, P);
        Assert.True(MeshValidator.Validate(mesh).IsValid);
        Assert.Equal(solid.AnalyticVolume, mesh.SignedVolume(), 6);
        var moved = o.Apply(Mesher.Build(solid, P));
        Assert.Equal(solid.AnalyticVolume, moved.SignedVolume(), 6);
        Assert.Equal(0, moved.Bounds().Min.Z, 12);
    }

    [Fact]
    public void FlippingIsARotationNotAMirror()
    {
        // An L-shaped plate on a small foot: flipped, the L must read the same way seen from above the
        // bottom face (a rotation keeps handedness): the signed area of its image stays positive.
        var l = Region.FromContour(Contour.Polygon(new[] { new Vec2(0, 0), new Vec2(30, 0), new Vec2(30, 10), new Vec2(10, 10), new Vec2(10, 20), new Vec2(0, 20) }), P);
        var solid = new LayeredSolid(new[] { new Layer(0, 1, Rect(0, 0, 5, 5)), new Layer(1, 4, l) });
        var o = PrintOrientation.Choose(solid);
        Assert.True(o.Flipped);
        // Source: a rotation has determinant +1: the product of the axis signs (1, s, s) is 1.
        Assert.Equal(1, 1 * o.AxisSign * o.AxisSign);
        var bedL = o.Apply(solid).Layers[0].Region;
        // The L's long leg (25, 5) goes to (25, -5), its short leg (5, 15) to (5, -15); nothing stays at +y.
        Assert.True(bedL.Contains(new Vec2(25, -5)));
        Assert.True(bedL.Contains(new Vec2(5, -15)));
        Assert.False(bedL.Contains(new Vec2(25, 5)));
        Assert.False(bedL.Contains(new Vec2(5, 15)));
        Assert.Equal(l.Area, bedL.Area, 9);
    }

    [Fact]
    public void APlainPlateOrAWideBaseStaysAsModelled()
    {
        var plate = LayeredSolid.Extrude(Rect(0, 0, 50, 20), -3, 0);
        var o = PrintOrientation.Choose(plate);
        Assert.False(o.Flipped); // equal areas: the tie keeps the part as modelled
        Assert.Equal(3, o.ZShiftMm, 12);
        Assert.Equal(new Vec3(7, 8, 0), o.ToBed(new Vec3(7, 8, -3)));
        var wideBase = new LayeredSolid(new[] { new Layer(0, 2, Rect(0, 0, 40, 40)), new Layer(2, 6, Rect(10, 10, 30, 30)) });
        Assert.False(PrintOrientation.Choose(wideBase).Flipped);
        // The footprint is the union of the layers (the base here).
        Assert.Equal(1600, PrintOrientation.Footprint(wideBase).Area, 9);
    }
}
