using System.Globalization;
using PartForge.Design.Machines;

namespace PartForge.Export.Report;

/// <summary>The headline facts of a design, as the report's summary table shows them (values from the design file).</summary>
public static class DesignSummary
{
    public static IReadOnlyList<ReportRow> Rows(MachineModel d)
    {
        var m = d.Magnets;
        string wire = d.Coils.Wire.Awg is { } awg ? $"AWG {awg}" : $"D{F(d.Coils.Wire.BareDiameterMm ?? 0)} mm bare";
        var rows = new List<ReportRow>
        {
            new("design", d.Name, "", "design"),
            new("layout", d.Layout.Word, "", "machine.layout"),
            new("poles (magnets per rotor face)", I(d.Poles), "", "machine.poles"),
            new("coils per stator", I(d.CoilsPerStator), "", "machine.coils"),
            new("phases, connection", $"{d.Phases}, {Words.Of(d.Connection)}", "", "machine.phases"),
            new("rated / max speed", $"{F(d.RatedRpm)} / {F(d.MaxRpm)}", "rpm", "machine.rated_rpm"),
            new("magnets", $"{m.Shape.Describe()}, {(m.BrGiven ? "Br " + F(m.BrTesla) + " T" : m.Grade)}", "", "magnets.shape"),
            new("magnet pitch radius", F(m.Shape.PitchRadiusMm), "mm", "magnets.pitch_radius"),
            new("rotor diameter x thickness", $"{F(d.Rotor.OuterDiameterMm)} x {F(d.Rotor.ThicknessMm)}", "mm", "rotor.outer_diameter"),
            d.Rotor.BackIronThicknessMm is { } bi ? new("back iron", F(bi) + " steel", "mm", "rotor.back_iron.thickness") : new("back iron", "none", "", "rotor.back_iron"),
            new("coils", $"{Words.Of(d.Coils.Shape)}, {(d.Coils.Turns is { } t ? I(t) + " turns" : "turns solved for the target EMF")}, {wire}, fill {F(d.Coils.FillFactor)}", "", "coils.turns"),
            new("stator ring", $"D{F(d.Stator.InnerDiameterMm)}-{F(d.Stator.OuterDiameterMm)} x {F(d.Stator.ThicknessMm)}, {d.Stator.Material.Name}", "mm", "stator.outer_diameter"),
            new("nominal air gap / minimum running gap", $"{F(d.Gap.AirGapMm)} / {F(d.Gap.MinRunningGapMm)}", "mm", "gap.air_gap"),
            new("timing sensor", d.Sensor.Kind == SensorKind.None ? "none" : $"{d.Sensor.Count} x {Words.Of(d.Sensor.Kind)}", "", "sensor.kind"),
        };
        return rows;
    }

    private static string F(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);
    private static string I(int v) => v.ToString(CultureInfo.InvariantCulture);
}
