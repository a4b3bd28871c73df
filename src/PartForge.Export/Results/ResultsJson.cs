using PartForge.Design.Machines;
using System.Globalization;
using System.Text;
using System.Text.Json;

namespace PartForge.Export.Results;

/// <summary>
/// Writes a <see cref="ResultsDocument"/> as JSON: keys in the contract's order, invariant numbers (shortest
/// round-trip form), two-space indentation, LF, UTF-8 without BOM; byte-identical for equal documents. Never
/// writes NaN or infinity: a non-finite value throws <see cref="NonFiniteResultException"/>.
/// </summary>
public static class ResultsJson
{
    public static string Serialize(ResultsDocument doc) => Encoding.UTF8.GetString(ToUtf8(doc));

    public static byte[] ToUtf8(ResultsDocument doc)
    {
        using var ms = new MemoryStream();
        using (var w = new Utf8JsonWriter(ms, new JsonWriterOptions { Indented = true, NewLine = "\n" }))
        {
            w.WriteStartObject();
            w.WriteString("format", doc.Format);
            w.WriteString("design", doc.Design);
            w.WriteStartObject("summary");
            w.WriteString("status", doc.Summary.Status);
            w.WriteNumber("fail", doc.Summary.Fail);
            w.WriteNumber("warn", doc.Summary.Warn);
            if (doc.Summary.Forced) w.WriteBoolean("forced", true);
            w.WriteEndObject();
            WriteElectrical(w, doc.Electrical);
            w.WriteStartArray("checks");
            foreach (var c in doc.Checks)
            {
                w.WriteStartObject();
                w.WriteString("id", c.Id);
                w.WriteString("part", c.Part);
                if (c.Counterpart is { } cp) w.WriteString("counterpart", cp);
                else w.WriteNull("counterpart");
                w.WriteString("status", c.Status);
                Num(w, "value", c.Value, "checks." + c.Id + ".value");
                Num(w, "limit", c.Limit, "checks." + c.Id + ".limit");
                w.WriteString("unit", c.Unit);
                Num(w, "margin", c.Margin, "checks." + c.Id + ".margin");
                w.WriteString("message", c.Message);
                if (c.Where is { } where) w.WriteString("where", where); else w.WriteNull("where");
                if (c.WhereAngleDeg is { } wa) Num(w, "where_angle_deg", wa, "checks." + c.Id + ".where_angle_deg"); else w.WriteNull("where_angle_deg");
                if (c.Basis is { } basis) w.WriteString("basis", basis); else w.WriteNull("basis");
                if (!c.Measured) w.WriteBoolean("measured", false);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteStartArray("parts");
            foreach (var p in doc.Parts)
            {
                w.WriteStartObject();
                w.WriteString("name", p.Name);
                w.WriteString("process", p.Process);
                w.WriteNumber("quantity", p.Quantity);
                w.WriteStartArray("files");
                foreach (var f in p.Files) w.WriteStringValue(f);
                w.WriteEndArray();
                Num(w, "volume_mm3", p.VolumeMm3, "parts." + p.Name + ".volume_mm3");
                w.WriteNumber("triangles", p.Triangles);
                if (p.Material != null) w.WriteString("material", p.Material);
                if (p.Role != null) w.WriteString("role", p.Role);
                Num(w, "mass_g", p.MassG, "parts." + p.Name + ".mass_g");
                w.WriteBoolean("rotating", p.Rotating);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            WriteOperating(w, doc.Operating);
            WriteMechanics(w, doc.Mechanics);
            w.WriteStartArray("bom");
            foreach (var l in doc.Bom)
            {
                w.WriteStartObject();
                w.WriteString("category", l.Category);
                w.WriteString("item", l.Item);
                w.WriteString("specification", l.Specification);
                Num(w, "quantity", l.Quantity, "bom.quantity");
                w.WriteString("unit", l.Unit);
                w.WriteString("notes", l.Notes);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteStartObject("assembly");
            w.WriteStartArray("steps");
            foreach (var s in doc.Assembly)
            {
                w.WriteStartObject();
                w.WriteNumber("order", s.Order);
                w.WriteString("action", s.Action);
                Num(w, "pull_n", s.PullN, "assembly.steps.pull_n");
                w.WriteString("pull_note", s.PullNote);
                if (s.Caution is { } c) w.WriteString("caution", c); else w.WriteNull("caution");
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
            WriteThermal(w, doc.Thermal);
            w.WriteEndObject();
        }
        ms.WriteByte((byte)'\n');
        return ms.ToArray();
    }

    private static void WriteElectrical(Utf8JsonWriter w, ElectricalSection e)
    {
        w.WriteStartObject("electrical");
        w.WriteNumber("pole_pairs", e.PolePairs);
        Num(w, "electrical_hz", e.ElectricalHz, "electrical.electrical_hz");
        Num(w, "magnetic_gap", e.MagneticGap, "electrical.magnetic_gap");
        Num(w, "winding_factor", e.WindingFactor, "electrical.winding_factor");
        w.WriteStartObject("magnet");
        Num(w, "br", e.MagnetBr, "electrical.magnet.br");
        w.WriteString("source", e.MagnetSource);
        w.WriteString("shape", e.MagnetShape);
        w.WriteString("description", e.MagnetDescription);
        Num(w, "br_ambient", e.MagnetBrAmbient, "electrical.magnet.br_ambient");
        Num(w, "br_operating", e.MagnetBrOperating, "electrical.magnet.br_operating");
        Num(w, "temperature_c", e.MagnetTemperatureC, "electrical.magnet.temperature_c");
        Num(w, "max_working_temperature_c", e.MagnetMaxWorkingTemperatureC, "electrical.magnet.max_working_temperature_c");
        w.WriteEndObject();
        var c = e.Coil;
        w.WriteStartObject("coil");
        w.WriteNumber("turns", c.Turns);
        Num(w, "wire_bare", c.WireBare, "coil.wire_bare");
        Num(w, "wire_overall", c.WireOverall, "coil.wire_overall");
        Num(w, "fill_factor", c.FillFactor, "coil.fill_factor");
        if (c.InnerDiameter is { } id) Num(w, "inner_diameter", id, "coil.inner_diameter");
        if (c.OuterDiameter is { } od) Num(w, "outer_diameter", od, "coil.outer_diameter");
        if (c.Outline is { } o)
        {
            w.WriteStartObject("outline");
            Num(w, "inner_radius", o.InnerRadius, "coil.outline.inner_radius");
            Num(w, "outer_radius", o.OuterRadius, "coil.outline.outer_radius");
            Num(w, "window_width", o.WindowWidth, "coil.outline.window_width");
            Num(w, "width", o.Width, "coil.outline.width");
            Num(w, "radial_build", o.RadialBuild, "coil.outline.radial_build");
            w.WriteEndObject();
        }
        Num(w, "height", c.Height, "coil.height");
        Num(w, "pitch_radius", c.PitchRadius, "coil.pitch_radius");
        Num(w, "mean_turn", c.MeanTurn, "coil.mean_turn");
        Num(w, "wire_length_m", c.WireLengthM, "coil.wire_length_m");
        Num(w, "resistance_20c_ohm", c.Resistance20cOhm, "coil.resistance_20c_ohm");
        Num(w, "resistance_hot_ohm", c.ResistanceHotOhm, "coil.resistance_hot_ohm");
        Num(w, "inductance_uh", c.InductanceUh, "coil.inductance_uh");
        Num(w, "copper_mass_g", c.CopperMassG, "coil.copper_mass_g");
        if (c.WireAwg is { } awg) w.WriteNumber("wire_awg", awg); else w.WriteNull("wire_awg");
        Num(w, "radial_build", c.RadialBuild, "coil.radial_build");
        Num(w, "lead_allowance", c.LeadAllowance, "coil.lead_allowance");
        Num(w, "max_temperature_c", c.MaxTemperatureC, "coil.max_temperature_c");
        Num(w, "temperature_c", c.TemperatureC, "coil.temperature_c");
        Num(w, "wire_ohm_per_m_20c", c.WireOhmPerM20C, "coil.wire_ohm_per_m_20c");
        Num(w, "emf_rms_v", c.EmfRmsV, "coil.emf_rms_v");
        w.WriteBoolean("turns_solved", c.TurnsSolved);
        w.WriteEndObject();
        Num(w, "coil_flux_linkage_peak_wb", e.CoilFluxLinkagePeakWb, "electrical.coil_flux_linkage_peak_wb");
        w.WriteStartObject("phase");
        w.WriteNumber("coils_in_series", e.Phase.CoilsInSeries);
        Num(w, "emf_peak_v", e.Phase.EmfPeakV, "phase.emf_peak_v");
        Num(w, "emf_rms_v", e.Phase.EmfRmsV, "phase.emf_rms_v");
        Num(w, "resistance_20c_ohm", e.Phase.Resistance20cOhm, "phase.resistance_20c_ohm");
        w.WriteString("connection", e.Phase.Connection);
        w.WriteNumber("parallel_paths", e.Phase.ParallelPaths);
        Num(w, "emf_fundamental_rms_v", e.Phase.EmfFundamentalRmsV, "phase.emf_fundamental_rms_v");
        Num(w, "resistance_hot_ohm", e.Phase.ResistanceHotOhm, "phase.resistance_hot_ohm");
        Num(w, "inductance_uh", e.Phase.InductanceUh, "phase.inductance_uh");
        Num(w, "thd_percent", e.Phase.ThdPercent, "phase.thd_percent");
        w.WriteEndObject();
        Num(w, "line_emf_rms_v", e.LineEmfRmsV, "electrical.line_emf_rms_v");
        Num(w, "ke_v_per_krpm", e.KeVPerKrpm, "electrical.ke_v_per_krpm");
        Num(w, "rated_rpm", e.RatedRpm, "electrical.rated_rpm");
        Num(w, "flux_per_turn_peak_wb", e.FluxPerTurnPeakWb, "electrical.flux_per_turn_peak_wb");
        Num(w, "line_emf_peak_v", e.LineEmfPeakV, "electrical.line_emf_peak_v");
        Num(w, "line_emf_rms_at_max_rpm_v", e.LineEmfRmsAtMaxRpmV, "electrical.line_emf_rms_at_max_rpm_v");
        Num(w, "line_emf_peak_at_max_rpm_v", e.LineEmfPeakAtMaxRpmV, "electrical.line_emf_peak_at_max_rpm_v");
        Num(w, "kt_nm_per_a", e.KtNmPerA, "electrical.kt_nm_per_a");
        Num(w, "wire_total_m", e.WireTotalM, "electrical.wire_total_m");
        w.WriteStartArray("harmonics");
        foreach (var h in e.Harmonics)
        {
            w.WriteStartObject();
            w.WriteNumber("order", h.Order);
            Num(w, "peak_v", h.PeakV, "electrical.harmonics.peak_v");
            Num(w, "percent_of_fundamental", h.PercentOfFundamental, "electrical.harmonics.percent_of_fundamental");
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteStartArray("winding_table");
        foreach (var c2 in e.WindingTable)
        {
            w.WriteStartObject();
            w.WriteNumber("coil", c2.Coil);
            Num(w, "angle_deg", c2.AngleDeg, "electrical.winding_table.angle_deg");
            w.WriteString("phase", c2.Phase);
            w.WriteNumber("direction", c2.Direction);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteString("sensor_kind", e.SensorKind);
        w.WriteString("sensor_rule", e.SensorRule);
        w.WriteStartArray("sensors");
        foreach (var s in e.Sensors)
        {
            w.WriteStartObject();
            w.WriteString("label", s.Label);
            Num(w, "angle_deg", s.AngleDeg, "electrical.sensors.angle_deg");
            Num(w, "radius", s.Radius, "electrical.sensors.radius");
            Num(w, "electrical_deg", s.ElectricalDeg, "electrical.sensors.electrical_deg");
            w.WriteBoolean("inverted", s.Inverted);
            Num(w, "clearance", s.Clearance, "electrical.sensors.clearance");
            w.WriteBoolean("fits", s.Fits);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteEndObject();
    }

    private static void WriteThermal(Utf8JsonWriter w, ThermalSection? t)
    {
        if (t is null) { w.WriteNull("thermal"); return; }
        w.WriteStartObject("thermal");
        w.WriteString("point", t.Point);
        Num(w, "ambient_c", t.AmbientC, "thermal.ambient_c");
        Num(w, "coil_temperature_c", t.CoilTemperatureC, "thermal.coil_temperature_c");
        Num(w, "magnet_temperature_c", t.MagnetTemperatureC, "thermal.magnet_temperature_c");
        Num(w, "copper_loss_per_coil_w", t.CopperLossPerCoilW, "thermal.copper_loss_per_coil_w");
        Num(w, "copper_loss_w", t.CopperLossW, "thermal.copper_loss_w");
        Num(w, "thermal_resistance_k_per_w", t.ThermalResistanceKPerW, "thermal.thermal_resistance_k_per_w");
        w.WriteNumber("faces", t.Faces);
        Num(w, "face_area_mm2", t.FaceAreaMm2, "thermal.face_area_mm2");
        Num(w, "flange", t.FlangeMm, "thermal.flange");
        w.WriteString("former_material", t.FormerMaterial);
        Num(w, "former_conductivity_w_per_m_k", t.FormerConductivityWPerMK, "thermal.former_conductivity_w_per_m_k");
        Num(w, "convection_w_per_m2_k", t.ConvectionWPerM2K, "thermal.convection_w_per_m2_k");
        w.WriteNumber("field_passes", t.FieldPasses);
        w.WriteEndObject();
    }

    private static void WriteOperating(Utf8JsonWriter w, OperatingSection o)
    {
        w.WriteStartObject("operating");
        Num(w, "rpm", o.Rpm, "operating.rpm");
        if (o.Generator is { } g)
        {
            w.WriteStartObject("generator");
            Num(w, "rpm", g.Rpm, "operating.generator.rpm");
            Num(w, "load_resistance_ohm", g.LoadResistanceOhm, "operating.generator.load_resistance_ohm");
            Num(w, "current_a", g.CurrentA, "operating.generator.current_a");
            Num(w, "coil_current_a", g.CoilCurrentA, "operating.generator.coil_current_a");
            Num(w, "terminal_voltage_v", g.TerminalVoltageV, "operating.generator.terminal_voltage_v");
            Num(w, "output_power_w", g.OutputPowerW, "operating.generator.output_power_w");
            Num(w, "copper_loss_w", g.CopperLossW, "operating.generator.copper_loss_w");
            Num(w, "efficiency", g.Efficiency, "operating.generator.efficiency");
            Num(w, "shaft_torque_nm", g.ShaftTorqueNm, "operating.generator.shaft_torque_nm");
            Num(w, "current_density_a_per_mm2", g.CurrentDensityAPerMm2, "operating.generator.current_density_a_per_mm2");
            w.WriteEndObject();
        }
        else w.WriteNull("generator");
        if (o.Motor is { } m)
        {
            w.WriteStartObject("motor");
            w.WriteString("drive", m.Drive);
            Num(w, "supply_voltage_v", m.SupplyVoltageV, "operating.motor.supply_voltage_v");
            Num(w, "switch_drop_v", m.SwitchDropV, "operating.motor.switch_drop_v");
            Num(w, "path_resistance_ohm", m.PathResistanceOhm, "operating.motor.path_resistance_ohm");
            Num(w, "no_load_rpm", m.NoLoadRpm, "operating.motor.no_load_rpm");
            Num(w, "stall_torque_nm", m.StallTorqueNm, "operating.motor.stall_torque_nm");
            Num(w, "stall_current_a", m.StallCurrentA, "operating.motor.stall_current_a");
            Num(w, "rated_rpm", m.RatedRpm, "operating.motor.rated_rpm");
            Num(w, "current_at_rated_a", m.CurrentAtRatedA, "operating.motor.current_at_rated_a");
            Num(w, "torque_at_rated_nm", m.TorqueAtRatedNm, "operating.motor.torque_at_rated_nm");
            Num(w, "output_power_at_rated_w", m.OutputPowerAtRatedW, "operating.motor.output_power_at_rated_w");
            Num(w, "input_power_at_rated_w", m.InputPowerAtRatedW, "operating.motor.input_power_at_rated_w");
            Num(w, "efficiency_at_rated", m.EfficiencyAtRated, "operating.motor.efficiency_at_rated");
            Num(w, "current_density_at_rated_a_per_mm2", m.CurrentDensityAtRatedAPerMm2, "operating.motor.current_density_at_rated_a_per_mm2");
            Num(w, "current_density_at_stall_a_per_mm2", m.CurrentDensityAtStallAPerMm2, "operating.motor.current_density_at_stall_a_per_mm2");
            w.WriteEndObject();
        }
        else w.WriteNull("motor");
        if (o.Charging is { } c)
        {
            w.WriteStartObject("charging");
            w.WriteString("rectifier", Words.Of(c.Rectifier));
            Num(w, "store_voltage_v", c.StoreVoltageV, "operating.charging.store_voltage_v");
            Num(w, "drops_v", c.DropsV, "operating.charging.drops_v");
            Num(w, "path_resistance_ohm", c.PathResistanceOhm, "operating.charging.path_resistance_ohm");
            Num(w, "cut_in_rpm", c.CutInRpm, "operating.charging.cut_in_rpm");
            Num(w, "current_at_rated_a", c.CurrentAtRatedA, "operating.charging.current_at_rated_a");
            Num(w, "power_at_rated_w", c.PowerAtRatedW, "operating.charging.power_at_rated_w");
            Num(w, "open_circuit_peak_at_max_rpm_v", c.OpenCircuitPeakAtMaxRpmV, "operating.charging.open_circuit_peak_at_max_rpm_v");
            Num(w, "reachable_at_rated_v", c.ReachableAtRatedV, "operating.charging.reachable_at_rated_v");
            if (c.ChargeTargetV is { } tv) Num(w, "charge_target_v", tv, "operating.charging.charge_target_v"); else w.WriteNull("charge_target_v");
            if (c.TimeToChargeS is { } ts) Num(w, "time_to_charge_s", ts, "operating.charging.time_to_charge_s"); else w.WriteNull("time_to_charge_s");
            w.WriteStartArray("curve");
            foreach (var p in c.Curve)
            {
                w.WriteStartObject();
                Num(w, "rpm", p.Rpm, "operating.charging.curve.rpm");
                Num(w, "current_a", p.CurrentA, "operating.charging.curve.current_a");
                Num(w, "power_w", p.PowerW, "operating.charging.curve.power_w");
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        if (o.Drive is { } dr)
        {
            w.WriteStartObject("drive");
            w.WriteString("switching", Words.Of(dr.Switching));
            w.WriteString("sensor", Words.Of(dr.Sensor));
            Num(w, "operate_mt", dr.OperateTesla * 1000, "operating.drive.operate_mt");
            Num(w, "release_mt", dr.ReleaseTesla * 1000, "operating.drive.release_mt");
            Num(w, "sensor_field_min_mt", dr.FieldMinTesla * 1000, "operating.drive.sensor_field_min_mt");
            Num(w, "sensor_field_max_mt", dr.FieldMaxTesla * 1000, "operating.drive.sensor_field_max_mt");
            w.WriteNumber("driving_pulses", dr.DrivingPulses);
            w.WriteNumber("braking_pulses", dr.BrakingPulses);
            Num(w, "peak_current_a", dr.PeakCurrentA, "operating.drive.peak_current_a");
            Num(w, "turn_off_voltage_v", dr.TurnOffVoltageV, "operating.drive.turn_off_voltage_v");
            Num(w, "mean_stall_torque_nm", dr.MeanStallTorqueNm, "operating.drive.mean_stall_torque_nm");
            Num(w, "self_start_share", dr.SelfStartShare, "operating.drive.self_start_share");
            w.WriteStartArray("windows");
            for (int ci = 0; ci < dr.Circuits.Count; ci++)
                foreach (var win in dr.Circuits[ci].Windows)
                {
                    w.WriteStartObject();
                    w.WriteString("phase", dr.Circuits[ci].Phase.ToString());
                    Num(w, "on_deg", win.OnDeg, "operating.drive.windows.on_deg");
                    Num(w, "off_deg", win.OffDeg, "operating.drive.windows.off_deg");
                    w.WriteNumber("sign", win.Sign);
                    Num(w, "flux_change_wb", win.FluxChangeWb, "operating.drive.windows.flux_change_wb");
                    w.WriteBoolean("brakes", win.Brakes);
                    w.WriteEndObject();
                }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        w.WriteEndObject();
    }

    private static void WriteMechanics(Utf8JsonWriter w, MechanicsSection m)
    {
        w.WriteStartObject("mechanics");
        Num(w, "rotating_mass_kg", m.RotatingMassKg, "mechanics.rotating_mass_kg");
        Num(w, "rotating_inertia_kg_m2", m.RotatingInertiaKgM2, "mechanics.rotating_inertia_kg_m2");
        Num(w, "magnet_mass_g", m.MagnetMassG, "mechanics.magnet_mass_g");
        w.WriteStartObject("pull_n");
        foreach (var (part, n) in m.PullN) Num(w, part, n, "mechanics.pull_n." + part);
        w.WriteEndObject();
        w.WriteString("pull_method", m.PullMethod);
        w.WriteStartArray("pull_curve");
        foreach (var (gap, n) in m.PullCurve)
        {
            w.WriteStartObject();
            Num(w, "face_to_face_mm", gap, "mechanics.pull_curve.face_to_face_mm");
            Num(w, "pull_n", n, "mechanics.pull_curve.pull_n");
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteEndObject();
    }

    private static void Num(Utf8JsonWriter w, string name, double v, string field)
    {
        if (!double.IsFinite(v)) throw new NonFiniteResultException(field, v);
        // 12 significant digits: far below any tolerance in the document, and it keeps binary noise such as
        // 1.7999999999999998 out of it. Negative zero would print as "-0": written as 0.
        double r = v == 0 ? 0.0 : double.Parse(v.ToString("G12", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        w.WriteNumber(name, r);
    }
}
