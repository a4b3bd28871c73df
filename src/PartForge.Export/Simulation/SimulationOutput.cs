using System.Globalization;
using System.Text;
using System.Text.Json;
using PartForge.Dynamics;

namespace PartForge.Export.Simulation;

/// <summary>The simulation's results as JSON (<c>simulate --json</c>) and CSV (<c>--csv</c>): deterministic, invariant numbers.</summary>
public static class SimulationOutput
{
    /// <summary>The scenario's word (<c>--scenario</c>).</summary>
    public static string Word(SimulationKind k) => k switch { SimulationKind.RunDown => "run-down", SimulationKind.Charge => "charge", _ => "start" };

    /// <summary>The outcome's word.</summary>
    public static string Word(SimulationOutcome o) => o switch
    {
        SimulationOutcome.InvalidInput => "invalid-input",
        SimulationOutcome.TimeLimit => "time-limit",
        SimulationOutcome.SteadySpeed => "steady-speed",
        SimulationOutcome.Stalled => "stalled",
        SimulationOutcome.RotorStopped => "rotor-stopped",
        SimulationOutcome.StoreExhausted => "store-exhausted",
        SimulationOutcome.VoltageReached => "voltage-reached",
        SimulationOutcome.StepLimit => "step-limit",
        SimulationOutcome.Cancelled => "cancelled",
        _ => "numerical-failure",
    };

    /// <summary>The pinned document: scenario, t_s, rpm, storage_v, steady_rpm, run_time_s, energy.balance_error, and more.</summary>
    public static string Json(string design, SimulationKind kind, SimulationResult r, double inertiaKgM2)
    {
        using var ms = new MemoryStream();
        using (var w = new Utf8JsonWriter(ms, new JsonWriterOptions { Indented = true }))
        {
            w.WriteStartObject();
            w.WriteString("format", "partforge-simulation/1");
            w.WriteString("design", design);
            w.WriteString("scenario", Word(kind));
            w.WriteString("outcome", Word(r.Outcome));
            Num(w, "inertia_kg_m2", inertiaKgM2);
            Num(w, "end_time_s", r.EndTimeS);
            Num(w, "final_rpm", r.FinalRpm);
            Num(w, "final_storage_v", r.FinalStoreV);
            Opt(w, "steady_rpm", r.SteadyRpm);
            Opt(w, "spin_up_90_s", r.SpinUp90S);
            Opt(w, "spin_up_99_s", r.SpinUp99S);
            Opt(w, "cycle_mean_torque_nm", r.CycleMeanTorqueNm);
            Opt(w, "run_time_s", r.RunTimeS);
            Opt(w, "time_to_voltage_s", r.TimeToVoltageS);
            Opt(w, "peak_turn_off_kick_v", r.PeakTurnOffKickV);
            w.WriteNumber("accepted_steps", r.AcceptedSteps);
            w.WriteNumber("rejected_steps", r.RejectedSteps);
            w.WriteNumber("events", r.Events);
            w.WriteStartObject("energy");
            Num(w, "balance_error", r.Energy.BalanceError);
            Num(w, "residual_j", r.Energy.ResidualJ);
            foreach (var t in r.Energy.Terms()) Num(w, t.Key, t.Value);
            w.WriteEndObject();
            Series(w, "t_s", r.Series.TimeS);
            Series(w, "rpm", r.Series.Rpm);
            Series(w, "storage_v", r.Series.StoreV);
            Series(w, "torque_nm", r.Series.TorqueNm);
            w.WriteStartArray("coil_current_a");
            foreach (var c in r.Series.CurrentsA)
            {
                w.WriteStartArray();
                foreach (var v in c) w.WriteNumberValue(Round(v));
                w.WriteEndArray();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(ms.ToArray()) + "\n";
    }

    /// <summary>The series as CSV: t_s, rpm, storage_v, torque_nm, then one current column per circuit.</summary>
    public static string Csv(SimulationResult r)
    {
        var sb = new StringBuilder("t_s,rpm,storage_v,torque_nm");
        for (int c = 0; c < r.Series.CurrentsA.Count; c++) sb.Append(CultureInfo.InvariantCulture, $",i{c}_a");
        sb.Append('\n');
        for (int i = 0; i < r.Series.Count; i++)
        {
            sb.Append(G(r.Series.TimeS[i])).Append(',').Append(G(r.Series.Rpm[i])).Append(',').Append(G(r.Series.StoreV[i])).Append(',').Append(G(r.Series.TorqueNm[i]));
            foreach (var c in r.Series.CurrentsA) sb.Append(',').Append(G(c[i]));
            sb.Append('\n');
        }
        return sb.ToString();
    }

    private static string G(double v) => Round(v).ToString("R", CultureInfo.InvariantCulture);

    private static double Round(double v) => !double.IsFinite(v) || v == 0 ? 0 : double.Parse(v.ToString("G12", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    private static void Num(Utf8JsonWriter w, string name, double v) => w.WriteNumber(name, Round(v));

    private static void Opt(Utf8JsonWriter w, string name, double? v)
    {
        if (v is { } x && double.IsFinite(x)) Num(w, name, x); else w.WriteNull(name);
    }

    private static void Series(Utf8JsonWriter w, string name, IReadOnlyList<double> values)
    {
        w.WriteStartArray(name);
        foreach (var v in values) w.WriteNumberValue(Round(v));
        w.WriteEndArray();
    }
}
