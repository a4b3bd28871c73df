using PartForge.Design.Machines;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>storage-overvoltage, stored-energy, charge-cut-in: the store and the generator charging it.</summary>
internal static class StorageRules
{
    /// <summary>Stored energy above which the check warns, J (our own threshold: enough to burn and to weld a shorted wire).</summary>
    public const double EnergyWarnJ = 10;

    public static IEnumerable<CheckResult> Run(CheckContext c)
    {
        if (c.D.Storage is CapacitorStorage cap)
        {
            if (c.E.Charging is { } ch) yield return Overvoltage(c, cap, ch);
            yield return Energy(cap);
        }
        if (c.E.Charging is { } point) yield return CutIn(c, point);
    }

    private static CheckResult Overvoltage(CheckContext c, CapacitorStorage cap, PartForge.Electrical.Operation.ChargingPoint ch)
    {
        double v = ch.OpenCircuitPeakAtMaxRpmV, limit = cap.RatedVoltageV;
        var (status, margin) = AtMost(v, limit, 0.1 * limit);
        string msg = $"at machine.max_rpm {F(c.D.MaxRpm)} the rectifier can charge the capacitor to {F(v)} V (EMF peak less {F(ch.DropsV)} V of drops); it is rated {F(limit)} V";
        if (status != CheckStatus.Pass)
        {
            double rpmOk = v + ch.DropsV > 0 ? c.D.MaxRpm * (0.9 * limit + ch.DropsV) / (v + ch.DropsV) : c.D.MaxRpm;
            msg += $"; an over-voltaged capacitor can vent or burst (electrolytic) or fail (double-layer): lower machine.max_rpm to {Math.Floor(rpmOk)}, fit a capacitor rated {Up(v / 0.9)} V or more (storage.rated_voltage), or a voltage limiter (shunt regulator or clamp) across it";
        }
        return new CheckResult
        {
            Id = CheckIds.StorageOvervoltage, Part = null, Status = status, Value = v, Limit = limit, Unit = "V", Margin = margin,
            Message = msg, Where = new CheckLocation("storage.rated_voltage"),
            Basis = "rectified open-circuit peak (EMF proportional to speed) against the rated voltage; warn within 10 % (our own band)",
        };
    }

    private static CheckResult Energy(CapacitorStorage cap)
    {
        double e = cap.EnergyAtJ(cap.RatedVoltageV);
        var status = e > EnergyWarnJ ? CheckStatus.Warn : CheckStatus.Pass;
        string msg = $"the capacitor holds {F(e)} J at its rated {F(cap.RatedVoltageV)} V (C V^2 / 2); a short across it delivers that at once: fuse it, insulate its terminals, discharge it before handling and never charge it above its rating";
        return new CheckResult
        {
            Id = CheckIds.StoredEnergy, Part = null, Status = status, Value = e, Limit = EnergyWarnJ, Unit = "J", Margin = EnergyWarnJ - e,
            Message = msg, Where = new CheckLocation("storage.capacitance"),
            Basis = "E = C V^2 / 2 (textbook); warn above 10 J (our own threshold)",
        };
    }

    private static CheckResult CutIn(CheckContext c, PartForge.Electrical.Operation.ChargingPoint ch)
    {
        double rpm = ch.CutInRpm;
        bool battery = c.D.Storage is BatteryStorage;
        // A battery that the generator never reaches is never charged (fail); a capacitor still charges part way (warn).
        var status = !(rpm > 0) || rpm >= c.D.MaxRpm ? (battery ? CheckStatus.Fail : CheckStatus.Warn) : rpm >= c.D.RatedRpm ? CheckStatus.Warn : CheckStatus.Pass;
        string msg = battery
            ? $"charging the {F(ch.StoreVoltageV)} V battery starts at {F(rpm)} rpm (EMF peak = battery voltage + {F(ch.DropsV)} V of drops); at rated {F(c.D.RatedRpm)} rpm {F(ch.CurrentAtRatedA)} A, {F(ch.PowerAtRatedW)} W"
            : $"charging the capacitor to its rated {F(ch.StoreVoltageV)} V needs {F(rpm)} rpm (EMF peak = rated voltage + {F(ch.DropsV)} V of drops); at rated {F(c.D.RatedRpm)} rpm it charges to at most {F(ch.ReachableAtRatedV)} V";
        if (c.D.Storage is CapacitorStorage cs)
            msg += ch.TimeToChargeS is { } t && ch.ChargeTargetV is { } tv
                ? $"; the capacitor charges from {F(cs.StartVoltageV)} V to {F(tv)} V in {F(t)} s at rated speed"
                : $"; at rated speed it cannot be charged above its start voltage {F(cs.StartVoltageV)} V";
        if (status != CheckStatus.Pass && rpm > 0 && c.E.Turns > 0)
        {
            // The EMF is proportional to the turns (same flux per turn): the turns that bring cut-in to 80 % of rated speed.
            int turns = (int)Math.Ceiling(c.E.Turns * rpm / (0.8 * c.D.RatedRpm));
            msg += $"; raise coils.turns to about {turns} (the EMF grows with the turns; check the fit)"
                + (c.D.Load.Diode == DiodeKind.Silicon ? ", use schottky diodes (load.diode)" : "") + ", or a lower store voltage";
        }
        return new CheckResult
        {
            Id = CheckIds.ChargeCutIn, Part = null, Status = status, Value = rpm, Limit = c.D.MaxRpm, Unit = "rpm", Margin = c.D.MaxRpm - rpm,
            Message = msg, Where = new CheckLocation("load.rectifier"),
            Basis = "a rectifier conducts once the EMF exceeds the store voltage plus its diode drops (textbook circuit theory); warn above rated speed",
        };
    }
}
