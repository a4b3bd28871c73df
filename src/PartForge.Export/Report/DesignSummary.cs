using System.Globalization;

namespace PartForge.Export.Report;

/// <summary>The headline facts of a design, as the report's summary table shows them (values from the design file).</summary>
public static class DesignSummary
{
    public static IReadOnlyList<ReportRow> Rows(Design.Model.Design d)
    {
        var m = d.Magnets;
        string magnet = m.Shape switch
        {
            "disc" => $"disc D{F(m.Diameter ?? 0)} x {F(m.Thickness)}",
            "block" => $"block {F(m.Length ?? 0)} x {F(m.Width ?? 0)} x {F(m.Thickness)}",
            _ => $"arc R{F(m.InnerRadius ?? 0)}-{F(m.OuterRadius ?? 0)}, {F(m.Span ?? 0)} deg x {F(m.Thickness)}",
        };
        string wire = d.Coils.Wire.Awg is { } awg ? $"AWG {awg}" : $"D{F(d.Coils.Wire.Diameter ?? 0)} mm bare";
        var rows = new List<ReportRow>
        {
            new("design", d.Name, "", "design"),
            new("layout", d.Machine.Layout, "", "machine.layout"),
            new("poles (magnets per rotor face)", I(d.Machine.Poles), "", "machine.poles"),
            new("coils per stator", I(d.Machine.Coils), "", "machine.coils"),
            new("phases, connection", $"{d.Machine.Phases}, {d.Machine.Connection ?? (d.Machine.Phases == 3 ? "star" : "series")}", "", "machine.phases"),
            new("rated / max speed", $"{F(d.Machine.RatedRpm)} / {F(d.Machine.MaxRpm)}", "rpm", "machine.rated_rpm"),
            new("magnets", $"{magnet}, {(m.Br is { } br ? "Br " + F(br) + " T" : m.Grade)}", "mm", "magnets.shape"),
            new("magnet pitch radius", m.PitchRadius is { } pr ? F(pr) : "-", "mm", "magnets.pitch_radius"),
            new("rotor diameter x thickness", $"{F(d.Rotor.OuterDiameter)} x {F(d.Rotor.Thickness)}", "mm", "rotor.outer_diameter"),
            new("back iron", d.Rotor.BackIron is { } bi ? F(bi.Thickness) + " steel" : "none", "mm", "rotor.back_iron.thickness"),
            new("coils", $"{d.Coils.Shape}, {(d.Coils.Turns is { } t ? I(t) + " turns" : "turns solved for the target EMF")}, {wire}, fill {F(d.Coils.FillFactor)}", "", "coils.turns"),
            new("stator ring", $"D{F(d.Stator.InnerDiameter)}-{F(d.Stator.OuterDiameter)} x {F(d.Stator.Thickness)}, {d.Stator.Material}", "mm", "stator.outer_diameter"),
            new("nominal air gap / minimum running gap", $"{F(d.Gap.AirGap)} / {F(d.Gap.MinRunningGap)}", "mm", "gap.air_gap"),
            new("timing sensor", d.Sensor.Kind == "none" ? "none" : $"{d.Sensor.Count} x {d.Sensor.Kind}", "", "sensor.kind"),
        };
        return rows;
    }

    private static string F(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);
    private static string I(int v) => v.ToString(CultureInfo.InvariantCulture);
}
