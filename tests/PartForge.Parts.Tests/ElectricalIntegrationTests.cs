using PartForge.Design.Model;
using PartForge.Electrical;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Profiles;
using D = PartForge.Design.Model;

namespace PartForge.Parts.Tests;

/// <summary>The parts built from the electrical engine's own results.</summary>
public class ElectricalIntegrationTests
{
    private static D.Design Keystone()
    {
        var d = TestDesigns.SingleRotor();
        return new D.Design
        {
            Name = "test-keystone", Machine = d.Machine, Magnets = d.Magnets, Rotor = d.Rotor, Former = d.Former, Stator = d.Stator,
            Sensor = d.Sensor, Mesh = d.Mesh,
            Coils = new Coils { Shape = "keystone", Turns = 60, Wire = new Wire { Awg = 28 }, Height = 5, PitchRadius = 40, Core = new Core { Width = 4 } },
        };
    }

    [Theory]
    [InlineData("round")]
    [InlineData("keystone")]
    public void FormerWindowIsTheEnginesCoilWindow(string shape)
    {
        var d = shape == "round" ? TestDesigns.SingleRotor() : Keystone();
        var e = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        var outline = e.Coil!.Outline!;
        var set = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), e, TestDesigns.Prec(d));
        var former = set.Get(PartForge.Design.Parts.PartId.Former);
        var core = former.Feature("core").Contour.Translated(new PartForge.Geometry.Primitives.Vec2(outline.PitchRadiusMm, 0));
        // Same exact contour: segment for segment (or the same circle).
        Assert.Equal(outline.Window.Circle, core.Circle);
        Assert.Equal(outline.Window.Segments.Count, core.Segments.Count);
        for (int i = 0; i < core.Segments.Count; i++)
        {
            Assert.Equal(outline.Window.Segments[i].Start.X, core.Segments[i].Start.X, 12);
            Assert.Equal(outline.Window.Segments[i].Start.Y, core.Segments[i].Start.Y, 12);
            Assert.Equal(outline.Window.Segments[i].GetType(), core.Segments[i].GetType());
        }
        var wc = former.Feature("core");
        Assert.Equal(outline.HeightMm, wc.Z1Mm - wc.Z0Mm, 12);
        Assert.Equal(9, former.Quantity);
        // The flange covers the winding outline by former.margin everywhere (before the key flat).
        var flange = former.Feature("flange-lower").Contour;
        var outer = former.Feature("winding-outline").Contour;
        foreach (var p in Geo.Sample(outer, 16))
        {
            double dist = Geo.Distance(flange, p);
            Assert.True(dist <= d.Former.Margin + 1e-9, $"{shape}: flange {dist} from the winding");
        }
    }

    [Fact]
    public void SensorPocketsAtTheEnginesAngles()
    {
        var d = TestDesigns.SingleRotor();
        var e = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        var set = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), e, TestDesigns.Prec(d));
        var stator = set.Get(PartForge.Design.Parts.PartId.Stator);
        var inst = stator.Instances.Single();
        var want = e.Sensors!.Sensors;
        var got = stator.FeaturesOf(FeatureKind.SensorPocket).ToList();
        Assert.Equal(want.Count, got.Count);
        for (int i = 0; i < want.Count; i++)
        {
            var c = inst.ToMachine(Geo.VertexCentroid(got[i].Contour));
            Assert.True(Geo.AngleDiff(want[i].AngleDeg, Geo.AngleOf(c)) < 0.1, $"sensor {i}: {Geo.AngleOf(c)} vs {want[i].AngleDeg}");
            Assert.Equal(want[i].RadiusMm, c.Length, 9);
        }
    }

    [Fact]
    public void KeystonePartsAreValidAndFitTheirSeats()
    {
        var d = Keystone();
        var e = ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        var set = PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), e, TestDesigns.Prec(d));
        var former = set.Get(PartForge.Design.Parts.PartId.Former);
        var stator = set.Get(PartForge.Design.Parts.PartId.Stator);
        var si = stator.Instances.Single();
        foreach (var inst in former.Instances.Take(2))
        {
            var seat = si.ToMachine(stator.Feature($"seat-{inst.Index}").Contour);
            foreach (var p in Geo.Sample(inst.ToMachine(former.Feature("flange-lower").Contour), 16))
                Assert.Equal(0.2, Geo.Distance(seat, p), 9);
        }
        var r = MeshValidator.Validate(former.Mesh);
        Assert.True(r.IsValid, r.ToString());
    }
}
