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
}
