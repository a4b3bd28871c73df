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
                w.WriteEndObject();
            }
            w.WriteEndArray();
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
        w.WriteEndObject();
        Num(w, "coil_flux_linkage_peak_wb", e.CoilFluxLinkagePeakWb, "electrical.coil_flux_linkage_peak_wb");
        w.WriteStartObject("phase");
        w.WriteNumber("coils_in_series", e.Phase.CoilsInSeries);
        Num(w, "emf_peak_v", e.Phase.EmfPeakV, "phase.emf_peak_v");
        Num(w, "emf_rms_v", e.Phase.EmfRmsV, "phase.emf_rms_v");
        Num(w, "resistance_20c_ohm", e.Phase.Resistance20cOhm, "phase.resistance_20c_ohm");
        w.WriteEndObject();
        Num(w, "line_emf_rms_v", e.LineEmfRmsV, "electrical.line_emf_rms_v");
        Num(w, "ke_v_per_krpm", e.KeVPerKrpm, "electrical.ke_v_per_krpm");
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
