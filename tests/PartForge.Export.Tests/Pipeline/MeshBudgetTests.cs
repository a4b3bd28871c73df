using PartForge.Design.Loading;
using PartForge.Design.Presets;
using PartForge.Export.Pipeline;

namespace PartForge.Export.Tests.Pipeline;

public class MeshBudgetTests
{
    private static Design.Model.Design Load(string preset, params (string, string)[] overrides) =>
        DesignLoader.LoadText(PresetLibrary.Find(preset)!.Text, preset + ".yaml", overrides).Design!;

    [Theory]
    [InlineData("crank-bench")]
    [InlineData("wind-duo")]
    [InlineData("hydro-arc")]
    public void The_estimate_is_above_the_real_triangle_count_and_within_a_factor_of_three(string preset)
    {
        var d = Load(preset);
        var ev = BuildPipeline.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        long actual = ev.Parts!.Parts.Sum(p => (long)p.Mesh.TriangleCount);
        double est = MeshBudget.Estimate(PartForge.Design.Machines.MachineModel.From(d), d.Mesh.ChordalTolerance);
        Assert.True(est >= actual && est <= 3 * actual, $"estimate {est:0}, actual {actual}");
    }

    [Fact]
    public void A_tiny_tolerance_is_refused_with_the_estimate_and_a_tolerance_that_fits()
    {
        var d = Load("crank-bench", ("mesh.chordal_tolerance", "0.000001"));
        string? msg = MeshBudget.Check(PartForge.Design.Machines.MachineModel.From(d), "c.yaml");
        Assert.NotNull(msg);
        Assert.StartsWith("c.yaml: mesh.chordal_tolerance: 0.000001 would need about ", msg);
        double fit = MeshBudget.SmallestTolerance(PartForge.Design.Machines.MachineModel.From(d));
        Assert.True(MeshBudget.Estimate(PartForge.Design.Machines.MachineModel.From(d), fit) <= MeshBudget.MaxTriangles);
        Assert.True(MeshBudget.Estimate(PartForge.Design.Machines.MachineModel.From(d), fit * 0.99) > MeshBudget.MaxTriangles);
        Assert.Null(MeshBudget.Check(PartForge.Design.Machines.MachineModel.From(Load("crank-bench", ("mesh.chordal_tolerance", (fit * 1.1).ToString("R", System.Globalization.CultureInfo.InvariantCulture)))), "c.yaml"));
        foreach (var p in PresetLibrary.All) Assert.Null(MeshBudget.Check(PartForge.Design.Machines.MachineModel.From(DesignLoader.LoadText(p.Text, p.Name).Design!), p.Name));
    }
}

