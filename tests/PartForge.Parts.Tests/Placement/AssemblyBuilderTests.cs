using PartForge.Design.Stack;
using PartForge.Geometry.Meshes;
using PartForge.Parts.Placement;

namespace PartForge.Parts.Tests.Placement;

public class AssemblyBuilderTests
{
    [Fact]
    public void EveryCopyPlacedAtItsStackPosition()
    {
        var d = TestDesigns.DualRotor();
        var set = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), TestDesigns.RoundCoil(d, 6, 15, 45, 75), TestDesigns.Prec(d));
        var placed = AssemblyBuilder.Build(set, exploded: false);
        Assert.Equal(set.Parts.Sum(p => p.Quantity), placed.Count);
        Assert.Equal(12, placed.Count(p => p.Name == "former"));
        Assert.Equal(placed.Count, placed.Select(p => p.ObjectName).Distinct().Count());
        foreach (var pp in placed)
        {
            var inst = pp.Part.Instances.Single(i => i.Index == pp.Instance);
            var (min, max) = pp.Mesh.Bounds();
            Assert.Equal(inst.BottomZMm, min.Z, 4);
            Assert.Equal(inst.TopZMm, max.Z, 4);
            var r = MeshValidator.Validate(pp.Mesh);
            Assert.True(r.IsValid, $"{pp.ObjectName}: {r}"); // placing (rotation, turning over) keeps the mesh outward
            Assert.Equal(pp.Part.VolumeMm3, r.SignedVolume, 3);
        }
        // Nominal axial positions are the AxialStack slabs.
        foreach (var name in new[] { "rotor-front", "rotor-back" })
        {
            var slab = set.Stack.Slabs.Single(s => s.Kind == SlabKind.Rotor && s.Owner.Name == name);
            var mesh = placed.Single(p => p.Name == name).Mesh.Bounds();
            Assert.Equal(slab.ZMin, mesh.Min.Z, 4);
            Assert.Equal(slab.ZMax, mesh.Max.Z, 4);
        }
        // The rotors' stator-side faces are the air gap away from the stationary pack (magnets recessed here).
        double pack = set.Stack.StationaryThicknessMm;
        Assert.Equal(pack / 2 + d.Gap.AirGap, set.Get(PartForge.Design.Parts.PartId.RotorFront).Instances[0].BottomZMm, 9);
        Assert.Equal(-(pack / 2 + d.Gap.AirGap), set.Get(PartForge.Design.Parts.PartId.RotorBack).Instances[0].TopZMm, 9);
    }

    [Fact]
    public void FormersSitOnTheirCoilCentres()
    {
        var d = TestDesigns.SingleRotor();
        var set = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), TestDesigns.RoundCoil(d, 5, 20, 60, 100), TestDesigns.Prec(d));
        var placed = AssemblyBuilder.Build(set, exploded: false, onlyParts: new[] { PartForge.Design.Parts.PartId.Former });
        Assert.Equal(9, placed.Count);
        foreach (var pp in placed)
        {
            var (min, max) = pp.Mesh.Bounds();
            double cx = (min.X + max.X) / 2, cy = (min.Y + max.Y) / 2;
            double a = pp.Instance * 40.0 * Math.PI / 180;
            // Centre of the flange's bounding box: the round flange less its small flat, within the flat depth.
            Assert.InRange(Math.Sqrt((cx - 40 * Math.Cos(a)) * (cx - 40 * Math.Cos(a)) + (cy - 40 * Math.Sin(a)) * (cy - 40 * Math.Sin(a))), 0, 0.6);
            // Centred on the stator ring's mid-plane.
            var ring = set.Get(PartForge.Design.Parts.PartId.Stator).Instances[0];
            Assert.Equal((ring.BottomZMm + ring.TopZMm) / 2, (min.Z + max.Z) / 2, 4);
        }
    }

    [Fact]
    public void ExplodedMovesPartsApartByTheExplodeDistance()
    {
        var d = TestDesigns.DualRotor();
        var set = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), TestDesigns.RoundCoil(d, 6, 15, 45, 75), TestDesigns.Prec(d));
        var nominal = AssemblyBuilder.Build(set, exploded: false);
        var exploded = AssemblyBuilder.Build(set, exploded: true);
        double e = d.Assembly.Explode;
        for (int i = 0; i < nominal.Count; i++)
        {
            var inst = nominal[i].Part.Instances.Single(x => x.Index == nominal[i].Instance);
            Assert.Equal(nominal[i].Mesh.Bounds().Min.Z + inst.ExplodeRank * e, exploded[i].Mesh.Bounds().Min.Z, 4);
        }
        Assert.Equal(e, exploded.Single(p => p.Name == "rotor-front").Mesh.Bounds().Min.Z - nominal.Single(p => p.Name == "rotor-front").Mesh.Bounds().Min.Z, 4);
    }
}
