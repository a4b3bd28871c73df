using System.Globalization;
using PartForge.Design.Machines;
using PartForge.Electrical;
using PartForge.Electrical.Wire;
using PartForge.Export.Drawings;

namespace PartForge.Export.Report;

/// <summary>Turns the electrical engine's result into what the report and the BOM show (no figure is recomputed here).</summary>
public static class ElectricalView
{
    private static readonly string[] PhaseColours = ["#b3261e", "#2f6f68", "#3a5ba0"];

    /// <summary>Coils in the whole machine (dual-stator: both stators).</summary>
    public static int CoilsInMachine(MachineModel d) => d.CoilsInMachine;

    /// <summary>The engine's wire total for the machine: one coil's wire (turns and leads) times the coils, m.</summary>
    public static double TotalWireM(MachineModel d, ElectricalResult r) => (r.Coil?.WireLengthM ?? 0) * CoilsInMachine(d);

    public static ReportElectrical From(MachineModel d, ElectricalResult r)
    {
        var coil = r.Coil ?? throw new InvalidOperationException("the electrical result has no coil; the report needs one");
        var outline = coil.Outline ?? throw new InvalidOperationException("the electrical result has no coil outline");
        // One value per row; each row's key is the results document's path of the same number (a test reads every
        // row back from the results document).
        var rows = new List<ReportRow>
        {
            new("pole pairs", I(r.PolePairs), "", "electrical.pole_pairs"),
            new("electrical frequency at rated speed", F(r.ElectricalHz, 2), "Hz", "electrical.electrical_hz"),
            new("magnetic gap (magnet face to copper)", F(r.MagneticGapMm, 3), "mm", "electrical.magnetic_gap"),
            new("winding factor", F(r.WindingFactor, 4), "", "electrical.winding_factor"),
            new("magnet remanence Br at 20 C", F(r.Magnet.BrTesla, 3), "T", "electrical.magnet.br"),
            new($"magnet remanence at the air's temperature (pull, steel flux)", F(r.Magnet.BrAmbientTesla, 4), "T", "electrical.magnet.br_ambient"),
            new($"magnet remanence at the operating temperature (EMF)", F(r.Magnet.BrOperatingTesla, 4), "T", "electrical.magnet.br_operating"),
            new("magnet operating temperature (upper estimate)", F(r.Magnet.TemperatureC, 1), "C", "electrical.magnet.temperature_c"),
            new("magnet grade's maximum working temperature", F(r.Magnet.MaxWorkingTemperatureC, 0), "C", "electrical.magnet.max_working_temperature_c"),
            new("turns per coil" + (coil.TurnsSolved ? " (solved for the target EMF)" : ""), I(coil.Turns), "", "electrical.coil.turns"),
            new("wire bare diameter", F(coil.WireBareMm, 4), "mm", "electrical.coil.wire_bare"),
            new("wire overall (enamelled) diameter", F(coil.WireOverallMm, 4), "mm", "electrical.coil.wire_overall"),
            new("fill factor", F(coil.FillFactor, 3), "", "electrical.coil.fill_factor"),
            new("coil height", F(coil.HeightMm, 2), "mm", "electrical.coil.height"),
            new("coil radial build", F(coil.RadialBuildMm, 3), "mm", "electrical.coil.radial_build"),
            new("mean turn length", F(coil.MeanTurnMm, 2), "mm", "electrical.coil.mean_turn"),
            new("wire per coil (with leads)", F(coil.WireLengthM, 3), "m", "electrical.coil.wire_length_m"),
            new("coil resistance at 20 C", F(coil.Resistance20COhm, 4), "ohm", "electrical.coil.resistance_20c_ohm"),
            new("coil steady temperature at the operating point", F(coil.TemperatureC, 1), "C", "electrical.coil.temperature_c"),
            new($"coil resistance at {F(coil.TemperatureC, 1)} C", F(coil.ResistanceHotOhm, 4), "ohm", "electrical.coil.resistance_hot_ohm"),
            new("coil temperature you accept (coils.max_temperature)", F(coil.MaxTemperatureC, 1), "C", "electrical.coil.max_temperature_c"),
            new("coil inductance" + (coil.InductanceIsApproximate ? " (approximate)" : ""), F(coil.InductanceUh, 1), "uH", "electrical.coil.inductance_uh"),
            new("copper per coil", F(coil.CopperMassG, 2), "g", "electrical.coil.copper_mass_g"),
            new("coil flux linkage, peak", F(r.CoilFluxLinkagePeakWb, 6), "Wb", "electrical.coil_flux_linkage_peak_wb"),
            new("coil EMF at rated speed", F(r.CoilEmfRmsV, 3), "V rms", "electrical.coil.emf_rms_v"),
        };
        if (r.Phase is { } ph)
        {
            rows.Add(new("coils in series per phase (" + Words.Of(ph.Connection) + ")", I(ph.CoilsInSeries), "", "electrical.phase.coils_in_series"));
            rows.Add(new("phase EMF at rated speed, peak", F(ph.EmfPeakV, 3), "V", "electrical.phase.emf_peak_v"));
            rows.Add(new("phase EMF at rated speed", F(ph.EmfRmsV, 3), "V rms", "electrical.phase.emf_rms_v"));
            rows.Add(new("phase resistance at 20 C", F(ph.Resistance20COhm, 4), "ohm", "electrical.phase.resistance_20c_ohm"));
            rows.Add(new("phase resistance hot", F(ph.ResistanceHotOhm, 4), "ohm", "electrical.phase.resistance_hot_ohm"));
            rows.Add(new("phase EMF distortion (THD)", F(ph.ThdPercent, 2), "%", "electrical.phase.thd_percent"));
        }
        rows.Add(new("line EMF at rated speed", F(r.LineEmfRmsV, 3), "V rms", "electrical.line_emf_rms_v"));
        rows.Add(new("line EMF at max speed", F(r.LineEmfRmsAtMaxRpmV, 3), "V rms", "electrical.line_emf_rms_at_max_rpm_v"));
        rows.Add(new("EMF constant ke", F(r.KeVPerKrpm, 3), "V per 1000 rpm", "electrical.ke_v_per_krpm"));
        rows.Add(new("torque constant kt", F(r.KtNmPerA, 4), "N m/A", "electrical.kt_nm_per_a"));
        rows.Add(new("wire for the machine (all coils, leads)", F(TotalWireM(d, r), 2), "m", "electrical.wire_total_m"));
        if (r.Thermal is { } t)
        {
            string heat = $"heat ({(t.Point == PartForge.Electrical.Operation.OperatingMode.Motor ? "motor" : "generator")} point, air {F(t.AmbientC, 1)} C)";
            rows.Add(new($"{heat}: copper loss per coil", F(t.CopperLossPerCoilW, 4), "W", "thermal.copper_loss_per_coil_w"));
            rows.Add(new($"{heat}: copper loss, all coils", F(t.CopperLossW, 3), "W", "thermal.copper_loss_w"));
            rows.Add(new($"{heat}: coil to still air ({t.Cooling.Faces} faces of {F(t.Cooling.FaceAreaMm2, 0)} mm2, h {F(t.Cooling.ConvectionWPerM2K, 0)} W/(m2 K))",
                F(t.Cooling.ResistanceKPerW, 1), "K/W", "thermal.thermal_resistance_k_per_w"));
            rows.Add(new($"{heat}: coil steady temperature", F(t.CoilTemperatureC, 1), "C", "thermal.coil_temperature_c"));
        }
        if (r.Generator is { } g)
        {
            string at = $"generator into {F(g.LoadResistanceOhm, 2)} ohm at {F(g.Rpm, 0)} rpm";
            rows.Add(new($"{at}: current", F(g.CurrentA, 3), "A", "operating.generator.current_a"));
            rows.Add(new($"{at}: terminal voltage", F(g.TerminalVoltageV, 3), "V", "operating.generator.terminal_voltage_v"));
            rows.Add(new($"{at}: output", F(g.OutputPowerW, 2), "W", "operating.generator.output_power_w"));
            rows.Add(new($"{at}: copper loss", F(g.CopperLossW, 2), "W", "operating.generator.copper_loss_w"));
            rows.Add(new($"{at}: efficiency", F(g.Efficiency, 3), "", "operating.generator.efficiency"));
            rows.Add(new($"{at}: shaft torque", F(g.ShaftTorqueNm, 4), "N m", "operating.generator.shaft_torque_nm"));
            rows.Add(new($"{at}: current density", F(g.CurrentDensityAPerMm2, 2), "A/mm2", "operating.generator.current_density_a_per_mm2"));
        }
        if (r.Motor is { } m)
        {
            string on = $"motor ({m.Drive}) on {F(m.SupplyVoltageV, 1)} V";
            rows.Add(new($"{on}: no-load speed", F(m.NoLoadRpm, 0), "rpm", "operating.motor.no_load_rpm"));
            rows.Add(new($"{on}: stall torque", F(m.StallTorqueNm, 4), "N m", "operating.motor.stall_torque_nm"));
            rows.Add(new($"{on}: stall current", F(m.StallCurrentA, 2), "A", "operating.motor.stall_current_a"));
            rows.Add(new($"{on}, at {F(m.RatedRpm, 0)} rpm: current", F(m.CurrentAtRatedA, 3), "A", "operating.motor.current_at_rated_a"));
            rows.Add(new($"{on}, at {F(m.RatedRpm, 0)} rpm: torque", F(m.TorqueAtRatedNm, 4), "N m", "operating.motor.torque_at_rated_nm"));
            rows.Add(new($"{on}, at {F(m.RatedRpm, 0)} rpm: efficiency", F(m.EfficiencyAtRated, 3), "", "operating.motor.efficiency_at_rated"));
        }

        var coilWave = new List<PlotSeries>();
        var phaseWaves = new List<PlotSeries>();
        if (r.Waveforms is { } w)
        {
            var x = Closed(w.ThetaElecDeg, 360);
            coilWave.Add(new PlotSeries("coil 0", x, Closed(w.CoilEmfV, w.CoilEmfV.Count > 0 ? w.CoilEmfV[0] : 0), "#b0532a"));
            for (int i = 0; i < w.PhaseEmfV.Count; i++)
            {
                var y = w.PhaseEmfV[i];
                phaseWaves.Add(new PlotSeries("phase " + (char)('A' + i), x, Closed(y, y.Count > 0 ? y[0] : 0), PhaseColours[i % PhaseColours.Length]));
            }
        }

        var tables = new List<ReportTable>();
        if (r.Winding.Table.Count > 0)
            tables.Add(new ReportTable("Winding table: which coil goes to which phase, and which way it is wound",
                ["coil", "angle, deg", "phase", "direction"],
                r.Winding.Table.Select(c => (IReadOnlyList<string>)[I(c.Coil), F(c.AngleDeg, 2), c.Phase.ToString(), c.Direction > 0 ? "forward" : "reversed"]).ToArray()));
        if (r.Sensors is { } s && s.Sensors.Count > 0)
            tables.Add(new ReportTable($"Timing sensors ({Words.Of(s.Kind)}): {s.Rule}",
                ["sensor", "angle, deg", "radius, mm", "electrical deg", "fits between coils"],
                s.Sensors.Select(p => (IReadOnlyList<string>)[p.Label, F(p.AngleDeg, 2), F(p.RadiusMm, 2), F(p.ElectricalDeg, 1), p.Fits ? "yes" : $"no ({F(p.ClearanceMm, 2)} mm)"]).ToArray()));

        var notes = r.Diagnostics.Select(x => $"electrical {x.Severity.ToString().ToLowerInvariant()}: {x.Message}").ToList();
        if (r.Magnet.BackIronImageModel) notes.Add("Back iron is modelled by the image method (ideal, unsaturated steel): an approximation.");
        if (coil.WireOverallIsApproximate) notes.Add("The enamelled wire diameter is interpolated between rows of the IEC 60317-0-1 table: an approximation.");

        var wire = WireSpec.Of(coil.WireBareMm, 2, coil.WireAwg);
        return new ReportElectrical
        {
            Rows = rows, CoilWaveform = coilWave, PhaseWaveforms = phaseWaves, WaveformRpm = r.RatedRpm,
            TotalWireM = TotalWireM(d, r), WireGramsPerMetre = wire.GramsPerMetre, Outline = outline, Tables = tables, Notes = notes,
        };
    }

    /// <summary>A periodic series closed at the end of the period (the first sample repeated at x = period), so the plot spans 0..360.</summary>
    private static IReadOnlyList<double> Closed(IReadOnlyList<double> v, double end)
    {
        var a = new double[v.Count + 1];
        for (int i = 0; i < v.Count; i++) a[i] = v[i];
        a[^1] = end;
        return a;
    }

    private static string F(double v, int digits) => double.IsFinite(v) ? Math.Round(v, digits).ToString("0." + new string('#', Math.Max(1, digits)), CultureInfo.InvariantCulture) : "-";
    private static string I(int v) => v.ToString(CultureInfo.InvariantCulture);
}
