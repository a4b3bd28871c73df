using PartForge.Cli.Sweep;
using PartForge.Design.Loading;
using PartForge.Export.Pipeline;

namespace PartForge.Cli.Tests.Sweep;

public class PipelineEvaluatorTests
{
    [Theory]
    [InlineData("crank-bench")]
    [InlineData("wind-duo")]
    [InlineData("hydro-arc")]
    public void Coarse_sweep_polygons_give_exactly_the_checks_of_the_build_pipeline(string preset)
    {
        var d = DesignLoader.LoadText(SweepRunnerTests.Preset(preset), preset + ".yaml").Design!;
        var fast = PipelineEvaluator.EvaluateStages(PartForge.Design.Machines.MachineModel.From(d)).Checks.Checks;
        var full = BuildPipeline.Evaluate(PartForge.Design.Machines.MachineModel.From(d)).Checks.Checks;
        Assert.Equal(full.Select(c => (c.Id, c.Part, c.StatusText, c.Value, c.Limit, c.Margin)), fast.Select(c => (c.Id, c.Part, c.StatusText, c.Value, c.Limit, c.Margin)));
    }

    [Fact]
    public void Metrics_are_the_electrical_engines_and_the_checkers_values()
    {
        var d = DesignLoader.LoadText(SweepRunnerTests.Preset("wind-duo"), "wind-duo.yaml").Design!;
        var ev = BuildPipeline.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        var o = new PipelineEvaluator().Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        Assert.Equal(ev.Checks.StatusText, o.Status);
        Assert.Equal(ev.Electrical.Phase!.EmfRmsV, o.Metrics[SweepMetrics.PhaseEmfRms]);
        Assert.Equal(ev.Electrical.LineEmfRmsV, o.Metrics[SweepMetrics.LineEmfRms]);
        Assert.Equal(ev.Checks.WithId("running-gap").Min(c => c.Value), o.Metrics[SweepMetrics.WorstRunningGap]);
    }
}
