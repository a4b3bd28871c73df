namespace PartForge.Checks.Tests.Pipeline;

/// <summary>storage-overvoltage, stored-energy and charge-cut-in on the real stages (crank-bench and wind-duo, invented presets).</summary>
public class StorageCheckTests
{
    private static CheckResult One(CheckReport r, string id) => r.Checks.Single(c => c.Id == id);

    private static readonly (string, string)[] Cap =
    [
        ("machine.role", "generator"), ("storage.kind", "capacitor"), ("storage.capacitance", "0.47"), ("storage.rated_voltage", "2.5"), ("storage.esr", "0.2"),
    ];

    [Fact]
    public void A_capacitor_rated_below_the_rectified_peak_at_max_rpm_fails_and_the_speed_fix_passes()
    {
        var d = PresetPipeline.Load("crank-bench", Cap);
        var (e, _) = PresetPipeline.Stages(d);
        // Source: the rectified open-circuit peak is the line EMF peak at max_rpm less two bridge drops (textbook).
        double expected = e.LineEmfPeakAtMaxRpmV - 2 * 0.7;
        var c = One(PresetPipeline.Check(d), CheckIds.StorageOvervoltage);
        Assert.Equal(expected, c.Value, 1e-3 * expected);
        Assert.Equal(expected > 2.5 ? CheckStatus.Fail : CheckStatus.Pass, c.Status);
        Assert.Equal(CheckStatus.Fail, c.Status);
        var rpm = System.Text.RegularExpressions.Regex.Match(c.Message, @"lower machine.max_rpm to (\d+)").Groups[1].Value;
        var fixedD = PresetPipeline.Load("crank-bench", [.. Cap, ("machine.max_rpm", rpm), ("machine.rated_rpm", "300")]);
        Assert.NotEqual(CheckStatus.Fail, One(PresetPipeline.Check(fixedD), CheckIds.StorageOvervoltage).Status);
        // Source: E = C V^2 / 2.
        var energy = One(PresetPipeline.Check(d), CheckIds.StoredEnergy);
        Assert.Equal(0.5 * 0.47 * 2.5 * 2.5, energy.Value, 12);
        Assert.Equal(CheckStatus.Pass, energy.Status);
    }

    [Fact]
    public void A_battery_the_generator_reaches_only_above_max_rpm_fails_its_cut_in_and_one_below_rated_passes()
    {
        var high = PresetPipeline.Load("wind-duo", ("storage.kind", "battery"), ("storage.voltage", "24"));
        Assert.Equal(CheckStatus.Fail, One(PresetPipeline.Check(high), CheckIds.ChargeCutIn).Status);
        var low = PresetPipeline.Load("wind-duo", ("storage.kind", "battery"), ("storage.voltage", "3"));
        var c = One(PresetPipeline.Check(low), CheckIds.ChargeCutIn);
        Assert.Equal(CheckStatus.Pass, c.Status);
        var (e, _) = PresetPipeline.Stages(low);
        // Source: cut-in where the rectified EMF peak equals the battery voltage plus the drops.
        Assert.Equal(e.Charging!.StoreVoltageV + e.Charging.DropsV, c.Value * (e.LineEmfPeakV / e.RatedRpm), 1e-3 * c.Value);
    }
}
