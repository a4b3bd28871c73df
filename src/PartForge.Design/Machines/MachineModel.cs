using PartForge.Design.Machines.Magnets;
using PartForge.Design.Materials;
using PartForge.Design.Parts;
using PartForge.Design.Stack;
using PartForge.Geometry;

namespace PartForge.Design.Machines;

/// <summary>
/// The machine a design describes, resolved once by the loader into typed, immutable values: the layout, the
/// magnet shape, the part roles and materials, every default filled, and the axial stack computed. Every stage
/// after the loader reads only this model (never the design file's strings). Made by <see cref="From"/> from a
/// validated design; there is no other way to make one, so a model is always consistent with its stack.
/// </summary>
public sealed class MachineModel
{
    private MachineModel() { }

    /// <summary>The design's name (output file names).</summary>
    public required string Name { get; init; }

    public required Layout Layout { get; init; }

    /// <summary>Magnets per rotor face.</summary>
    public required int Poles { get; init; }

    /// <summary>Coils per stator.</summary>
    public required int CoilsPerStator { get; init; }

    /// <summary>1 or 3.</summary>
    public required int Phases { get; init; }

    public required Connection Connection { get; init; }

    /// <summary>What the machine is for (<c>machine.role</c>, default generator; never inferred from the sensor).</summary>
    public required MachineRole Role { get; init; }

    /// <summary>True when the motor operating point and motor checks apply (motor or motor-generator).</summary>
    public bool RunsAsMotor => Role != MachineRole.Generator;

    /// <summary>True when the generator operating point and generator checks apply (generator or motor-generator).</summary>
    public bool RunsAsGenerator => Role != MachineRole.Motor;
    public required double RatedRpm { get; init; }
    public required double MaxRpm { get; init; }

    public required MagnetSet Magnets { get; init; }
    public required RotorSpec Rotor { get; init; }
    public required CoilSet Coils { get; init; }
    public required FormerSpec Former { get; init; }
    public required StatorSpec Stator { get; init; }
    public required SensorSpec Sensor { get; init; }
    public required GapSpec Gap { get; init; }
    public required ToleranceSpec Tolerances { get; init; }
    public required ProcessSpec Process { get; init; }
    public required OperationSpec Operation { get; init; }

    /// <summary>The motor drive (<c>drive.*</c>).</summary>
    public required DriveSpec Drive { get; init; }

    /// <summary>The energy store (<c>storage.*</c>).</summary>
    public required StorageSpec Storage { get; init; }

    /// <summary>The generator's rectifier (<c>load.*</c>).</summary>
    public required LoadSpec Load { get; init; }

    /// <summary>Extra inertia and drag (<c>mechanics.*</c>).</summary>
    public required MechanicsSpec Mechanics { get; init; }

    /// <summary>The printer the printed parts are laid out for (<c>printer.*</c>).</summary>
    public required PrinterSpec Printer { get; init; }

    /// <summary>The cutter and sheets the cut parts are nested on (<c>cutter.*</c>).</summary>
    public required CutterSpec Cutter { get; init; }

    /// <summary>Largest distance between a true arc and its facets, mm (<c>mesh.chordal_tolerance</c>).</summary>
    public required double ChordalToleranceMm { get; init; }

    /// <summary>Axial distance added between neighbouring parts in the exploded assembly, mm.</summary>
    public required double ExplodeMm { get; init; }

    /// <summary>The process and material asked for each part role.</summary>
    public required PartPlan Parts { get; init; }

    /// <summary>The nominal axial stack of every face, computed once.</summary>
    public required AxialStack Stack { get; init; }

    /// <summary>The grid and chordal tolerance every part is made on.</summary>
    public Precision Precision => Precision.FromChordalTolerance(ChordalToleranceMm);

    /// <summary>Pole pairs p (alternating magnets; with same-pole magnets the field periods are <see cref="FieldPeriods"/>).</summary>
    public int PolePairs => Poles / 2;

    /// <summary>Periods of the rotor field in one revolution: poles / 2 with alternating magnets, poles with same-pole
    /// magnets. One electrical period is 360 / FieldPeriods mechanical degrees.</summary>
    public int FieldPeriods => Magnets.Arrangement == MagnetArrangement.Same ? Poles : Poles / 2;

    /// <summary>The pole count of the alternating machine with the same electrical period (2 x FieldPeriods): what
    /// the winding and sensor planning read.</summary>
    public int ElectricalPoles => 2 * FieldPeriods;

    /// <summary>Coils in the whole machine (every stator).</summary>
    public int CoilsInMachine => CoilsPerStator * Layout.Stators.Count;

    /// <summary>The rotor's pockets go through it (dual-stator, or <c>rotor.pocket_floor: 0</c>).</summary>
    public bool ThroughPockets => Layout.RotorBetweenStators || !(Rotor.PocketFloorMm > 0);

    /// <summary>
    /// The model of a design the loader has validated (every cross-key rule passed). Throws
    /// <see cref="ArgumentException"/> for a design that breaks them: that is a caller's bug, since the loader
    /// refuses such a design with located errors first.
    /// </summary>
    public static MachineModel From(Model.Design d)
    {
        ArgumentNullException.ThrowIfNull(d);
        var layout = Layout.Parse(d.Machine.Layout) ?? throw Bad("machine.layout", d.Machine.Layout);
        var kind = MagnetShapes.Find(d.Magnets.Shape) ?? throw Bad("magnets.shape", d.Magnets.Shape);
        if (kind.Validate(d.Magnets) is { Count: > 0 } problems)
            throw new ArgumentException($"magnets.{problems[0].Key} {problems[0].Message}", nameof(d));
        var shape = kind.Make(d.Magnets);
        double br = d.Magnets.Br ?? MagnetGrades.MidRangeBrTesla(d.Magnets.Grade) ?? throw Bad("magnets.grade", d.Magnets.Grade);
        var arrangement = d.Magnets.Arrangement switch
        {
            "alternating" => MagnetArrangement.Alternating,
            "same" => MagnetArrangement.Same,
            var o => throw Bad("magnets.arrangement", o),
        };
        var magnets = new MagnetSet(shape, d.Magnets.Grade, br, d.Magnets.Br is not null) { Arrangement = arrangement };
        var machineRole = d.Machine.Role switch
        {
            "generator" => MachineRole.Generator,
            "motor" => MachineRole.Motor,
            "motor-generator" => MachineRole.MotorGenerator,
            var o => throw Bad("machine.role", o),
        };

        int phases = d.Machine.Phases;
        var connection = d.Machine.Connection switch
        {
            null => phases == 3 ? Connection.Star : Connection.Series,
            "star" => Connection.Star,
            "delta" => Connection.Delta,
            "series" => Connection.Series,
            "parallel" => Connection.Parallel,
            var other => throw Bad("machine.connection", other),
        };

        var r = d.Rotor;
        var rotor = new RotorSpec(r.OuterDiameter, r.Thickness, r.Bore, r.PocketClearance, r.PocketFloor,
            r.BoltCircle is { } bc ? new BoltPattern(bc.Diameter, bc.Count, bc.Hole) : null,
            r.BackIron?.Thickness, MaterialOf(r.Material, "rotor.material"), r.Marks != "none", r.Index != "none");

        var c = d.Coils;
        var coilShape = c.Shape switch { "round" => CoilShape.Round, "keystone" => CoilShape.Keystone, var o => throw Bad("coils.shape", o) };
        int enamel = c.Enamel switch { "grade-1" => 1, "grade-2" => 2, "grade-3" => 3, var o => throw Bad("coils.enamel", o) };
        var coils = new CoilSet(coilShape, new WireSize(c.Wire.Awg, c.Wire.Awg is null ? c.Wire.Diameter : null), enamel, c.Turns,
            c.TargetEmf is { } t && c.Turns is null ? new EmfTarget(t.Rms, t.Rpm) : null, c.FillFactor, c.Height,
            c.PitchRadius ?? shape.PitchRadiusMm, c.Core.Diameter, c.Core.Width, c.MaxTemperature);

        var former = new FormerSpec(d.Former.Flange, d.Former.Margin);
        var s = d.Stator;
        var stator = new StatorSpec(s.InnerDiameter, s.OuterDiameter, s.Thickness,
            s.Mount is { } mt ? new BoltPattern(mt.CircleDiameter, mt.Count, mt.Hole) : null, MaterialOf(s.Material, "stator.material"));

        var sn = d.Sensor;
        var sensorKind = sn.Kind switch { "none" => SensorKind.None, "hall" => SensorKind.Hall, "reed" => SensorKind.Reed, var o => throw Bad("sensor.kind", o) };
        var sensor = new SensorSpec(sensorKind, sn.Count ?? (phases == 3 ? 3 : 1), sn.AdvanceElec, new SensorBody(sn.Body.Length, sn.Body.Width, sn.Body.Height))
        {
            OperateTesla = (sn.Operate ?? SensorSpec.DefaultOperateMt(sensorKind)) / 1000,
            ReleaseTesla = (sn.Release ?? SensorSpec.DefaultReleaseMt(sensorKind)) / 1000,
        };
        var dv = d.Drive;
        bool reed = sensorKind == SensorKind.Reed;
        var drive = new DriveSpec(
            dv.Switching switch
            {
                null => phases == 3 ? SwitchingKind.SixStep : SwitchingKind.Unipolar,
                "unipolar" => SwitchingKind.Unipolar,
                "bipolar" => SwitchingKind.Bipolar,
                "six-step" => SwitchingKind.SixStep,
                var o => throw Bad("drive.switching", o),
            },
            dv.Freewheel switch { "diode" => true, "none" => false, var o => throw Bad("drive.freewheel", o) },
            DiodeOf(dv.Diode, "drive.diode"),
            dv.SwitchCurrentRating ?? (reed ? 0.5 : 1.0),
            dv.SwitchVoltageRating ?? (reed ? 200 : 40),
            reed ? dv.SwitchPowerRating ?? 10 : null);
        var st = d.Storage;
        StorageSpec storage = st.Kind switch
        {
            "none" => StorageSpec.None,
            "capacitor" => new CapacitorStorage(st.Capacitance ?? throw Bad("storage.capacitance", null), st.RatedVoltage ?? throw Bad("storage.rated_voltage", null), st.Esr, st.StartVoltage),
            "battery" => new BatteryStorage(st.Voltage ?? throw Bad("storage.voltage", null), st.InternalResistance),
            var o => throw Bad("storage.kind", o),
        };
        var load = new LoadSpec(d.Load.Rectifier switch
        {
            null => storage is NoStorage ? RectifierKind.None : RectifierKind.Bridge,
            "none" => RectifierKind.None,
            "half-wave" => RectifierKind.HalfWave,
            "bridge" => RectifierKind.Bridge,
            var o => throw Bad("load.rectifier", o),
        }, DiodeOf(d.Load.Diode, "load.diode"));
        var mech = new MechanicsSpec(d.Mechanics.ExtraInertia, d.Mechanics.FrictionTorque, d.Mechanics.ViscousDrag);

        var gap = new GapSpec(d.Gap.AirGap, d.Gap.MinRunningGap);
        var tol = new ToleranceSpec(d.Tolerances.PrintXy, d.Tolerances.PrintZ, d.Tolerances.Runout, d.Tolerances.AxialPlay);
        var p = d.Process;
        double nozzle = d.Printer.Nozzle ?? p.Nozzle, kerf = d.Cutter.Kerf ?? p.Kerf;
        var printer = new PrinterSpec(d.Printer.BedX, d.Printer.BedY, d.Printer.BedZ, nozzle, d.Printer.Spacing);
        var cutter = new CutterSpec(d.Cutter.BedX, d.Cutter.BedY, kerf, d.Cutter.Spacing, CutterSpec.ParseSheets(d.Cutter.Sheets, d.Cutter.BedX, d.Cutter.BedY));
        var process = new ProcessSpec(nozzle, p.Layer, p.MinWallLines, kerf,
            p.DxfContours switch { "polyline" => CutContourStyle.Polyline, "entities" => CutContourStyle.Entities, var o => throw Bad("process.dxf_contours", o) });
        var op = d.Operation;
        var operation = new OperationSpec(op.LoadResistance, op.SupplyVoltage, op.SwitchDrop, op.LeadAllowance) { AmbientC = op.AmbientTemperature };

        var plan = new Dictionary<PartRole, PartChoice>();
        foreach (var role in Enum.GetValues<PartRole>())
        {
            var over = OverrideOf(d.Parts, role);
            string? section = role switch { PartRole.Rotor => r.Material, PartRole.Stator => s.Material, _ => null };
            string material = over?.Material ?? section ?? PartRoleFacts.Of(role).DefaultMaterial;
            PartProcess? asked = over?.Process switch
            {
                null => null,
                "print" => PartProcess.Print,
                "cut" => PartProcess.Cut,
                var o => throw Bad($"parts.{PartRoleFacts.Of(role).OverrideKey}.process", o),
            };
            plan[role] = new PartChoice(asked, MaterialOf(material, $"parts.{PartRoleFacts.Of(role).OverrideKey}.material"));
        }

        return new MachineModel
        {
            Name = d.Name,
            Layout = layout,
            Poles = d.Machine.Poles,
            CoilsPerStator = d.Machine.Coils,
            Phases = phases,
            Connection = connection,
            Role = machineRole,
            RatedRpm = d.Machine.RatedRpm,
            MaxRpm = d.Machine.MaxRpm,
            Magnets = magnets,
            Rotor = rotor,
            Coils = coils,
            Former = former,
            Stator = stator,
            Sensor = sensor,
            Gap = gap,
            Tolerances = tol,
            Process = process,
            Operation = operation,
            Drive = drive,
            Storage = storage,
            Load = load,
            Mechanics = mech,
            Printer = printer,
            Cutter = cutter,
            ChordalToleranceMm = d.Mesh.ChordalTolerance,
            ExplodeMm = d.Assembly.Explode,
            Parts = new PartPlan(plan),
            Stack = AxialStack.Of(layout, rotor, shape.ThicknessMm, coils, former, stator, gap),
        };
    }

    private static Model.PartOverride? OverrideOf(Model.PartOverrides o, PartRole role) => role switch
    {
        PartRole.Rotor => o.Rotor,
        PartRole.BackIron => o.BackIron,
        PartRole.Former => o.Former,
        PartRole.Stator => o.Stator,
        _ => o.Spacer,
    };

    private static DiodeKind DiodeOf(string word, string key) => word switch
    {
        "silicon" => DiodeKind.Silicon,
        "schottky" => DiodeKind.Schottky,
        var o => throw Bad(key, o),
    };

    private static Material MaterialOf(string name, string key) => MaterialTable.Find(name) ?? throw Bad(key, name);

    private static ArgumentException Bad(string key, string? value) =>
        new($"{key}: '{value}' is not a value the loader accepts; load designs through DesignLoader", "d");
}
