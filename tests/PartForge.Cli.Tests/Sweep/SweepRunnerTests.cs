using PartForge.Cli.Sweep;
using PartForge.Design.Loading;

namespace PartForge.Cli.Tests.Sweep;

public class SweepRunnerTests
{
    /// <summary>A test double: a result that depends on the loaded design only, so order and determinism are visible.</summary>
    private sealed class EchoEvaluator : ISweepEvaluator
    {
        public SweepOutcome Evaluate(Design.Machines.MachineModel d) => new(d.Gap.AirGapMm > 1.6 ? "warn" : "pass", "",
            new Dictionary<string, double> { [SweepMetrics.Turns] = d.Coils.Turns ?? 0, [SweepMetrics.PhaseEmfRms] = (d.Coils.Turns ?? 0) * 0.1 / d.Gap.AirGapMm });
    }

    internal static string Preset(string name)
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir != null && !File.Exists(Path.Combine(dir.FullName, "PartForge.sln"))) dir = dir.Parent;
        return File.ReadAllText(Path.Combine(dir!.FullName, "presets", name + ".yaml"));
    }

    [Fact]
    public void Rows_come_back_in_plan_order_whatever_the_threads()
    {
        var source = DesignLoader.Parse(Preset("wind-duo"), "wind-duo.yaml");
        var errors = new List<string>();
        var plan = SweepPlan.Parse(["coils.turns=40..80:5", "gap.air_gap=1..2:0.25"], errors)!;
        var parallel = SweepRunner.Run(source, plan, new EchoEvaluator());
        var serial = SweepRunner.Run(source, plan, new EchoEvaluator(), maxThreads: 1);
        Assert.Equal(plan.Count, parallel.Length);
        for (int i = 0; i < parallel.Length; i++)
        {
            Assert.Equal(i, parallel[i].Index);
            Assert.Equal(serial[i].Values, parallel[i].Values);
            Assert.Equal(serial[i].Outcome.Metrics[SweepMetrics.PhaseEmfRms], parallel[i].Outcome.Metrics[SweepMetrics.PhaseEmfRms]);
        }
        Assert.Equal(SweepOutput.Csv(plan, serial), SweepOutput.Csv(plan, parallel));
        Assert.Equal(40 + 5 * (7 / 5), parallel[7].Outcome.Metrics[SweepMetrics.Turns]);
    }

    [Fact]
    public void A_variant_the_loader_rejects_is_an_invalid_row_with_the_reason()
    {
        var source = DesignLoader.Parse(Preset("wind-duo"), "wind-duo.yaml");
        var errors = new List<string>();
        // A pocket floor as thick as wind-duo's 6.5 mm rotor (invented preset) leaves no pocket: the second variant
        // breaks a cross-key rule (values outside a key's own range are refused with the --vary argument).
        var plan = SweepPlan.Parse(["rotor.pocket_floor=1.5..6.5:5"], errors)!;
        var rows = SweepRunner.Run(source, plan, new EchoEvaluator());
        Assert.Equal("pass", rows[0].Outcome.Status);
        Assert.Equal("invalid", rows[1].Outcome.Status);
        Assert.Contains("rotor.pocket_floor", rows[1].Outcome.Reason);
    }

    [Fact]
    public void Target_sorts_by_closeness_and_keeps_invalid_rows_last()
    {
        var source = DesignLoader.Parse(Preset("wind-duo"), "wind-duo.yaml");
        var errors = new List<string>();
        // Pocket floor 6.5 on the 6.5 mm rotor is invalid (no pocket): those rows go last.
        var plan = SweepPlan.Parse(["gap.air_gap=0.5..2:0.5", "rotor.pocket_floor=1.5..6.5:5"], errors)!;
        var rows = SweepRunner.Run(source, plan, new EchoEvaluator());
        var target = SweepTarget.Parse("phase.emf_rms_v=4", out _)!;
        var sorted = target.Sort(rows);
        // turns 60: emf = 6 / gap -> gaps 0.5, 1, 1.5, 2 give 12, 6, 4, 3; closest to 4 is 1.5, then 2 (3), then 1 (6).
        Assert.Equal([1.5, 2, 1, 0.5], sorted.Take(4).Select(r => r.Values[0]));
        Assert.All(sorted.Take(4), r => Assert.Equal(1.5, r.Values[1]));
        Assert.All(sorted.Skip(4), r => Assert.Equal("invalid", r.Outcome.Status));
    }

    [Fact]
    public void Json_and_table_carry_every_variant()
    {
        var source = DesignLoader.Parse(Preset("wind-duo"), "wind-duo.yaml");
        var errors = new List<string>();
        var plan = SweepPlan.Parse(["coils.turns=50..70:10"], errors)!;
        var rows = SweepRunner.Run(source, plan, new EchoEvaluator());
        using var doc = System.Text.Json.JsonDocument.Parse(SweepOutput.Json("wind-duo", plan, rows, null));
        Assert.Equal("partforge-sweep/1", doc.RootElement.GetProperty("format").GetString());
        Assert.Equal(3, doc.RootElement.GetProperty("variants").GetArrayLength());
        Assert.Equal(70, doc.RootElement.GetProperty("variants")[2].GetProperty("values").GetProperty("coils.turns").GetDouble());
        string table = SweepOutput.PlainTable(plan, rows, null);
        Assert.Equal(4, table.TrimEnd('\n').Split('\n').Length);
        Assert.Contains("coils.turns", table.Split('\n')[0]);
    }

    [Fact]
    public void Rows_are_handed_on_in_plan_order_while_the_sweep_still_runs()
    {
        // Finding: the CSV of a sweep was written only at the end, with every row held. The rows go out a block at
        // a time, in plan order, while later blocks are still to be evaluated.
        var source = DesignLoader.Parse(Preset("wind-duo"), "wind-duo.yaml");
        var errors = new List<string>();
        var plan = SweepPlan.Parse(["coils.turns=40..2539:1"], errors)!;
        Assert.True(plan.Count > 2 * SweepRunner.BlockSize);
        var done = new System.Runtime.CompilerServices.StrongBox<long>();
        var seen = new List<long>();
        long doneAtFirst = -1;
        SweepRunner.Run(source, plan, new EchoEvaluator(), done, inOrder: r =>
        {
            if (seen.Count == 0) doneAtFirst = Interlocked.Read(ref done.Value);
            seen.Add(r.Index);
        });
        Assert.Equal(Enumerable.Range(0, (int)plan.Count).Select(i => (long)i), seen);
        Assert.True(doneAtFirst <= SweepRunner.BlockSize, $"first row handed on after {doneAtFirst} of {plan.Count} variants");
    }
}
