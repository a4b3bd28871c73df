using PartForge.Design.Model;
using M = PartForge.Design.Model;
using D = PartForge.Design.Model.Design;

namespace PartForge.Electrical.Tests;

/// <summary>Invented test machines (not presets), built directly with object initialisers.</summary>
public static class TestDesigns
{
    /// <summary>Invented: a 9-coil / 12-pole dual-rotor hand-crank generator with disc magnets and round coils.</summary>
    public static D Crank() => new()
    {
        Name = "test-crank",
        Machine = new Machine { Layout = "dual-rotor", Poles = 12, Coils = 9, Phases = 3, Connection = "star", RatedRpm = 400, MaxRpm = 1200 },
        Magnets = new Magnets { Shape = "disc", Diameter = 12, Thickness = 4, Grade = "N42", PitchRadius = 40 },
        Rotor = new Rotor { OuterDiameter = 110, Thickness = 5, PocketFloor = 1.2 },
        Coils = new M.Coils { Shape = "round", Wire = new M.Wire { Awg = 28 }, Enamel = "grade-2", Turns = 120, FillFactor = 0.45, Height = 5, Core = new Core { Diameter = 8 } },
        Stator = new Stator { InnerDiameter = 30, OuterDiameter = 130, Thickness = 6 },
        Sensor = new Sensor { Kind = "hall", Count = 3, Body = new SensorBody { Length = 4, Width = 3, Height = 1.6 } },
    };

    /// <summary>Invented: the largest bench machine, 24 poles / 18 keystone coils, dual rotor, block magnets, back iron.</summary>
    public static D Large() => new()
    {
        Name = "test-large",
        Machine = new Machine { Layout = "dual-rotor", Poles = 24, Coils = 18, Phases = 3, Connection = "star", RatedRpm = 300, MaxRpm = 600 },
        Magnets = new Magnets { Shape = "block", Length = 30, Width = 12, Thickness = 6, Grade = "N45", PitchRadius = 110 },
        Rotor = new Rotor { OuterDiameter = 270, Thickness = 8, PocketFloor = 2, BackIron = new BackIron { Thickness = 3 } },
        Coils = new M.Coils { Shape = "keystone", Wire = new M.Wire { Awg = 22 }, Enamel = "grade-2", Turns = 60, FillFactor = 0.5, Height = 8, Core = new Core { Width = 10 } },
        Stator = new Stator { InnerDiameter = 150, OuterDiameter = 300, Thickness = 10 },
        Sensor = new Sensor { Kind = "hall", Count = 3, Body = new SensorBody { Length = 4, Width = 3, Height = 1.6 } },
    };

    /// <summary>Invented: a 1-phase pulse motor, 8 poles / 8 coils single rotor, disc magnets, one hall.</summary>
    public static D Pulse() => new()
    {
        Name = "test-pulse",
        Machine = new Machine { Layout = "single-rotor", Role = "motor-generator", Poles = 8, Coils = 8, Phases = 1, Connection = "series", RatedRpm = 600, MaxRpm = 1500 },
        Magnets = new Magnets { Shape = "disc", Diameter = 10, Thickness = 3, Grade = "N42", PitchRadius = 30 },
        Rotor = new Rotor { OuterDiameter = 80, Thickness = 4, PocketFloor = 1 },
        Coils = new M.Coils { Shape = "round", Wire = new M.Wire { Awg = 30 }, Turns = 200, FillFactor = 0.45, Height = 6, Core = new Core { Diameter = 6 } },
        Stator = new Stator { InnerDiameter = 20, OuterDiameter = 100, Thickness = 8 },
        Sensor = new Sensor { Kind = "hall", Count = 1, AdvanceElec = 0 },
        Operation = new M.Operation { SupplyVoltage = 12, SwitchDrop = 0.7 },
    };

    /// <summary>Invented: arc magnets, single rotor with back iron, 10 poles / 12 round coils.</summary>
    public static D Arc() => new()
    {
        Name = "test-arc",
        Machine = new Machine { Layout = "single-rotor", Poles = 10, Coils = 12, Phases = 3, Connection = "delta", RatedRpm = 500, MaxRpm = 1000 },
        Magnets = new Magnets { Shape = "arc", InnerRadius = 30, OuterRadius = 45, Span = 28, Thickness = 3, Grade = "N35" },
        Rotor = new Rotor { OuterDiameter = 100, Thickness = 4, PocketFloor = 0, BackIron = new BackIron { Thickness = 2 } },
        Coils = new M.Coils { Shape = "round", Wire = new M.Wire { Diameter = 0.3 }, Turns = 80, FillFactor = 0.4, Height = 4, Core = new Core { Diameter = 5 } },
        Stator = new Stator { InnerDiameter = 40, OuterDiameter = 110, Thickness = 6 },
        Sensor = new Sensor { Kind = "hall", Count = 3 },
    };

    /// <summary>Invented: dual-stator, 16 poles / 12 keystone coils, disc magnets.</summary>
    public static D DualStator() => new()
    {
        Name = "test-dual-stator",
        Machine = new Machine { Layout = "dual-stator", Poles = 16, Coils = 12, Phases = 3, Connection = "star", RatedRpm = 350, MaxRpm = 800 },
        Magnets = new Magnets { Shape = "disc", Diameter = 15, Thickness = 6, Grade = "N52", PitchRadius = 55 },
        Rotor = new Rotor { OuterDiameter = 140, Thickness = 6, PocketFloor = 0 },
        Coils = new M.Coils { Shape = "keystone", Wire = new M.Wire { Awg = 26 }, Turns = 70, FillFactor = 0.45, Height = 6, Core = new Core { Width = 8 } },
        Stator = new Stator { InnerDiameter = 60, OuterDiameter = 160, Thickness = 8 },
        Sensor = new Sensor { Kind = "hall", Count = 3 },
    };
}

/// <summary>Copies of the (non-record) model sections with one change, for the tests.</summary>
public static class Copy
{
    public static D With(D d, Machine? machine = null, Magnets? magnets = null, Rotor? rotor = null, M.Coils? coils = null,
        Stator? stator = null, Sensor? sensor = null, Gap? gap = null, M.Operation? operation = null, Former? former = null) => new()
    {
        Name = d.Name, Machine = machine ?? d.Machine, Magnets = magnets ?? d.Magnets, Rotor = rotor ?? d.Rotor, Coils = coils ?? d.Coils,
        Former = former ?? d.Former, Stator = stator ?? d.Stator, Sensor = sensor ?? d.Sensor, Gap = gap ?? d.Gap, Tolerances = d.Tolerances,
        Process = d.Process, Mesh = d.Mesh, Operation = operation ?? d.Operation,
    };

    public static Machine Machine(Machine m, string? layout = null, int? poles = null, int? coils = null, int? phases = null, string? connection = null, double? rated = null, double? max = null) => new()
    {
        Layout = layout ?? m.Layout, Poles = poles ?? m.Poles, Coils = coils ?? m.Coils, Phases = phases ?? m.Phases,
        Connection = connection ?? m.Connection, RatedRpm = rated ?? m.RatedRpm, MaxRpm = max ?? m.MaxRpm,
    };

    public static M.Coils Coils(M.Coils c, int? turns = null, bool clearTurns = false, TargetEmf? target = null, double? height = null, double? fill = null,
        M.Wire? wire = null, string? shape = null, Core? core = null, string? enamel = null) => new()
    {
        Shape = shape ?? c.Shape, Wire = wire ?? c.Wire, Enamel = enamel ?? c.Enamel, Turns = clearTurns ? null : turns ?? c.Turns,
        TargetEmf = target ?? c.TargetEmf, FillFactor = fill ?? c.FillFactor, Height = height ?? c.Height, PitchRadius = c.PitchRadius,
        Core = core ?? c.Core, MaxTemperature = c.MaxTemperature,
    };

    public static Rotor Rotor(Rotor r, BackIron? backIron = null, bool clearIron = false) => new()
    {
        OuterDiameter = r.OuterDiameter, Thickness = r.Thickness, Bore = r.Bore, PocketClearance = r.PocketClearance, PocketFloor = r.PocketFloor,
        BoltCircle = r.BoltCircle, BackIron = clearIron ? null : backIron ?? r.BackIron, Material = r.Material,
    };
}
