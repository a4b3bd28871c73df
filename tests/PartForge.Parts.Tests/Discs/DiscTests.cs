using PartForge.Design.Machines;
using PartForge.Geometry.Meshes;

namespace PartForge.Parts.Tests.Discs;

public class DiscTests
{
    [Fact]
    public void BackIronCoversTheMagnetsAndIsCutSteel()
    {
        var d = TestDesigns.DualRotor();
        var set = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), TestDesigns.RoundCoil(d, 6, 15, 45, 75), TestDesigns.Prec(d));
        var bi = set.Get(PartForge.Design.Parts.PartId.BackIron);
        Assert.Equal(2, bi.Quantity);                     // one per rotor, written once
        Assert.Equal(PartProcess.Cut, bi.Process);
        Assert.Equal("steel", bi.Material.Name);
        Assert.NotNull(bi.CutProfile);
        // Block magnets 20 x 10 on r 60: outer corner at sqrt(70^2 + 5^2); plus max(1, thickness / 2) = 2.5.
        double r = Math.Sqrt(70 * 70 + 5 * 5) + 2.5;
        Assert.Equal(r, bi.Feature("rim").Contour.Circle!.Value.Radius, 9);
        // The bore, 6 bolt holes and 6 jacking-screw clearance holes (the same hole size, between the bolts).
        double v = (Geo.Circle(r) - Geo.Circle(5) - 12 * Geo.Circle(2.25)) * 2;
        double bound = TestDesigns.Tol * 2 * Math.PI * (r + 5 + 12 * 2.25) * 2;
        Assert.InRange(bi.VolumeMm3, v - bound, v + bound);
        // Steel 7.85 g/cm^3 (EN 1993-1-1 3.2.6 design density, from memory).
        Assert.Equal(7.85 * bi.VolumeMm3 / 1000, bi.MassG, 9);
        foreach (var inst in bi.Instances)
        {
            var rotorInst = set.Get(inst.Host).Instances.Single();
            // Against the rotor's back face (the one away from the stator).
            double back = rotorInst.Flipped ? rotorInst.TopZMm : rotorInst.BottomZMm;
            Assert.True(Math.Abs(inst.BottomZMm - back) < 1e-9 || Math.Abs(inst.TopZMm - back) < 1e-9);
            Assert.True(Math.Abs(inst.BottomZMm) > Math.Abs(rotorInst.BottomZMm) - 1e-9);
        }
        var m = MeshValidator.Validate(bi.Mesh);
        Assert.True(m.IsValid, m.ToString());
        Assert.Equal(1 + 6 + 6, m.Genus); // bore, bolts, jacking-screw holes
    }

    [Fact]
    public void HubSpacerSetsTheGapBetweenTheRotors()
    {
        var d = TestDesigns.DualRotor();
        var set = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), TestDesigns.RoundCoil(d, 6, 15, 45, 75), TestDesigns.Prec(d));
        var sp = set.Get(PartForge.Design.Parts.PartId.HubSpacer);
        // Contract: gap.air_gap is measured from the stationary face (pack = max(ring, coils.height + 2 flange)) to the
        // nearest rotating surface; the magnets are recessed (pocket 6.5 deep, magnet 5), so the rotor faces are at
        // +-(pack/2 + air_gap) and the spacer between them is twice that.
        double pack = Math.Max(8, 6 + 2 * 1.0);
        Assert.Equal(2 * (pack / 2 + d.Gap.AirGap), sp.HeightMm, 9);
        Assert.Equal(PartProcess.Cut, sp.Process);
        Assert.Equal("acrylic", sp.Material.Name);
        Assert.True(sp.Rotating);
        // Bolt circle 30 + 3 x 4.5 (1.5 d edge distance), inside the stator bore less 1 mm.
        Assert.Equal((30 + 3 * 4.5) / 2, sp.Feature("rim").Contour.Circle!.Value.Radius, 9);
        Assert.Equal(6, sp.FeaturesOf(FeatureKind.BoltHole).Count());
        var inst = sp.Instances.Single();
        Assert.Equal(set.Get(PartForge.Design.Parts.PartId.RotorBack).Instances[0].TopZMm, inst.BottomZMm, 9);
        Assert.Equal(set.Get(PartForge.Design.Parts.PartId.RotorFront).Instances[0].BottomZMm, inst.TopZMm, 9);
        var m = MeshValidator.Validate(sp.Mesh);
        Assert.True(m.IsValid, m.ToString());
        Assert.Equal(1 + 6, m.Genus);
    }

    [Fact]
    public void GapGaugeForSingleRotor()
    {
        var d = TestDesigns.SingleRotor();
        var set = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), TestDesigns.RoundCoil(d, 5, 20, 60, 100), TestDesigns.Prec(d));
        var sp = set.Get(PartForge.Design.Parts.PartId.GapGauge);
        // Ring face at thickness / 2 = 3; rotor face at pack / 2 + air_gap (magnets recessed: pocket 5.8, magnet 4).
        double pack = Math.Max(6, 5 + 2 * 0.8);
        Assert.Equal(pack / 2 + 1.0 - 3.0, sp.HeightMm, 9);
        Assert.False(sp.Rotating);
        var m = MeshValidator.Validate(sp.Mesh);
        Assert.True(m.IsValid, m.ToString());
        Assert.Equal(0, m.Genus); // a fork: open on one side so it slides off the shaft
        // Outer radius 1 mm inside the nearer of pockets (40 - 6.075) and seats (40 - 10.2).
        double ro = Math.Min(40 - 6.075, 40 - 10.2) - 1.0, ri = 4.5;
        // Fork area: disc pi ro^2 less the slot strip (integral of the chord) less the inner half disc.
        double alpha = Math.Asin(ri / ro);
        double area = ro * ro * (Math.PI - alpha) - ri * Math.Sqrt(ro * ro - ri * ri) - Math.PI * ri * ri / 2;
        double bound = TestDesigns.Tol * 2 * Math.PI * (ro + ri) * sp.HeightMm;
        Assert.InRange(sp.VolumeMm3, area * sp.HeightMm - bound, area * sp.HeightMm + bound);
    }

    [Fact]
    public void RimSpacerBetweenTheStatorsOfDualStator()
    {
        var d = TestDesigns.DualStator();
        var set = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), TestDesigns.RoundCoil(d, 6, 45), TestDesigns.Prec(d));
        var sp = set.Get(PartForge.Design.Parts.PartId.RimSpacer);
        // Rotor faces at +-3 (magnets 6 = rotor 6), stationary faces at +-(3 + air_gap), pack 6.6 centred beyond them,
        // ring (5 thick) centred in the pack: inner ring faces at +-(4 + 3.3 - 2.5).
        Assert.Equal(2 * (3 + 1.0 + 3.3 - 2.5), sp.HeightMm, 9);
        Assert.Equal(52 + 2.0, sp.Feature("bore").Contour.Circle!.Value.Radius, 12);
        Assert.Equal(4, sp.FeaturesOf(FeatureKind.MountHole).Count());
        var m = MeshValidator.Validate(sp.Mesh);
        Assert.True(m.IsValid, m.ToString());
        Assert.Equal(1 + 4, m.Genus);
    }
}
