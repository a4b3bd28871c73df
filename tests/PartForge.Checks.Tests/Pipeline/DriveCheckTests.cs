using PartForge.Electrical.Switching;

namespace PartForge.Checks.Tests.Pipeline;

/// <summary>
/// drive-pulse-torque, drive-start, switch-current, switch-voltage, switch-power and drive-freewheel on the real
/// stages (pulse-sculpture, an invented preset). The expected torque signs come from T = i d lambda / d theta
/// (textbook coenergy torque of an air-cored coil) integrated over each window from the planner's own flux
/// linkage, and the fixes are followed to show they work.
/// </summary>
public class DriveCheckTests
{
    private static CheckResult One(CheckReport r, string id) => r.Checks.Single(c => c.Id == id);

    [Fact]
    public void The_preset_drive_runs_every_pulse_and_the_alternating_reed_combination_fails_with_its_fix()
    {
        var good = PresetPipeline.Check(PresetPipeline.Load("pulse-sculpture"));
        Assert.Equal(CheckStatus.Pass, One(good, CheckIds.DrivePulseTorque).Status);
        Assert.NotEqual(CheckStatus.Fail, One(good, CheckIds.DriveStart).Status);

        // The same design with alternating magnets: a reed closes on either pole, every second pulse brakes.
        var bad = PresetPipeline.Load("pulse-sculpture", ("magnets.arrangement", "alternating"));
        var (e, _) = PresetPipeline.Stages(bad);
        var plan = e.Switching!;
        // Source: half-wave symmetry of the alternating field, lambda(theta + pi / p) = -lambda(theta): the closure over
        // the opposite pole sees the opposite d lambda / d theta, so the torque integrals cancel in pairs.
        var w = plan.Circuits[0].Windows;
        Assert.Equal(w.Count / 2, w.Count(x => x.Brakes));
        Assert.Equal(0, w.Sum(x => x.FluxChangeWb), 1e-6 * w.Max(x => Math.Abs(x.FluxChangeWb)));
        var r = PresetPipeline.Check(bad);
        var torque = One(r, CheckIds.DrivePulseTorque);
        Assert.Equal(CheckStatus.Fail, torque.Status);
        Assert.Equal(w.Count / 2, torque.Value);
        Assert.Contains("magnets.arrangement: same", torque.Message);
        Assert.Equal(CheckStatus.Fail, One(r, CheckIds.DriveStart).Status); // mean torque 0: cannot run up

        // Following the fix (a Hall switches on one pole only) makes every pulse drive.
        var hall = PresetPipeline.Load("pulse-sculpture", ("magnets.arrangement", "alternating"), ("sensor.kind", "hall"), ("sensor.operate", "6"), ("sensor.release", "4"));
        Assert.Equal(CheckStatus.Pass, One(PresetPipeline.Check(hall), CheckIds.DrivePulseTorque).Status);
    }

    [Fact]
    public void A_too_sensitive_reed_close_to_same_pole_magnets_closes_on_the_return_field_and_its_computed_fix_works()
    {
        // The reed body 1.6 mm tall (sensing point 0.8 mm into the ring) at 3 mT pull-in: the return field between
        // the same-pole magnets closes it too, and those closures brake.
        var d = PresetPipeline.Load("pulse-sculpture", ("sensor.body.height", "1.6"), ("sensor.operate", "3"), ("sensor.release", "1.5"));
        var (e, _) = PresetPipeline.Stages(d);
        Assert.True(e.Switching!.FieldMinTesla < -0.003, "the return field reaches the pull-in");
        var t = One(PresetPipeline.Check(d), CheckIds.DrivePulseTorque);
        Assert.Equal(CheckStatus.Fail, t.Status);
        double op = e.Switching.RunsFromOperateTesla!.Value * 1000;
        Assert.Contains("sensor.operate", t.Message);
        var fixedDesign = PresetPipeline.Load("pulse-sculpture", ("sensor.body.height", "1.6"), ("sensor.operate", Judge.Up(op)), ("sensor.release", Judge.Up(op / 2)));
        Assert.Equal(CheckStatus.Pass, One(PresetPipeline.Check(fixedDesign), CheckIds.DrivePulseTorque).Status);
    }

    [Fact]
    public void Switch_ratings_judge_the_computed_current_kick_and_power()
    {
        // Source: stall current (V - drops) / R; a reed without a freewheel rings up to V + i sqrt(L / C) (LC circuit).
        var d = PresetPipeline.Load("pulse-sculpture", ("drive.freewheel", "none"), ("drive.switch_current_rating", "0.5"));
        var (e, _) = PresetPipeline.Stages(d);
        var plan = e.Switching!;
        var r = PresetPipeline.Check(d);
        var cur = One(r, CheckIds.SwitchCurrent);
        Assert.Equal(plan.PeakCurrentA, cur.Value, 12);
        Assert.Equal(plan.PeakCurrentA > 0.5 ? CheckStatus.Fail : plan.PeakCurrentA > 0.4 ? CheckStatus.Warn : CheckStatus.Pass, cur.Status);
        var v = One(r, CheckIds.SwitchVoltage);
        double kick = plan.SupplyV + plan.PeakCurrentA * Math.Sqrt(e.Phase!.InductanceUh * 1e-6 / SwitchingPlan.StrayCapacitanceF);
        Assert.Equal(kick, v.Value, 9);
        Assert.Equal(kick > 200 ? CheckStatus.Fail : kick > 160 ? CheckStatus.Warn : CheckStatus.Pass, v.Status);
        Assert.Equal(CheckStatus.Fail, One(r, CheckIds.DriveFreewheel).Status); // a reed without a freewheel arcs
        Assert.Equal(plan.PeakCurrentA * plan.SupplyV, One(r, CheckIds.SwitchPower).Value, 12);
        Assert.Equal(CheckStatus.Pass, One(PresetPipeline.Check(PresetPipeline.Load("pulse-sculpture")), CheckIds.DriveFreewheel).Status);
    }

    [Fact]
    public void A_generator_has_no_drive_checks()
    {
        var r = PresetPipeline.Check(PresetPipeline.Load("pulse-sculpture", ("machine.role", "generator")));
        Assert.DoesNotContain(r.Checks, c => c.Id.StartsWith("drive-", StringComparison.Ordinal) || c.Id.StartsWith("switch-", StringComparison.Ordinal));
    }
}
