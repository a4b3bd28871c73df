using System.Globalization;
using PartForge.Checks.Hardware;
using PartForge.Design.Hardware;
using PartForge.Design.Machines;
using PartForge.Design.Parts;

namespace PartForge.Export.Bom;

/// <summary>
/// Builds the bill of materials from the design (counts, sizes, grades), the electrical engine's total wire
/// length and the made parts. Lines come in a fixed order so the CSV is byte-identical on rebuild.
/// </summary>
public static class BomBuilder
{
    /// <summary>Margin added on every side of a cut part's bounding box for the sheet size, mm (our choice).</summary>
    public const double SheetMarginMm = 10;

    public static BillOfMaterials Build(MachineModel d, double electricalWireTotalM, double wireGramsPerMetre, IReadOnlyList<BomPart> parts, IReadOnlyList<FastenerJoint> joints, JackingSet? jacks = null, PartForge.Parts.Fabrication.CutSheetNest? sheets = null)
    {
        var lines = new List<BomLine>();
        int rotors = RotorCount(d), stators = StatorCount(d);
        var m = d.Magnets;

        string grade = m.BrGiven ? $"NdFeB, Br {F(m.BrTesla)} T" : $"NdFeB {m.Grade}";
        lines.Add(new BomLine("magnets", $"{m.Shape.Kind.Word} magnet", $"{m.Shape.Describe()}, {grade}, magnetised through the thickness",
            d.Poles * rotors, "pcs", $"{d.Poles} per rotor x {rotors} rotor{(rotors > 1 ? "s" : "")}"
                + (m.Arrangement == MagnetArrangement.Same ? "; all with the same pole toward the coils (magnets.arrangement: same), not alternating" : "")));

        string wire = d.Coils.Wire.Awg is { } awg ? $"AWG {awg}" : $"bare D{F(d.Coils.Wire.BareDiameterMm ?? 0)} mm";
        double buy = WireSpare.ToBuyM(electricalWireTotalM);
        lines.Add(new BomLine("wire", $"enamelled copper wire {wire}", $"{wire}, enamel grade-{d.Coils.EnamelGrade} (IEC 60317)", Round(buy, 2), "m",
            $"electrical total {F(Round(electricalWireTotalM, 2))} m for {d.CoilsInMachine} coils incl. leads + {WireSpare.Rule}"));
        lines.Add(new BomLine("wire", $"copper mass of the wire to buy", wire, Round(buy * wireGramsPerMetre, 1), "g",
            $"{F(Round(wireGramsPerMetre, 4))} g/m bare copper"));

        foreach (var p in parts.Where(p => p.Id.Role == PartRole.Former))
            lines.Add(new BomLine("formers", "coil former", $"printed, {p.Material}", p.Quantity, "pcs",
                $"{F(Round(p.MassEachG, 1))} g each, {F(Round(p.MassEachG * p.Quantity, 1))} g in all; one per coil; printed in two pieces (former-base and former-cap) without supports"));
        foreach (var p in parts.Where(p => p.Process == PartProcess.Print && p.Id.Role != PartRole.Former))
            lines.Add(new BomLine("printed parts", p.Name, $"printed, {p.Material}", p.Quantity, "pcs",
                $"{F(Round(p.MassEachG * p.Quantity, 1))} g of {p.Material} (solid; infill lowers it)"));
        foreach (var p in parts.Where(p => p.Process == PartProcess.Cut))
        {
            double w = Round(p.FootprintXMm + 2 * SheetMarginMm, 0), h = Round(p.FootprintYMm + 2 * SheetMarginMm, 0);
            lines.Add(new BomLine("cut parts", p.Name, $"{p.Material} sheet {F(p.ThicknessMm)} mm, at least {F(w)} x {F(h)} mm each", p.Quantity, "pcs",
                $"{F(Round(p.MassEachG, 1))} g each; sheet = bounding box + {F(SheetMarginMm)} mm each side"));
        }

        if (sheets is not null)
            foreach (var stock in sheets.Stocks)
                foreach (var size in stock.Layout.Bins.GroupBy(b => (b.WidthMm, b.HeightMm)))
                {
                    var bins = size.ToArray();
                    double used = bins.Sum(b => b.PartAreaMm2) / bins.Sum(b => b.WidthMm * b.HeightMm);
                    string copies = string.Join(", ", stock.Layout.Placements.Where(p => bins.Any(b => b.Index == p.BinIndex)).GroupBy(p => p.PartId).Select(g => $"{g.Key} x {g.Count()}"));
                    lines.Add(new BomLine("cut sheets", $"{stock.Material} sheet {F(stock.ThicknessMm)} mm", $"{F(size.Key.WidthMm)} x {F(size.Key.HeightMm)} mm", bins.Length, "sheets",
                        $"nested: {copies}; {F(Round(100 * used, 1))} % used (parts' area / sheet area)"));
                }

        foreach (var j in joints) lines.Add(Fastener(j));
        if (jacks is { } jk)
            lines.Add(new BomLine("fasteners", $"{jk.Thread.Size} jacking screw with hex nut", $"fully threaded, property class {FastenerSteel.PropertyClass} (ISO 898-1), length at least {F(Round(jk.ScrewLengthMm, 3))} mm; ISO 4032 nut in the nut trap", jk.Count, "sets",
                $"{jk.Rotor.Name}: lowers it onto the hub spacer against {F(Round(jk.PullN, 1))} N; length = {F(Round(jk.PassMm, 3))} mm through the rotor and its back iron + {F(JackingSet.LiftMm)} mm lift"));

        if (d.Sensor.Kind != SensorKind.None)
        {
            string kind = d.Sensor.Kind == SensorKind.Hall ? "Hall-effect switch or latch" : "reed switch";
            var b = d.Sensor.Body;
            lines.Add(new BomLine("sensors", kind, $"body about {F(b.LengthMm)} x {F(b.WidthMm)} x {F(b.HeightMm)} mm; switches on at {F(d.Sensor.OperateTesla * 1000)} mT, off at {F(d.Sensor.ReleaseTesla * 1000)} mT", d.Sensor.Count, "pcs",
                "timing sensor(s) seated in the stator ring"));
        }
        if (d.RunsAsMotor)
        {
            var dv = d.Drive;
            int circuits = d.Phases;
            (int switches, int diodes) = dv.Switching switch
            {
                SwitchingKind.SixStep => (6, 6),
                SwitchingKind.Bipolar => (4 * circuits, 4 * circuits),
                _ => (circuits, circuits),
            };
            bool reedSwitches = d.Sensor.Kind == SensorKind.Reed && dv.Switching == SwitchingKind.Unipolar;
            if (!reedSwitches)
                lines.Add(new BomLine("drive", dv.Switching == SwitchingKind.Unipolar ? "switching transistor" : "bridge transistor",
                    $"rated at least {F(dv.SwitchCurrentRatingA)} A and {F(dv.SwitchVoltageRatingV)} V", switches, "pcs", $"{Words.Of(dv.Switching)} drive, switched by the timing sensor"));
            if (dv.HasFreewheel)
                lines.Add(new BomLine("drive", $"{Words.Of(dv.Diode)} freewheel diode", $"rated at least {F(dv.SwitchCurrentRatingA)} A and {F(dv.SwitchVoltageRatingV)} V",
                    diodes, "pcs", dv.Switching == SwitchingKind.Unipolar ? "across each coil circuit, cathode to the supply's + (flyback)" : "across each bridge transistor"));
        }
        if (d.RunsAsGenerator && d.Load.Rectifier != RectifierKind.None)
            lines.Add(new BomLine("load", $"{Words.Of(d.Load.Diode)} rectifier diode", $"{Words.Of(d.Load.Rectifier)} rectifier, rated above the open-circuit peak at machine.max_rpm",
                (d.Load.Rectifier == RectifierKind.Bridge ? 4 : 1) * d.Phases, "pcs", "one rectifier per phase circuit"));
        if (d.Storage is CapacitorStorage cap)
            lines.Add(new BomLine("storage", "capacitor", $"{F(cap.CapacitanceF)} F, rated {F(cap.RatedVoltageV)} V, ESR about {F(cap.EsrOhm)} ohm", 1, "pcs",
                "observe its polarity; never charge it above its rated voltage"));
        else if (d.Storage is BatteryStorage bat)
            lines.Add(new BomLine("storage", "battery", $"{F(bat.VoltageV)} V, internal resistance about {F(bat.InternalResistanceOhm)} ohm", 1, "pcs",
                "fuse it close to its terminals; follow the maker's charging limits"));
        return new BillOfMaterials(d.Name, lines);
    }

    public static int RotorCount(MachineModel d) => d.Layout.Rotors.Count;
    public static int StatorCount(MachineModel d) => d.Layout.Stators.Count;

    /// <summary>
    /// One line per joint: through-studs with a nut and washer at each end, or screws into a hub or frame. The grip
    /// is the sum of the clamped parts (listed bottom to top), read from the placed parts.
    /// </summary>
    private static BomLine Fastener(FastenerJoint j)
    {
        string stackText = string.Join(" + ", j.Clamped.Select(c => $"{c.Part.Name} {F(Round(c.ThicknessMm, 3))}"));
        string notes = $"{j.Where} on D{F(j.CircleDiameterMm)}: grip {F(Round(j.GripMm, 3))} mm = {stackText}";
        if (j.Thread is not { } t)
            return new BomLine("fasteners", $"{j.Where} fastener", $"hole D{F(j.HoleMm)} mm is below the smallest ISO 273 clearance hole (M1.6): choose a pin or screw to suit", j.Count, "pcs", notes);
        string cls = $"property class {FastenerSteel.PropertyClass} (ISO 898-1)";
        return j.Kind == JointKind.ThroughStud
            ? new BomLine("fasteners", $"{t.Size} through-stud with 2 nuts and 2 washers", $"{cls}, for hole D{F(j.HoleMm)} mm (ISO 273 {j.HoleSeries} series); length = grip {F(Round(j.GripMm, 3))} mm + 2 washers + 2 nuts + 2 threads", j.Count, "sets", notes)
            : new BomLine("fasteners", $"{t.Size} screw with nut and washer", $"{cls}, for hole D{F(j.HoleMm)} mm (ISO 273 {j.HoleSeries} series); length = grip {F(Round(j.GripMm, 3))} mm + hub/frame + nut", j.Count, "sets", notes);
    }

    private static double Round(double v, int digits) => Math.Round(v, digits, MidpointRounding.AwayFromZero);

    private static string F(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);
}
