using PartForge.Design.Machines;
namespace PartForge.Parts.Tests;

public class PartsBuilderTests
{
    [Fact]
    public void ProcessDefaultsAndMasses()
    {
        var d = TestDesigns.DualRotor();
        var set = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), TestDesigns.RoundCoil(d, 6, 15, 45, 75), TestDesigns.Prec(d));
        Assert.Equal(new[] { "rotor-front", "rotor-back", "back-iron", "former", "stator", "hub-spacer" }, set.Parts.Select(p => p.Name));
        foreach (var p in set.Parts)
        {
            var (proc, mat) = p.Name switch
            {
                "back-iron" => (PartProcess.Cut, "steel"),
                "hub-spacer" => (PartProcess.Cut, "acrylic"),
                _ => (PartProcess.Print, "PLA"),
            };
            Assert.Equal(proc, p.Process);
            Assert.Equal(mat, p.Material.Name);
            Assert.Equal(proc == PartProcess.Cut, p.CutProfile is not null);
            // Density: PLA 1.24 g/cm^3 (docs/physics.md §8), steel 7.85 (EN 1993-1-1 3.2.6), acrylic 1.18 (datasheets, from memory).
            double rho = mat switch { "PLA" => 1.24, "steel" => 7.85, _ => 1.18 };
            Assert.Equal(rho * p.VolumeMm3 / 1000.0, p.MassG, 9);
            Assert.Equal(p.Instances.Count, p.Quantity);
        }
        Assert.DoesNotContain(set.Diagnostics, x => x.Severity == DiagnosticSeverity.Error);
    }

    [Fact]
    public void OverridesChangeProcessAndMaterial()
    {
        var d = TestDesigns.DualRotor();
        var over = new PartForge.Design.Model.Design
        {
            Name = d.Name, Machine = d.Machine, Magnets = d.Magnets, Rotor = d.Rotor, Coils = d.Coils, Former = d.Former,
            Stator = d.Stator, Sensor = d.Sensor, Mesh = d.Mesh,
            Parts = new PartForge.Design.Model.PartOverrides
            {
                Spacer = new PartForge.Design.Model.PartOverride { Process = "print", Material = "PETG" },
                Former = new PartForge.Design.Model.PartOverride { Material = "ABS" },
                Stator = new PartForge.Design.Model.PartOverride { Process = "cut" },
            },
        };
        var set = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(over), TestDesigns.RoundCoil(over, 6, 15, 45, 75), TestDesigns.Prec(over));
        Assert.Equal(PartProcess.Print, set.Get(PartForge.Design.Parts.PartId.HubSpacer).Process);
        Assert.Equal("PETG", set.Get(PartForge.Design.Parts.PartId.HubSpacer).Material.Name);
        Assert.Null(set.Get(PartForge.Design.Parts.PartId.HubSpacer).CutProfile);
        Assert.Equal("ABS", set.Get(PartForge.Design.Parts.PartId.Former).Material.Name);
        // A stator ring has grooves and blind pockets: cut is refused with a diagnostic naming the key.
        var err = Assert.Single(set.Diagnostics, x => x.Severity == DiagnosticSeverity.Error);
        Assert.Equal(PartForge.Design.Parts.PartId.Stator, err.Part);
        Assert.Contains("parts.stator.process", err.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void SameDesignSameParts()
    {
        var d = TestDesigns.SingleRotor();
        var a = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), TestDesigns.RoundCoil(d, 5, 20, 60, 100), TestDesigns.Prec(d));
        var b = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), TestDesigns.RoundCoil(d, 5, 20, 60, 100), TestDesigns.Prec(d));
        foreach (var (p, q) in a.Parts.Zip(b.Parts))
        {
            Assert.Equal(p.Mesh.Vertices, q.Mesh.Vertices);
            Assert.Equal(p.Mesh.Indices, q.Mesh.Indices);
        }
    }
}
