using PartForge.Design.Machines;
using PartForge.Electrical.Switching;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>drive-pulse-torque, drive-start, switch-current, switch-voltage, switch-power, drive-freewheel: the drive as
/// the sensors really switch it (<see cref="SwitchingPlanner"/>), for the motor roles with a timing sensor.</summary>
internal static class DriveRules
{
    public static IEnumerable<CheckResult> Run(CheckContext c)
    {
        if (c.E.Switching is not { } plan) yield break;
        yield return PulseTorque(c, plan);
        yield return Start(c, plan);
        yield return Current(c, plan);
        yield return Voltage(c, plan);
        if (c.D.Sensor.Kind == SensorKind.Reed) yield return Power(c, plan);
        yield return Freewheel(c, plan);
    }

    private static string Mn(double nm) => F(nm * 1000);

    /// <summary>
    /// Every pulse must drive: its torque integral sign x (lambda(off) - lambda(on)) (the integral of T = i d lambda /
    /// d theta over the window) must not be negative. Fails when any pulse brakes or the mean standstill torque is not
    /// positive; the fix is computed: same-pole magnets or a pole-selective sensor when a reed closes on both poles,
    /// else the advance that makes every pulse drive.
    /// </summary>
    private static CheckResult PulseTorque(CheckContext c, SwitchingPlan plan)
    {
        int braking = plan.BrakingPulses, driving = plan.DrivingPulses;
        bool ok = braking == 0 && plan.MeanStallTorqueNm > 0;
        var status = ok ? CheckStatus.Pass : CheckStatus.Fail;
        string msg = $"{driving + braking} pulses per revolution ({Words.Of(plan.Switching)} drive, {Words.Of(plan.Sensor)} switching at {F(plan.OperateTesla * 1000)} mT on, {F(plan.ReleaseTesla * 1000)} mT off; the sensor sees {F(plan.FieldMinTesla * 1000)} to {F(plan.FieldMaxTesla * 1000)} mT): {driving} drive, {braking} brake; mean standstill torque {Mn(plan.MeanStallTorqueNm)} mN m";
        if (!ok)
        {
            var fixes = new List<string>();
            bool reedBoth = c.D.Sensor.Kind == SensorKind.Reed && c.D.Magnets.Arrangement == MagnetArrangement.Alternating;
            if (reedBoth)
            {
                msg += "; a reed closes on either pole, so with alternating magnets every second pulse meets the opposite pole and brakes";
                fixes.Add("set magnets.arrangement: same (every magnet then shows the pole that drives)");
                fixes.Add("use sensor.kind: hall (it switches on one pole only)");
                if (c.D.Phases == 1) fixes.Add("use sensor.kind: hall with drive.switching: bipolar (a latch: sensor.operate 3, sensor.release -3) so the other pole's pulse drives too");
            }
            if (plan.BestAdvanceElecDeg is { } adv && plan.BestAdvanceRuns && Math.Abs(adv - c.D.Sensor.AdvanceElecDeg) >= 1)
                fixes.Add($"set sensor.advance_elec to {F(adv)} (every pulse then drives)");
            if (plan.RunsFromOperateTesla is { } opRun)
                fixes.Add($"a less sensitive sensor, or one mounted farther from the magnets: sensor.operate {Up(opRun * 1000)} mT or more (release in the same ratio) makes every pulse drive at this timing");
            if (plan.FieldMaxTesla < plan.OperateTesla && !(c.D.Sensor.Kind == SensorKind.Reed && -plan.FieldMinTesla >= plan.OperateTesla))
                fixes.Add($"lower sensor.operate below {F(Math.Max(Math.Abs(plan.FieldMinTesla), plan.FieldMaxTesla) * 1000)} mT (the sensor never switches on)");
            if (fixes.Count == 0) fixes.Add("change the sensor's timing (sensor.advance_elec), its thresholds (sensor.operate, sensor.release) or the drive (drive.switching)");
            msg += "; " + string.Join(", or ", fixes);
        }
        return new CheckResult
        {
            Id = CheckIds.DrivePulseTorque, Part = null, Status = status, Value = braking, Limit = 0, Unit = "pulses", Margin = -braking,
            Message = msg, Where = new CheckLocation("sensor"),
            Basis = "torque of an air-cored coil T = i d lambda / d theta (coenergy, constant inductance); sensor thresholds against the computed field at the sensing point",
        };
    }

    /// <summary>
    /// The standstill torque against the friction torque over every rotor angle: fails when the mean drive torque is not
    /// above the friction (the rotor cannot run up even when pushed), warns when some angles give less than the friction
    /// (from those it needs a push).
    /// </summary>
    private static CheckResult Start(CheckContext c, SwitchingPlan plan)
    {
        double tf = c.D.Mechanics.FrictionTorqueNm;
        double share = plan.SelfStartShare;
        var status = !(plan.MeanStallTorqueNm > tf) || share <= 0 ? CheckStatus.Fail : share < 1 ? CheckStatus.Warn : CheckStatus.Pass;
        string msg = $"from rest the rotor runs up by itself from {F(share * 100)} % of rotor angles (the drive's work less the friction's, mechanics.friction_torque {Mn(tf)} mN m, stays positive along a whole period); mean standstill torque {Mn(plan.MeanStallTorqueNm)} mN m at {F(plan.PeakCurrentA)} A";
        if (status == CheckStatus.Fail)
            msg += plan.MeanStallTorqueNm > tf
                ? "; from every angle the rotor comes to rest where a pulse holds it (the window runs past the alignment): shorten the pulses (a higher sensor.operate, or sensor.advance_elec), or give it a push"
                : "; the rotor cannot run up: fix drive-pulse-torque first, or raise the supply (operation.supply_voltage or the store's voltage)";
        else if (status == CheckStatus.Warn)
            msg += "; from the other angles it needs a push to start (a single-phase pulse drive has dead angles; three phases start from any angle)";
        return new CheckResult
        {
            Id = CheckIds.DriveStart, Part = null, Status = status, Value = share * 100, Limit = 0, Unit = "%", Margin = share * 100,
            Message = msg, Where = new CheckLocation("drive"),
            Basis = "quasi-static work of the torque i d lambda / d theta, i = (V - drops) / R, against the Coulomb friction along the path from rest (energy method)",
        };
    }

    private static CheckResult Current(CheckContext c, SwitchingPlan plan)
    {
        double limit = c.D.Drive.SwitchCurrentRatingA;
        var (status, margin) = AtMost(plan.PeakCurrentA, limit, MaxRelativeBand * limit);
        string what = c.D.Sensor.Kind == SensorKind.Reed ? "reed contact" : "switching transistor";
        string msg = $"the {what} carries {F(plan.PeakCurrentA)} A at standstill ({F(plan.SupplyV)} V less {F(plan.SwitchDropsV)} V of drops through {F(plan.PathResistanceOhm)} ohm); rated {F(limit)} A (drive.switch_current_rating)";
        if (status != CheckStatus.Pass)
            msg += $"; use a switch rated {Up(plan.PeakCurrentA / (1 - MaxRelativeBand))} A or more (drive.switch_current_rating), a reed driving a transistor, more turns of thinner wire, or a lower supply";
        return new CheckResult
        {
            Id = CheckIds.SwitchCurrent, Part = null, Status = status, Value = plan.PeakCurrentA, Limit = limit, Unit = "A", Margin = margin,
            Message = msg, Where = new CheckLocation("drive"),
            Basis = "stall current (V - drops) / R of the conducting path, hot winding; ratings datasheet-typical, from memory, unless given",
        };
    }

    private static CheckResult Voltage(CheckContext c, SwitchingPlan plan)
    {
        double limit = c.D.Drive.SwitchVoltageRatingV;
        var (status, margin) = AtMost(plan.TurnOffVoltageV, limit, MaxRelativeBand * limit);
        string how = c.D.Drive.HasFreewheel
            ? $"the supply plus the freewheel diode's drop"
            : $"no freewheel: {F(plan.PeakCurrentA)} A forced to zero rings up to V + i sqrt(L / C) with an assumed {F(SwitchingPlan.StrayCapacitanceF * 1e12)} pF of stray capacitance (an estimate)";
        string msg = $"the opening switch sees {F(plan.TurnOffVoltageV)} V ({how}); rated {F(limit)} V (drive.switch_voltage_rating)";
        if (status != CheckStatus.Pass)
            msg += c.D.Drive.HasFreewheel ? $"; use a switch rated {Up(plan.TurnOffVoltageV / (1 - MaxRelativeBand))} V or more" : "; set drive.freewheel: diode";
        return new CheckResult
        {
            Id = CheckIds.SwitchVoltage, Part = null, Status = status, Value = plan.TurnOffVoltageV, Limit = limit, Unit = "V", Margin = margin,
            Message = msg, Where = new CheckLocation("drive"),
            Basis = "inductive turn-off: clamp at V + Vd with a freewheel diode; LC ring-up V + i sqrt(L/C) without (textbook circuit theory)",
        };
    }

    private static CheckResult Power(CheckContext c, SwitchingPlan plan)
    {
        double limit = c.D.Drive.SwitchPowerRatingW ?? 10;
        var (status, margin) = AtMost(plan.SwitchedPowerW, limit, MaxRelativeBand * limit);
        string msg = $"the reed switches {F(plan.SwitchedPowerW)} W ({F(plan.PeakCurrentA)} A at {F(plan.SupplyV)} V); contact rating {F(limit)} W (drive.switch_power_rating)";
        if (status != CheckStatus.Pass) msg += "; let the reed drive a transistor (sensor.kind: hall with a transistor, or a reed-driven transistor with drive.switch_current_rating of the transistor), or lower the current";
        return new CheckResult
        {
            Id = CheckIds.SwitchPower, Part = null, Status = status, Value = plan.SwitchedPowerW, Limit = limit, Unit = "W", Margin = margin,
            Message = msg, Where = new CheckLocation("drive"),
            Basis = "reed contact rating as switched current x voltage (datasheet-typical 10 W, from memory)",
        };
    }

    private static CheckResult Freewheel(CheckContext c, SwitchingPlan plan)
    {
        bool has = c.D.Drive.HasFreewheel;
        bool reed = c.D.Sensor.Kind == SensorKind.Reed;
        var status = has ? CheckStatus.Pass : reed ? CheckStatus.Fail : CheckStatus.Warn;
        string msg = has
            ? $"a {Words.Of(c.D.Drive.Diode)} freewheel diode carries the coil current when the switch opens (in the BOM)"
            : reed
                ? $"no freewheel diode: every opening of the reed breaks {F(plan.PeakCurrentA)} A in a coil, the contacts arc and erode; set drive.freewheel: diode (a diode across the coil, cathode to the supply's +)"
                : "no freewheel diode: the transistor must absorb the coil's energy at every turn-off (avalanche); set drive.freewheel: diode";
        return new CheckResult
        {
            Id = CheckIds.DriveFreewheel, Part = null, Status = status, Value = has ? 1 : 0, Limit = 1, Unit = "", Margin = has ? 0 : -1,
            Message = msg, Where = new CheckLocation("drive.freewheel"),
            Basis = "common practice: an inductive load switched by a contact or transistor needs a freewheel path",
        };
    }
}
