using PartForge.Cli.Sweep;

namespace PartForge.Cli.Tests.Sweep;

public class SweepPlanTests
{
    [Fact]
    public void A_range_includes_both_ends_on_the_grid()
    {
        var a = SweepAxis.Parse("gap.air_gap=1..2:0.1", out var err);
        Assert.Null(err);
        Assert.Equal(11, a!.Count);
        Assert.Equal("1.3", a.Text(3));  // rounded: no 1.3000000000000003
        Assert.Equal(2, a.Value(10));
    }

    [Fact]
    public void The_last_axis_varies_fastest()
    {
        var errors = new List<string>();
        var plan = SweepPlan.Parse(["coils.turns=100..120:10", "gap.air_gap=1..1.5:0.5"], errors)!;
        Assert.Empty(errors);
        Assert.Equal(6, plan.Count);
        Assert.Equal(["coils.turns=100", "gap.air_gap=1"], plan.Overrides(0).Select(o => o.ToString()));
        Assert.Equal(["coils.turns=100", "gap.air_gap=1.5"], plan.Overrides(1).Select(o => o.ToString()));
        Assert.Equal(["coils.turns=120", "gap.air_gap=1.5"], plan.Overrides(5).Select(o => o.ToString()));
    }

    [Theory]
    [InlineData("coils.turn=100..120:10", "did you mean 'turns'")]
    [InlineData("coils.turns=140..120:10", "FROM 140 is larger than TO 120")]
    [InlineData("coils.turns=100..120:0", "STEP must be positive")]
    [InlineData("coils.turns=100..120:-5", "STEP must be positive")]
    [InlineData("coils.turns=100..120:2.5", "whole numbers")]
    [InlineData("machine.layout=1..2:1", "only numeric keys")]
    [InlineData("coils.turns=100-120", "expected KEY=FROM..TO:STEP")]
    [InlineData("coils.turns=a..120:10", "finite numbers")]
    [InlineData("coils.turns=1..1000000000:1", "limit")]
    public void Bad_ranges_and_keys_get_a_clear_reason(string arg, string expected)
    {
        var errors = new List<string>();
        Assert.Null(SweepPlan.Parse([arg], errors));
        Assert.Contains(expected, Assert.Single(errors));
    }

    [Fact]
    public void Too_many_combinations_are_refused_before_any_work()
    {
        var errors = new List<string>();
        Assert.Null(SweepPlan.Parse(["coils.turns=1..1000:1", "gap.air_gap=0.1..20:0.1", "magnets.thickness=1..10:1"], errors));
        Assert.Contains("more than the limit of 100000", Assert.Single(errors));
    }

    [Fact]
    public void A_key_varied_twice_is_an_error()
    {
        var errors = new List<string>();
        Assert.Null(SweepPlan.Parse(["coils.turns=1..2:1", "coils.turns=3..4:1"], errors));
        Assert.Contains("varied twice", Assert.Single(errors));
    }

    [Fact]
    public void Target_keys_are_checked_with_a_suggestion()
    {
        Assert.Null(SweepTarget.Parse("phase.emf_rms=12", out var err));
        Assert.Contains("did you mean 'electrical.phase.emf_rms_v'", err);
        Assert.NotNull(SweepTarget.Parse("electrical.phase.emf_rms_v=12", out err));
        Assert.Null(err);
        // The short name of earlier versions is read as an alias of the results path.
        Assert.Equal("electrical.phase.emf_rms_v", SweepTarget.Parse("phase.emf_rms_v=12", out err)!.Key);
        Assert.Null(err);
        Assert.Null(SweepTarget.Parse("phase.emf_rms_v=abc", out err));
    }
}
