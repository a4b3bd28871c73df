using System.Globalization;

namespace PartForge.Dynamics.Engine;

/// <summary>Every rule the input must meet, reported as plain messages naming the value (never thrown).</summary>
internal static class InputCheck
{
    public const int MaxCircuits = 64, MaxTerms = 512, MaxWindows = 4096, MaxOrder = 100_000;

    public static List<string> Problems(MachineSetup? m, Scenario? sc, SimulationOptions o)
    {
        var p = new List<string>();
        if (m is null) { p.Add("setup is missing"); return p; }
        if (sc is null) p.Add("scenario is missing");
        if (m.Rotor is null) p.Add("rotor is missing");
        else
        {
            Positive(p, "rotor.inertia_kg_m2", m.Rotor.InertiaKgM2);
            NonNegative(p, "rotor.friction_nm", m.Rotor.FrictionNm);
            NonNegative(p, "rotor.viscous_nms_per_rad", m.Rotor.ViscousNmsPerRad);
        }
        Finite(p, "initial_angle_deg", m.InitialAngleDeg);
        Storage(p, m.Storage);
        var circuits = m.Circuits;
        if (circuits.Count > MaxCircuits) p.Add(F($"circuits: at most {MaxCircuits} (got {circuits.Count})"));
        var drive = m.Drive;
        if (drive is not null)
        {
            if (drive.Switching is null) p.Add("drive.switching is missing");
            if (drive.Switch is null) p.Add("drive.switch is missing");
            else
            {
                NonNegative(p, "drive.switch.on_drop_v", drive.Switch.OnDropV);
                NonNegative(p, "drive.switch.on_resistance_ohm", drive.Switch.OnResistanceOhm);
            }
            if (drive.Freewheel is null) p.Add("drive.freewheel is missing");
            else if (drive.Freewheel is DiodeFreewheel df) Diode(p, "drive.freewheel.diode", df.Model);
            Positive(p, "drive.stray_capacitance_f", drive.StrayCapacitanceF);
        }
        int driven = 0;
        for (int k = 0; k < circuits.Count; k++)
        {
            var c = circuits[k];
            string at = F($"circuits[{k}]");
            if (c is null) { p.Add(at + " is missing"); continue; }
            Positive(p, at + ".resistance_ohm", c.ResistanceOhm);
            NonNegative(p, at + ".inductance_h", c.InductanceH);
            if (c.Flux is null) p.Add(at + ".flux is missing");
            else
            {
                if (c.Flux.Terms.Count > MaxTerms) p.Add(F($"{at}.flux: at most {MaxTerms} terms (got {c.Flux.Terms.Count})"));
                for (int j = 0; j < Math.Min(c.Flux.Terms.Count, MaxTerms); j++)
                {
                    var t = c.Flux.Terms[j];
                    if (t.Order < 0 || t.Order > MaxOrder) p.Add(F($"{at}.flux[{j}].order must be 0 to {MaxOrder} (got {t.Order})"));
                    Finite(p, F($"{at}.flux[{j}].cos_wb"), t.CosWb);
                    Finite(p, F($"{at}.flux[{j}].sin_wb"), t.SinWb);
                }
            }
            switch (c.Connection)
            {
                case null:
                    p.Add(at + ".connection is missing");
                    break;
                case DriveConnection d:
                    driven++;
                    if (drive is null) { p.Add(at + " is driven but the setup has no drive"); break; }
                    Windows(p, at, d, drive.Switching);
                    if (drive.Switching is SixStepSwitching && c.InductanceH <= 0)
                        p.Add(at + ".inductance_h must be more than 0 in a six-step star");
                    break;
                case HalfWaveRectifier hw:
                    Diode(p, at + ".diode", hw.Diode);
                    break;
                case BridgeRectifier br:
                    Diode(p, at + ".diode", br.Diode);
                    break;
                case ResistiveLoad rl:
                    NonNegative(p, at + ".load_ohm", rl.LoadOhm);
                    break;
            }
        }
        if (drive?.Switching is SixStepSwitching)
        {
            if (driven != 3) p.Add(F($"six-step switching drives exactly 3 circuits (star); {driven} are driven"));
            if (drive.Freewheel is not DiodeFreewheel) p.Add("six-step switching needs a diode freewheel (the bridge's diodes carry the commutating current)");
        }
        if (sc is not null) Scenario(p, sc, m);
        if (!(o.RelativeTolerance >= 1e-12 && o.RelativeTolerance <= 1e-4)) p.Add(F($"options.relative_tolerance must be 1e-12 to 1e-4 (got {o.RelativeTolerance})"));
        if (!(o.QuasiStaticRatio >= 0 && o.QuasiStaticRatio <= 0.1)) p.Add(F($"options.quasi_static_ratio must be 0 to 0.1 (got {o.QuasiStaticRatio})"));
        if (o.MaxSteps < 1) p.Add(F($"options.max_steps must be at least 1 (got {o.MaxSteps})"));
        if (o.SeriesMaxPoints < 2 || o.SeriesMaxPoints > 1_000_000) p.Add(F($"options.series_max_points must be 2 to 1000000 (got {o.SeriesMaxPoints})"));
        if (o.SteadyRevolutions < 1 || o.SteadyRevolutions > 100_000) p.Add(F($"options.steady_revolutions must be 1 to 100000 (got {o.SteadyRevolutions})"));
        if (!(o.SteadyTolerance > 0 && o.SteadyTolerance < 1)) p.Add(F($"options.steady_tolerance must be more than 0 and less than 1 (got {o.SteadyTolerance})"));
        return p;
    }

    private static void Storage(List<string> p, Storage? s)
    {
        switch (s)
        {
            case null:
                p.Add("storage is missing");
                break;
            case IdealSupply i:
                Finite(p, "storage.voltage_v", i.VoltageV);
                break;
            case Capacitor c:
                Positive(p, "storage.capacitance_f", c.CapacitanceF);
                NonNegative(p, "storage.esr_ohm", c.EsrOhm);
                Finite(p, "storage.initial_voltage_v", c.InitialVoltageV);
                break;
            case Battery b:
                Finite(p, "storage.open_circuit_v", b.OpenCircuitV);
                NonNegative(p, "storage.internal_ohm", b.InternalOhm);
                break;
        }
    }

    private static void Scenario(List<string> p, Scenario sc, MachineSetup m)
    {
        if (!(sc.TimeLimitS > 0 && sc.TimeLimitS <= 1e6)) p.Add(F($"scenario.time_limit_s must be more than 0 and at most 1e6 (got {sc.TimeLimitS})"));
        bool cap = m.Storage is Capacitor;
        switch (sc)
        {
            case StartScenario s:
                Finite(p, "scenario.initial_rpm", s.InitialRpm);
                if (Math.Abs(s.InitialRpm) > 1e6) p.Add("scenario.initial_rpm must be within +-1e6");
                break;
            case RunDownScenario r:
                Finite(p, "scenario.initial_rpm", r.InitialRpm);
                if (Math.Abs(r.InitialRpm) > 1e6) p.Add("scenario.initial_rpm must be within +-1e6");
                NonNegative(p, "scenario.stop_rpm", r.StopRpm);
                if (r.CutoffV is double cv)
                {
                    Finite(p, "scenario.cutoff_v", cv);
                    if (!cap) p.Add("scenario.cutoff_v needs a capacitor store");
                    else if (m.Storage is Capacitor c && cv >= c.InitialVoltageV) p.Add(F($"scenario.cutoff_v ({cv}) must be below the capacitor's initial voltage ({c.InitialVoltageV})"));
                }
                break;
            case ChargeScenario c:
                Finite(p, "scenario.driven_rpm", c.DrivenRpm);
                if (Math.Abs(c.DrivenRpm) > 1e6) p.Add("scenario.driven_rpm must be within +-1e6");
                if (c.TargetV is double tv)
                {
                    Finite(p, "scenario.target_v", tv);
                    if (!cap) p.Add("scenario.target_v needs a capacitor store");
                    else if (m.Storage is Capacitor cc && tv <= cc.InitialVoltageV) p.Add(F($"scenario.target_v ({tv}) must be above the capacitor's initial voltage ({cc.InitialVoltageV})"));
                }
                break;
        }
    }

    private static void Windows(List<string> p, string at, DriveConnection d, Switching? sw)
    {
        var w = d.Windows;
        if (w.Count > MaxWindows) { p.Add(F($"{at}.windows: at most {MaxWindows} (got {w.Count})")); return; }
        bool ok = true;
        for (int j = 0; j < w.Count; j++)
        {
            string wa = F($"{at}.windows[{j}]");
            if (!(w[j].OnDeg >= 0 && w[j].OnDeg < 360)) { p.Add(F($"{wa}.on_deg must be in [0, 360) (got {w[j].OnDeg})")); ok = false; }
            if (!(w[j].OffDeg >= 0 && w[j].OffDeg < 360)) { p.Add(F($"{wa}.off_deg must be in [0, 360) (got {w[j].OffDeg})")); ok = false; }
            if (w[j].OnDeg == w[j].OffDeg) { p.Add(F($"{wa}: on_deg and off_deg are equal ({w[j].OnDeg})")); ok = false; }
            if (sw is not null && !sw.AllowsSign(w[j].Sign)) { p.Add(F($"{wa}.sign {w[j].Sign} is not allowed for {Name(sw)} switching")); ok = false; }
        }
        if (!ok) return;
        for (int a = 0; a < w.Count; a++)
            for (int b = a + 1; b < w.Count; b++)
                if (Inside(w[b].OnDeg, w[a]) || Inside(w[a].OnDeg, w[b]))
                {
                    p.Add(F($"{at}.windows[{a}] and [{b}] overlap"));
                    return;
                }
    }

    private static bool Inside(double deg, ConductionWindow w) =>
        w.OnDeg < w.OffDeg ? deg >= w.OnDeg && deg < w.OffDeg : deg >= w.OnDeg || deg < w.OffDeg;

    private static string Name(Switching s) => s switch
    {
        UnipolarSwitching => "unipolar",
        BipolarSwitching => "bipolar",
        _ => "six-step",
    };

    private static void Diode(List<string> p, string at, DiodeModel? d)
    {
        if (d is null) { p.Add(at + " is missing"); return; }
        NonNegative(p, at + ".forward_drop_v", d.ForwardDropV);
        NonNegative(p, at + ".resistance_ohm", d.ResistanceOhm);
    }

    private static void Finite(List<string> p, string key, double v)
    {
        if (!double.IsFinite(v)) p.Add(F($"{key} must be a finite number (got {v})"));
    }

    private static void Positive(List<string> p, string key, double v)
    {
        if (!(double.IsFinite(v) && v > 0)) p.Add(F($"{key} must be more than 0 (got {v})"));
    }

    private static void NonNegative(List<string> p, string key, double v)
    {
        if (!(double.IsFinite(v) && v >= 0)) p.Add(F($"{key} must be 0 or more (got {v})"));
    }

    private static string F(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
