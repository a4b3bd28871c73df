using PartForge.Design.Machines;
using PartForge.Electrical;

namespace PartForge.Checks.Tests.Pipeline;

/// <summary>
/// Findings: gap.air_gap 50 gave an EMF of 0 V and "pass" with no warning; electrical rows printed value 0,
/// limit 0, margin 0; a fix said "lower coils.turns to 0".
/// </summary>
public class UselessMachineTests
{
    private static CheckResult? Find(CheckReport r, string id) => r.Checks.SingleOrDefault(c => c.Id == id);

    private const string GapId = CheckIds.Electrical + "-gap-weakens-field";
    private const string EmfId = CheckIds.Electrical + "-emf-negligible";

    [Fact]
    public void An_air_gap_of_50_mm_warns_that_the_field_dies_away_and_that_the_emf_is_negligible()
    {
        var d = PresetPipeline.Load("crank-bench", ("gap.air_gap", "50"));
        var r = PresetPipeline.Check(d);
        var gap = Find(r, GapId);
        Assert.NotNull(gap);
        Assert.Equal(CheckStatus.Warn, gap!.Status);
        Assert.True(gap.Measured);
        // Independent figure: crank-bench's 12 disc magnets on radius 40 (invented preset) have a pole pitch of
        // 2 pi 40 / 12 = 20.944 mm; the magnetic gap is the stack's (50.8 mm): exp(-pi 50.8 / 20.944) = 4.9e-4.
        double g = MachineModel.From(d).Stack.MagneticGapMm;
        Assert.Equal(Math.Exp(-Math.PI * g / (2 * Math.PI * 40 / 12)), gap.Value, 6);
        Assert.Equal(0.1, gap.Limit);
        Assert.True(gap.Margin < 0);
        var emf = Find(r, EmfId);
        Assert.NotNull(emf);
        Assert.Equal(CheckStatus.Warn, emf!.Status);
        Assert.Equal("V", emf.Unit);
        Assert.True(emf.Value < 0.01, emf.Message);
        Assert.DoesNotContain(r.Checks, c => c.Status == CheckStatus.Fail); // nothing else is wrong: the warnings are the news
    }

    [Fact]
    public void The_air_gap_the_warning_names_clears_it()
    {
        var r = PresetPipeline.Check(PresetPipeline.Load("crank-bench", ("gap.air_gap", "20")));
        var gap = Find(r, GapId)!;
        var m = System.Text.RegularExpressions.Regex.Match(gap.Message, @"lower gap\.air_gap to ([0-9.]+)");
        Assert.True(m.Success, gap.Message);
        var fixedR = PresetPipeline.Check(PresetPipeline.Load("crank-bench", ("gap.air_gap", m.Groups[1].Value)));
        Assert.Null(Find(fixedR, GapId));
    }

    [Fact]
    public void The_field_decay_the_warning_assumes_is_the_engines_own_at_large_gaps()
    {
        // The warning's basis: the fundamental of alternating magnets decays as exp(-pi g / tau) across the gap
        // (Laplace solution above a periodic magnetisation; textbook, docs/physics.md §12). The engine integrates
        // the real 3D field of finite magnets, which also falls off radially, so its EMF falls at least this fast:
        // between 10 and 15 mm of air gap the engine's EMF ratio is at most exp(-pi 5 / 20.944) = 0.472 and not
        // far below it (within a factor 2).
        double E(string air) => ElectricalEngine.Evaluate(MachineModel.From(PresetPipeline.Load("crank-bench", ("gap.air_gap", air)))).LineEmfRmsV;
        double ratio = E("15") / E("10");
        double planar = Math.Exp(-Math.PI * 5 / (2 * Math.PI * 40 / 12));
        Assert.InRange(ratio, planar / 2, planar * 1.05);
    }

    [Theory]
    [MemberData(nameof(CoilPlacementTests.Presets), MemberType = typeof(CoilPlacementTests))]
    public void No_preset_warns_of_a_weak_field_or_a_negligible_emf(string preset)
    {
        var r = PresetPipeline.Check(PresetPipeline.Load(preset));
        Assert.Null(Find(r, GapId));
        Assert.Null(Find(r, EmfId));
    }

    [Fact]
    public void A_finding_with_no_number_is_marked_unmeasured_and_one_with_a_number_carries_it()
    {
        // Fill factor 0.9069 (the schema's maximum, the hexagonal packing limit of bare wire) cannot be reached with
        // enamelled AWG 28: value 0.9069 against (0.321 / 0.374)^2 x 0.9069 = 0.668 (wire sizes as the engine reports them).
        var m = MachineModel.From(PresetPipeline.Load("crank-bench", ("coils.fill_factor", "0.9069")));
        var r = CheckRunner.Run(m, ElectricalEngine.Evaluate(m), parts: null); // no coil, so no parts (as the orchestrator does)
        var fill = Find(r, CheckIds.Electrical + "-fill-unachievable")!;
        Assert.True(fill.Measured);
        Assert.Equal(0.9069, fill.Value, 6);
        Assert.InRange(fill.Limit, 0.6, 0.7);
        Assert.Equal(fill.Limit - fill.Value, fill.Margin, 9);
        var unresolved = Find(r, "coil-unresolved")!;
        Assert.False(unresolved.Measured);
    }

    [Fact]
    public void A_coil_overlap_fix_never_asks_for_zero_turns_and_the_turns_it_names_remove_the_overlap()
    {
        var d = PresetPipeline.Load("crank-bench", ("coils.turns", "2000"));
        var r = PresetPipeline.Check(d);
        foreach (var c in r.Checks.Where(c => c.Status != CheckStatus.Pass))
        {
            Assert.DoesNotContain("coils.turns to 0", c.Message);
            Assert.DoesNotContain("to -", c.Message);
        }
        var overlap = Find(r, CheckIds.Electrical + "-coil-overlap")!;
        Assert.True(overlap.Measured);
        Assert.True(overlap.Value < 0);
        var m = System.Text.RegularExpressions.Regex.Match(overlap.Message, @"lower coils\.turns to ([0-9]+)");
        Assert.True(m.Success, overlap.Message);
        var r2 = PresetPipeline.Check(PresetPipeline.Load("crank-bench", ("coils.turns", m.Groups[1].Value)));
        Assert.Null(Find(r2, CheckIds.Electrical + "-coil-overlap"));
    }

    [Fact]
    public void The_schema_maxima_of_br_and_fill_factor_are_judged_by_the_checks_not_refused()
    {
        // br 2 (the schema's maximum) loads and passes every check of crank-bench; fill_factor 0.9069 (the schema's
        // maximum, hexagonal packing of bare wire) loads and fails only because enamel takes room, with a fix that
        // names a value that then passes.
        var br = PresetPipeline.Check(PresetPipeline.Load("crank-bench", ("magnets.br", "2")));
        Assert.DoesNotContain(br.Checks, c => c.Status == CheckStatus.Fail);
        var m = MachineModel.From(PresetPipeline.Load("crank-bench", ("coils.fill_factor", "0.9069")));
        var fill = Find(CheckRunner.Run(m, ElectricalEngine.Evaluate(m), parts: null), CheckIds.Electrical + "-fill-unachievable")!;
        var to = System.Text.RegularExpressions.Regex.Match(fill.Message, @"lower coils\.fill_factor to ([0-9.]+)");
        Assert.True(to.Success, fill.Message);
        var fixedR = PresetPipeline.Check(PresetPipeline.Load("crank-bench", ("coils.fill_factor", to.Groups[1].Value)));
        Assert.Null(Find(fixedR, CheckIds.Electrical + "-fill-unachievable"));
    }

    [Fact]
    public void No_speed_fix_lowers_max_rpm_below_the_rated_speed()
    {
        // A PLA rotor at 40,000 rpm rated (invented): the hoop stress and the magnet retention fail; lowering
        // machine.max_rpm below machine.rated_rpm would be refused by the loader, so no fix may say so.
        var d = PresetPipeline.Load("crank-bench", ("machine.rated_rpm", "40000"), ("machine.max_rpm", "40000"));
        var r = PresetPipeline.Check(d);
        var failing = r.Checks.Where(c => c.Status == CheckStatus.Fail && c.Id is CheckIds.RotorHoopStress or CheckIds.MagnetRetention).ToList();
        Assert.NotEmpty(failing);
        foreach (var c in failing)
        {
            var m = System.Text.RegularExpressions.Regex.Match(c.Message, @"lower machine\.max_rpm to ([0-9]+)");
            if (m.Success) Assert.True(double.Parse(m.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture) >= 40000, c.Message);
            Assert.Contains("; ", c.Message); // a fix is still named
        }
    }
}
