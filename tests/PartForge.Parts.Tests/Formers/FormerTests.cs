using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Parts.Tests.Formers;

public class FormerTests
{
    private static (PartForge.Design.Model.Design D, CoilGeometry Coil, PartSet Set) Single()
    {
        var d = TestDesigns.SingleRotor();
        var coil = TestDesigns.RoundCoil(d, 5, 20, 60, 100);
        return (d, coil, PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), coil, TestDesigns.Prec(d)));
    }

    [Fact]
    public void WindingWindowIsTheCoilWindow()
    {
        var (d, coil, set) = Single();
        var former = set.Get(PartForge.Design.Parts.PartId.Former);
        var core = former.Feature("core");
        // The core is the electrical engine's window moved to the former's frame: same circle, height = coils.height.
        var w = coil.WindingWindow.Circle!.Value;
        var c = core.Contour.Circle!.Value;
        Assert.Equal(w.Radius, c.Radius, 12);
        Assert.Equal(w.Center.X - coil.PitchRadiusMm, c.Center.X, 12);
        Assert.Equal(0.8, core.Z0Mm, 12);
        Assert.Equal(0.8 + 5, core.Z1Mm, 12);
        Assert.Equal(d.Coils.Height, core.Z1Mm - core.Z0Mm, 12);
        Assert.Equal(2 * 0.8 + 5, former.HeightMm, 12);
        Assert.Equal(9, former.Quantity);
    }

    [Fact]
    public void VolumeMatchesTrueCircleGeometry()
    {
        var (_, _, set) = Single();
        var former = set.Get(PartForge.Design.Parts.PartId.Former);
        double rf = 4 + 5 + 1.0, k = 0.6, f = 0.8, h = 5, rc = 4, rsp = 4 - 1.2, a = 0.5; // slot 1.0 wide
        // Source: pi r^2; circular segment r^2 acos((r-k)/r) - (r-k) sqrt(2rk-k^2); strip integral of sqrt(r^2-y^2).
        double flange = Geo.Circle(rf) - Geo.SegmentArea(rf, k);
        double slot = Geo.ChordStrip(rf, a) - 2 * a * rc;
        double v = 2 * f * flange - f * slot + h * Geo.Circle(rc) - (2 * f + h) * Geo.Circle(rsp);
        double e = TestDesigns.Tol;
        double bound = e * 2 * Math.PI * (rf * 2 * f + rc * h + rsp * (2 * f + h));
        Assert.InRange(former.VolumeMm3, v - bound, v + bound);
    }

    [Fact]
    public void FootprintHasNoMirrorSymmetry()
    {
        var (_, _, set) = Single();
        var fp = set.Get(PartForge.Design.Parts.PartId.Former).Feature("flange-lower").Contour;
        var flat = Assert.Single(fp.Segments.OfType<LineSegment>());
        var mid = (flat.From + flat.To) * 0.5;
        // The flat faces 135 degrees: mirrored in x or in y it would face 45 or 225 degrees, so it only fits one way.
        Assert.Equal(135.0, Geo.AngleOf(mid), 9);
        Assert.Equal(10 - 0.6, mid.Length, 9);
    }

    [Fact]
    public void FitsItsSeatWithTheStatedClearance()
    {
        var (d, coil, set) = Single();
        var former = set.Get(PartForge.Design.Parts.PartId.Former);
        var stator = set.Get(PartForge.Design.Parts.PartId.Stator);
        var si = stator.Instances.Single();
        double clearance = d.Tolerances.PrintXy + 0.10;
        foreach (var inst in former.Instances)
        {
            var seat = si.ToMachine(stator.Feature($"seat-{inst.Index % 9}").Contour);
            foreach (var name in new[] { "flange-lower", "flange-upper" })
            {
                var fp = inst.ToMachine(former.Feature(name).Contour);
                // Every point of the flange footprint is exactly the clearance from the seat wall.
                foreach (var p in Geo.Sample(fp, 32))
                    Assert.Equal(clearance, Geo.Distance(seat, p), 9);
            }
        }
    }

    [Fact]
    public void MeshValid()
    {
        var (_, _, set) = Single();
        var r = MeshValidator.Validate(set.Get(PartForge.Design.Parts.PartId.Former).Mesh);
        Assert.True(r.IsValid, r.ToString());
        Assert.Equal(1, r.Genus); // the spindle hole; the lead slot is open at the edge
    }

    /// <summary>
    /// The two print pieces of the former (base and cap) against closed forms: the base is the lower flange and the
    /// core to the full height; the cap the upper flange less a hole of the core's radius plus the seat's slip fit
    /// (print_xy 0.1 + 0.1 = 0.2 mm) and the lead slot. Source: as VolumeMatchesTrueCircleGeometry (pi r^2, circular
    /// segment, strip integral). Each piece is watertight and prints with every layer inside the one below.
    /// </summary>
    [Fact]
    public void PrintPiecesAreTheBaseAndTheCapAsDocumented()
    {
        var (_, _, set) = Single();
        var former = set.Get(PartForge.Design.Parts.PartId.Former);
        Assert.Equal(["former-base", "former-cap"], former.PrintPieces.Select(p => p.Name));
        var bas = former.PrintPieces[0];
        var cap = former.PrintPieces[1];
        double rf = 4 + 5 + 1.0, k = 0.6, f = 0.8, h = 5, rc = 4, rsp = 4 - 1.2, a = 0.5, c = 0.2;
        double flange = Geo.Circle(rf) - Geo.SegmentArea(rf, k);
        double vBase = f * (flange - Geo.Circle(rsp)) + (h + f) * (Geo.Circle(rc) - Geo.Circle(rsp));
        double vCap = f * (flange - Geo.Circle(rc + c) - (Geo.ChordStrip(rf, a) - Geo.ChordStrip(rc + c, a)));
        double e = TestDesigns.Tol;
        double bBase = e * 2 * Math.PI * (rf * f + rc * (h + f) + rsp * (2 * f + h));
        double bCap = e * 2 * Math.PI * (rf + rc + c) * f + e * 4 * rf * f;
        Assert.InRange(bas.VolumeMm3, vBase - bBase, vBase + bBase);
        Assert.InRange(cap.VolumeMm3, vCap - bCap, vCap + bCap);
        Assert.Equal(2 * f + h, bas.HeightMm, 12);
        Assert.Equal(f, cap.HeightMm, 12);
        Assert.Equal(former.Quantity, bas.Quantity);
        Assert.Equal(former.Quantity, cap.Quantity);
        foreach (var p in former.PrintPieces)
        {
            var r = MeshValidator.Validate(p.Mesh);
            Assert.True(r.IsValid, $"{p.Name}: {r}");
        }
        Assert.Equal(1, MeshValidator.Validate(bas.Mesh).Genus); // the spindle hole
        Assert.Equal(0, MeshValidator.Validate(cap.Mesh).Genus); // a ring opened by the lead slot
    }
}
