using System.Globalization;

namespace PartForge.Export.Bom;

/// <summary>
/// Builds the bill of materials from the design (counts, sizes, grades), the electrical engine's total wire
/// length and the made parts. Lines come in a fixed order so the CSV is byte-identical on rebuild.
/// </summary>
public static class BomBuilder
{
    /// <summary>Margin added on every side of a cut part's bounding box for the sheet size, mm (our choice).</summary>
    public const double SheetMarginMm = 10;

    public static BillOfMaterials Build(Design.Model.Design d, double electricalWireTotalM, double wireGramsPerMetre, IReadOnlyList<BomPart> parts)
    {
        var lines = new List<BomLine>();
        int rotors = RotorCount(d), stators = StatorCount(d);
        var m = d.Magnets;

        string shape = m.Shape switch
        {
            "disc" => $"disc D{F(m.Diameter ?? 0)} x {F(m.Thickness)} mm",
            "block" => $"block {F(m.Length ?? 0)} x {F(m.Width ?? 0)} x {F(m.Thickness)} mm (radial x tangential x axial)",
            _ => $"arc segment R{F(m.InnerRadius ?? 0)}-{F(m.OuterRadius ?? 0)} mm x {F(m.Span ?? 0)} deg x {F(m.Thickness)} mm",
        };
        string grade = m.Br is { } br ? $"NdFeB, Br {F(br)} T" : $"NdFeB {m.Grade}";
        lines.Add(new BomLine("magnets", $"{m.Shape} magnet", $"{shape}, {grade}, magnetised through the thickness",
            d.Machine.Poles * rotors, "pcs", $"{d.Machine.Poles} per rotor x {rotors} rotor{(rotors > 1 ? "s" : "")}"));

        string wire = d.Coils.Wire.Awg is { } awg ? $"AWG {awg}" : $"bare D{F(d.Coils.Wire.Diameter ?? 0)} mm";
        double buy = WireSpare.ToBuyM(electricalWireTotalM);
        lines.Add(new BomLine("wire", $"enamelled copper wire {wire}", $"{wire}, enamel {d.Coils.Enamel} (IEC 60317)", Round(buy, 2), "m",
            $"electrical total {F(Round(electricalWireTotalM, 2))} m for {d.Machine.Coils * stators} coils incl. leads + {WireSpare.Rule}"));
        lines.Add(new BomLine("wire", $"copper mass of the wire to buy", wire, Round(buy * wireGramsPerMetre, 1), "g",
            $"{F(Round(wireGramsPerMetre, 4))} g/m bare copper"));

        foreach (var p in parts.Where(p => p.Name == "former"))
            lines.Add(new BomLine("formers", "coil former", $"printed, {p.Material}", p.Quantity, "pcs",
                $"{F(Round(p.MassEachG, 1))} g each, {F(Round(p.MassEachG * p.Quantity, 1))} g in all; one per coil"));
        foreach (var p in parts.Where(p => p.Process == "print" && p.Name != "former"))
            lines.Add(new BomLine("printed parts", p.Name, $"printed, {p.Material}", p.Quantity, "pcs",
                $"{F(Round(p.MassEachG * p.Quantity, 1))} g of {p.Material} (solid; infill lowers it)"));
        foreach (var p in parts.Where(p => p.Process == "cut"))
        {
            double w = Round(p.FootprintXMm + 2 * SheetMarginMm, 0), h = Round(p.FootprintYMm + 2 * SheetMarginMm, 0);
            lines.Add(new BomLine("cut parts", p.Name, $"{p.Material} sheet {F(p.ThicknessMm)} mm, at least {F(w)} x {F(h)} mm each", p.Quantity, "pcs",
                $"{F(Round(p.MassEachG, 1))} g each; sheet = bounding box + {F(SheetMarginMm)} mm each side"));
        }

        if (d.Rotor.BoltCircle is { } bc) lines.Add(Fastener("rotor bolt circle", bc.Hole, bc.Count * rotors,
            d.Rotor.Thickness + (d.Rotor.BackIron?.Thickness ?? 0), $"{bc.Count} per rotor x {rotors} on D{F(bc.Diameter)}"));
        if (d.Stator.Mount is { } mt) lines.Add(Fastener("stator mount", mt.Hole, mt.Count * stators,
            d.Stator.Thickness, $"{mt.Count} per stator x {stators} on D{F(mt.CircleDiameter)}"));

        if (d.Sensor.Kind != "none")
        {
            string kind = d.Sensor.Kind == "hall" ? "Hall-effect switch or latch" : "reed switch";
            var b = d.Sensor.Body;
            lines.Add(new BomLine("sensors", kind, $"body about {F(b.Length)} x {F(b.Width)} x {F(b.Height)} mm", d.Sensor.Count, "pcs",
                "timing sensor(s) seated in the stator ring"));
        }
        return new BillOfMaterials(d.Name, lines);
    }

    public static int RotorCount(Design.Model.Design d) => d.Machine.Layout == "dual-rotor" ? 2 : 1;
    public static int StatorCount(Design.Model.Design d) => d.Machine.Layout == "dual-stator" ? 2 : 1;

    private static BomLine Fastener(string where, double hole, int count, double gripMm, string notes)
    {
        var pick = ClearanceHoles.ForHole(hole);
        if (pick is not { } p)
            return new BomLine("fasteners", $"{where} fastener", $"hole D{F(hole)} mm is below the smallest ISO 273 clearance hole (M1.6): choose a pin or screw to suit", count, "pcs", notes);
        return new BomLine("fasteners", $"{p.Size} screw with nut and washer", $"for hole D{F(hole)} mm (ISO 273 {p.Series} series); length = grip {F(gripMm)} mm + hub/frame + nut", count, "sets",
            $"{where}: {notes}");
    }

    private static double Round(double v, int digits) => Math.Round(v, digits, MidpointRounding.AwayFromZero);

    private static string F(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);
}
