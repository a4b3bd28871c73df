using PartForge.Design.Keys;
using PartForge.Design.Machines;
using PartForge.Design.Machines.Magnets;
using PartForge.Design.Model;

namespace PartForge.Design.Loading;

/// <summary>
/// Rules that involve more than one key. Every rule reports at the offending key; all rules run, so every
/// problem is reported at once. Derived values (connection default, coil pitch radius, sensor count) are the
/// machine model's (<see cref="MachineModel.From"/>), which is made only from a design that passes these rules.
/// Physics-level questions (does the winding fit, is the web printable) are the checker's.
/// </summary>
internal static class DesignRules
{
    private static string F(double v) => KeySpec.Format(Math.Round(v, 3));

    /// <summary>What the magnet-pocket rules read besides the keys their messages name.</summary>
    private static readonly string[] PocketReads = ["magnets", "machine.poles", "rotor.pocket_clearance", "rotor.outer_diameter", "rotor.bore"];

    /// <summary>What the bolt-circle rules read besides the keys their messages name.</summary>
    private static readonly string[] BoltReads = ["rotor.bolt_circle", "rotor.outer_diameter", "rotor.bore", "rotor.pocket_clearance", "magnets"];

    /// <summary>A dotted key path in a message ("machine.max_rpm").</summary>
    private static readonly System.Text.RegularExpressions.Regex KeyPathText = new(@"\b[a-z][a-z0-9_]*(?:\.[a-z][a-z0-9_]*)+\b", System.Text.RegularExpressions.RegexOptions.CultureInvariant);

    /// <summary>
    /// Runs every rule. A rule's error is added unless the rule reads a key that failed to map (its own key, the
    /// keys its message names and <paramref name="ctx"/>'s extra reads): there the image holds a default, not what
    /// the user wrote, so that rule waits for the key to be fixed while every other rule reports in the same run.
    /// </summary>
    public static void Apply(Model.Design d, MapContext ctx)
    {
        void Add(DesignError e, params string[] reads)
        {
            if (ctx.Failed.Count > 0)
            {
                var paths = reads.Append(e.KeyPath).Concat(new[] { e.Message, e.Allowed, e.Suggestion }
                    .Where(t => t != null).SelectMany(t => KeyPathText.Matches(t!).Select(mt => mt.Value)));
                if (ctx.TouchesFailed(paths)) return;
                // A section the file does not have at all (a fragment, or a file still being written) is judged
                // once the keys that are there map: its "is missing" lines would bury the mistakes on the page.
                string top = e.KeyPath.Contains('.') ? e.KeyPath[..e.KeyPath.IndexOf('.')] : e.KeyPath;
                if (!ctx.Keys.ContainsKey(top)) return;
            }
            ctx.Add(e);
        }
        var m = d.Machine;
        // Machine
        if (m.Poles % 2 != 0 && d.Magnets.Arrangement != "same")
            Add(ctx.AtKey("machine.poles", "is not allowed", m.Poles.ToString(), "an even number (magnets alternate north and south)",
                "use an even number, or magnets.arrangement: same (every magnet shows one pole to the coils, any count)"));
        if (m.Phases == 3 && m.Coils % 3 != 0)
            Add(ctx.AtKey("machine.coils", "is not allowed", m.Coils.ToString(), "a multiple of 3 for 3 phases"), "machine.phases");
        string[] conns = m.Phases == 3 ? ["star", "delta"] : ["series", "parallel"];
        if (m.Connection != null && !conns.Contains(m.Connection))
            Add(ctx.AtKey("machine.connection", $"does not fit {m.Phases} phase{(m.Phases == 1 ? "" : "s")}", m.Connection, string.Join(" or ", conns)), "machine.phases");
        if (m.RatedRpm > m.MaxRpm)
            Add(ctx.AtKey("machine.rated_rpm", $"is more than machine.max_rpm ({F(m.MaxRpm)})", F(m.RatedRpm), "at most machine.max_rpm", "raise machine.max_rpm or lower machine.rated_rpm"));

        // Magnets: the size keys of the chosen shape, and none of another shape's.
        var mg = d.Magnets;
        var kind = MagnetShapes.Find(mg.Shape);
        bool shapeOk = kind != null;
        if (kind != null)
        {
            foreach (var key in kind.Keys)
            {
                if (!ctx.Has("magnets." + key))
                {
                    shapeOk = false;
                    Add(ctx.AtKey("magnets." + key, $"is missing; {Article(mg.Shape)} {mg.Shape} magnet needs {string.Join(", ", kind.Keys)}", fallbacks: "magnets.shape"), "magnets.shape");
                }
            }
            foreach (var key in MagnetShapes.AllKeys)
            {
                if (!kind.Keys.Contains(key) && ctx.Has("magnets." + key))
                {
                    shapeOk = false;
                    string hint = key == "pitch_radius" && !kind.Keys.Contains("pitch_radius") ? $"; {mg.Shape} magnets are placed by {string.Join(" and ", kind.Keys.Where(k => k.Contains("radius")))}" : "";
                    Add(ctx.AtKey("magnets." + key, $"does not apply to {mg.Shape} magnets{hint}", suggestion: "remove it (or change magnets.shape)"), "magnets.shape");
                }
            }
            // A size key that failed to map holds no value: the shape is judged once it is fixed.
            if (ctx.TouchesFailed(kind.Keys.Select(k => "magnets." + k).Append("magnets.shape"))) shapeOk = false;
            if (shapeOk)
            {
                foreach (var pr in kind.Validate(mg))
                {
                    shapeOk = false;
                    Add(ctx.AtKey("magnets." + pr.Key, pr.Message, pr.Value, pr.Allowed), "magnets");
                }
            }
        }
        MagnetShape? shape = shapeOk ? kind!.Make(mg) : null;

        // Rotor disc
        var r = d.Rotor;
        double rim = r.OuterDiameter / 2, boreR = r.Bore / 2;
        if (r.Bore >= r.OuterDiameter)
            Add(ctx.AtKey("rotor.bore", $"is not less than rotor.outer_diameter ({F(r.OuterDiameter)})", F(r.Bore), "less than rotor.outer_diameter"));
        var layout = Layout.Parse(d.Machine.Layout);
        if (layout is { RotorBetweenStators: true } && r.PocketFloor > 0)
            Add(ctx.AtKey("rotor.pocket_floor", "is not allowed in a dual-stator layout: the rotor holds its magnets in through pockets, facing both stators",
                F(r.PocketFloor), "0", "set rotor.pocket_floor: 0"), "machine.layout");
        else if (r.PocketFloor >= r.Thickness)
            Add(ctx.AtKey("rotor.pocket_floor", $"leaves no pocket in a rotor {F(r.Thickness)} mm thick", F(r.PocketFloor), $"less than rotor.thickness ({F(r.Thickness)})"));
        if (layout is { AllowsBackIron: false } && r.BackIron != null)
            Add(ctx.AtKey("rotor.back_iron", "is not allowed in a dual-stator layout: both faces of the rotor face a stator", suggestion: "remove rotor.back_iron"), "machine.layout");

        if (shape != null && m.Poles >= 2)
        {
            var (pIn, pOut) = shape.RadialRangeMm(r.PocketClearance);
            double web = shape.WebMm(m.Poles, r.PocketClearance);
            if (pOut >= rim)
                Add(ctx.AtKey("magnets." + kind!.OuterKey, $"puts the pockets out to radius {F(pOut)} mm, through the rotor rim at {F(rim)} mm",
                    suggestion: $"make rotor.outer_diameter more than {F(2 * pOut)} or move the magnets inwards"), PocketReads);
            if (pIn <= boreR)
                Add(ctx.AtKey("magnets." + kind!.InnerKey, $"puts the pockets in to radius {F(pIn)} mm, into the bore (radius {F(boreR)} mm)",
                    suggestion: "move the magnets outwards or make rotor.bore smaller"), PocketReads);
            if (web <= 0)
                Add(ctx.AtKey("magnets." + kind!.SizeKey, $"makes neighbouring pockets overlap by {F(-web)} mm ({m.Poles} on radius {F(shape.PitchRadiusMm)} mm)",
                    suggestion: "use smaller magnets, fewer machine.poles or a larger pitch radius", fallbacks: "magnets.shape"), PocketReads);
        }
        if (r.BoltCircle is { } bc)
        {
            double rb = bc.Diameter / 2, h = bc.Hole / 2;
            if (rb + h >= rim)
                Add(ctx.AtKey("rotor.bolt_circle.diameter", $"puts the bolt holes out to radius {F(rb + h)} mm, beyond the rotor rim at {F(rim)} mm", F(bc.Diameter)), BoltReads);
            if (rb - h <= boreR)
                Add(ctx.AtKey("rotor.bolt_circle.diameter", $"puts the bolt holes in to radius {F(rb - h)} mm, into the bore (radius {F(boreR)} mm)", F(bc.Diameter),
                    suggestion: "make the bolt circle larger or rotor.bore smaller"), BoltReads);
            if (bc.Count > 1 && 2 * rb * Math.Sin(Math.PI / bc.Count) <= bc.Hole)
                Add(ctx.AtKey("rotor.bolt_circle.count", $"makes the bolt holes overlap ({bc.Count} holes of {F(bc.Hole)} mm on a {F(bc.Diameter)} mm circle)", bc.Count.ToString()), BoltReads);
            if (shape != null && shape.RadialRangeMm(r.PocketClearance) is var (p2In, p2Out) && rb + h >= p2In && rb - h <= p2Out)
                Add(ctx.AtKey("rotor.bolt_circle.diameter", $"puts the bolt holes (radius {F(rb - h)} to {F(rb + h)} mm) into the magnet pockets (radius {F(p2In)} to {F(p2Out)} mm)",
                    F(bc.Diameter), suggestion: "keep the bolt circle inside the pocket ring"), BoltReads);
        }

        // Stator ring
        var s = d.Stator;
        if (s.InnerDiameter >= s.OuterDiameter)
            Add(ctx.AtKey("stator.inner_diameter", $"is not less than stator.outer_diameter ({F(s.OuterDiameter)})", F(s.InnerDiameter), "less than stator.outer_diameter"));
        else if (s.Mount is { } mt)
        {
            double rm = mt.CircleDiameter / 2, h = mt.Hole / 2;
            if (rm + h >= s.OuterDiameter / 2 || rm - h <= s.InnerDiameter / 2)
                Add(ctx.AtKey("stator.mount.circle_diameter", $"puts the mount holes (radius {F(rm - h)} to {F(rm + h)} mm) outside the stator ring ({F(s.InnerDiameter / 2)} to {F(s.OuterDiameter / 2)} mm)", F(mt.CircleDiameter)), "stator");
            if (mt.Count > 1 && 2 * rm * Math.Sin(Math.PI / mt.Count) <= mt.Hole)
                Add(ctx.AtKey("stator.mount.count", $"makes the mount holes overlap ({mt.Count} holes of {F(mt.Hole)} mm on a {F(mt.CircleDiameter)} mm circle)", mt.Count.ToString()), "stator");
        }

        // Coils
        var c = d.Coils;
        bool awg = ctx.Has("coils.wire.awg"), dia = ctx.Has("coils.wire.diameter");
        if (awg && dia)
            Add(ctx.AtKey("coils.wire.diameter", "is given together with coils.wire.awg; give one of them", suggestion: "remove one"));
        else if (!awg && !dia)
            Add(ctx.AtKey("coils.wire", "is missing; give the wire as { awg: 28 } or { diameter: 0.32 } (bare copper, mm)", fallbacks: "coils"));
        bool turns = ctx.Has("coils.turns"), target = ctx.Has("coils.target_emf");
        if (turns && target)
            Add(ctx.AtKey("coils.target_emf", "is given together with coils.turns; give one (target_emf solves the turns)", suggestion: "remove one"));
        else if (!turns && !target)
            Add(ctx.AtKey("coils.turns", "is missing; give coils.turns, or coils.target_emf to have the turns solved", fallbacks: "coils"));
        if (c.Shape == "round")
        {
            if (!ctx.Has("coils.core.diameter"))
                Add(ctx.AtKey("coils.core.diameter", "is missing; a round coil needs the diameter of its hole", fallbacks: ["coils.core", "coils.shape"]), "coils.shape");
            if (ctx.Has("coils.core.width"))
                Add(ctx.AtKey("coils.core.width", "does not apply to round coils (use coils.core.diameter)"), "coils.shape");
        }
        else
        {
            if (!ctx.Has("coils.core.width"))
                Add(ctx.AtKey("coils.core.width", "is missing; a keystone coil needs the width of its inner window", fallbacks: ["coils.core", "coils.shape"]), "coils.shape");
            if (ctx.Has("coils.core.diameter"))
                Add(ctx.AtKey("coils.core.diameter", "does not apply to keystone coils (use coils.core.width)"), "coils.shape");
        }
        // Sensor
        var sn = d.Sensor;
        if (sn.Kind != "none" && sn.Count == 3 && m.Phases != 3)
            Add(ctx.AtKey("sensor.count", "is not allowed with 1 phase: 3 sensors time 3 phases", "3", "1 (or sensor.kind: none)", fallbacks: "sensor.kind"), "sensor.kind", "machine.phases");

        double op = sn.Operate ?? Machines.SensorSpec.DefaultOperateMt(sn.Kind == "reed" ? Machines.SensorKind.Reed : Machines.SensorKind.Hall);
        double rel = sn.Release ?? Machines.SensorSpec.DefaultReleaseMt(sn.Kind == "reed" ? Machines.SensorKind.Reed : Machines.SensorKind.Hall);
        if (sn.Kind != "none" && !(rel < op))
            Add(ctx.AtKey(ctx.Has("sensor.release") ? "sensor.release" : "sensor.operate", $"leaves no hysteresis: sensor.release ({F(rel)} mT) must be below sensor.operate ({F(op)} mT)",
                F(ctx.Has("sensor.release") ? rel : op), "release below operate", "lower sensor.release", "sensor"));
        if (sn.Kind == "reed" && (op <= 0 || rel < 0))
            Add(ctx.AtKey(op <= 0 ? "sensor.operate" : "sensor.release", "must not be negative for a reed: a reed switch closes on the size of the field, either pole", F(op <= 0 ? op : rel), "more than 0 (operate), 0 or more (release)", fallbacks: "sensor"));

        // Drive: switching that fits the phases and the sensor.
        var dv = d.Drive;
        string switching = dv.Switching ?? (m.Phases == 3 ? "six-step" : "unipolar");
        bool driven = m.Role != "generator" && sn.Kind != "none"; // a drive switched by its own sensor
        if (driven && switching == "six-step" && m.Phases != 3)
            Add(ctx.AtKey("drive.switching", "needs 3 phases", "six-step", "unipolar or bipolar for 1 phase", "set drive.switching: unipolar or bipolar (or machine.phases: 3)"));
        if (driven && switching != "six-step" && m.Phases == 3 && ctx.Has("drive.switching"))
            Add(ctx.AtKey("drive.switching", "does not fit 3 phases", switching, "six-step for 3 phases", "set drive.switching: six-step"));
        if (driven && switching == "six-step" && sn.Kind != "hall")
            Add(ctx.AtKey("sensor.kind", "cannot time a six-step drive: it needs three Hall sensors", sn.Kind, "hall", "set sensor.kind: hall", "drive.switching"));
        if (driven && switching == "six-step" && dv.Freewheel == "none")
            Add(ctx.AtKey("drive.freewheel", "cannot be none with six-step: the bridge's diodes carry the commutating current", "none", "diode", "set drive.freewheel: diode"));
        if (driven && switching == "bipolar" && sn.Kind != "hall")
            Add(ctx.AtKey("drive.switching", $"needs a sensor that tells the poles apart; a {sn.Kind} sensor does not", "bipolar", "unipolar with this sensor, or sensor.kind: hall", "set sensor.kind: hall (a latch: sensor.operate 3, sensor.release -3) or drive.switching: unipolar", "sensor.kind"));

        // Storage and load.
        var st = d.Storage;
        if (st.Kind == "capacitor")
        {
            if (st.Capacitance is null) Add(ctx.AtKey("storage.capacitance", "is missing; a capacitor store needs its capacitance (F)", fallbacks: "storage"));
            if (st.RatedVoltage is null) Add(ctx.AtKey("storage.rated_voltage", "is missing; a capacitor store needs its rated voltage (V)", fallbacks: "storage"));
            else if (st.StartVoltage > st.RatedVoltage)
                Add(ctx.AtKey("storage.start_voltage", $"is above storage.rated_voltage ({F(st.RatedVoltage.Value)})", F(st.StartVoltage), $"at most {F(st.RatedVoltage.Value)}", $"lower storage.start_voltage to {F(st.RatedVoltage.Value)} or less"));
        }
        if (st.Kind == "battery" && st.Voltage is null)
            Add(ctx.AtKey("storage.voltage", "is missing; a battery store needs its open-circuit voltage (V)", fallbacks: "storage"));
        foreach (var (key, storeKind) in new[] { ("storage.capacitance", "capacitor"), ("storage.rated_voltage", "capacitor"), ("storage.start_voltage", "capacitor"), ("storage.esr", "capacitor"), ("storage.voltage", "battery"), ("storage.internal_resistance", "battery") })
            if (ctx.Has(key) && st.Kind != storeKind)
                Add(ctx.AtKey(key, $"applies to a {storeKind} store only (storage.kind is {st.Kind})", suggestion: $"remove it or set storage.kind: {storeKind}", fallbacks: "storage.kind"));
        string rect = d.Load.Rectifier ?? (st.Kind == "none" ? "none" : "bridge");
        if (rect != "none" && st.Kind == "none")
            Add(ctx.AtKey("load.rectifier", "needs a store to charge (storage.kind is none)", rect, "none without a store", "set storage.kind: capacitor or battery, or load.rectifier: none"));
        if (rect == "none" && st.Kind != "none" && m.Role != "motor")
            Add(ctx.AtKey("load.rectifier", "cannot be none when a generator charges a store: AC does not charge it", "none", "half-wave or bridge", "set load.rectifier: bridge"));

        // Printer and cutter: one nozzle and one kerf; sheets that go on the bed; spacing that clears the kerf.
        if (d.Printer.Nozzle is { } pn && ctx.Has("process.nozzle") && pn != d.Process.Nozzle)
            Add(ctx.AtKey("printer.nozzle", $"differs from process.nozzle ({F(d.Process.Nozzle)})", F(pn), "the same nozzle in both, or only one of them", "remove one of the two keys"), "printer.nozzle", "process.nozzle", "cutter.kerf", "process.kerf");
        if (d.Cutter.Kerf is { } ck && ctx.Has("process.kerf") && ck != d.Process.Kerf)
            Add(ctx.AtKey("cutter.kerf", $"differs from process.kerf ({F(d.Process.Kerf)})", F(ck), "the same kerf in both, or only one of them", "remove one of the two keys"), "printer.nozzle", "process.nozzle", "cutter.kerf", "process.kerf");
        var cu = d.Cutter;
        double kerf = cu.Kerf ?? d.Process.Kerf;
        if (cu.Spacing < kerf)
            Add(ctx.AtKey("cutter.spacing", $"is less than the kerf ({F(kerf)})", F(cu.Spacing), $"at least {F(kerf)}", $"set cutter.spacing to {F(kerf)} or more"), "cutter", "process.kerf");
        if (cu.Sheets != null && ctx.Has("cutter.sheets"))
        {
            foreach (var sh in Machines.CutterSpec.ParseSheets(cu.Sheets, cu.BedX, cu.BedY))
            {
                string size = $"{F(sh.WidthMm)}x{F(sh.HeightMm)}";
                bool fits = (sh.WidthMm <= cu.BedX && sh.HeightMm <= cu.BedY) || (sh.HeightMm <= cu.BedX && sh.WidthMm <= cu.BedY);
                if (!(sh.WidthMm > 0 && sh.HeightMm > 0))
                    Add(ctx.AtKey("cutter.sheets", "has a sheet of zero size", size, "a width and a height above 0 mm"), "cutter");
                else if (!fits)
                    Add(ctx.AtKey("cutter.sheets", $"has a sheet larger than the cutter's bed ({F(cu.BedX)}x{F(cu.BedY)})", size, "sheets no larger than cutter.bed_x x cutter.bed_y", "cut the sheet down or raise cutter.bed_x / cutter.bed_y", "cutter.bed_x"), "cutter");
                if (sh.Count == 0)
                    Add(ctx.AtKey("cutter.sheets", "has a sheet size with a count of 0", size + ":0", "a count of at least 1, or no count (as many as needed)"), "cutter");
            }
        }
    }

    private static string Article(string word) => word.Length > 0 && "aeiou".Contains(word[0]) ? "an" : "a";
}
