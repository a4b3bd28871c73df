using PartForge.Checks.Inputs;
using PartForge.Design.Model;
using PartForge.Electrical;
using PartForge.Electrical.Coils;
using PartForge.Geometry;
using PartForge.Parts;

namespace PartForge.Checks.Tests;

/// <summary>
/// A small invented test machine, described by plain numbers that a test changes one at a time, turned into a
/// design (object initialisers) and the electrical facts the checker takes. The coil build uses the winding
/// rule of the contract (build = N pi d^2 / (4 fill height)).
/// </summary>
public sealed class TestMachine
{
    public string Layout = "single-rotor";
    public int Poles = 12, Coils = 9;
    public double MaxRpm = 1200;
    public double MagnetD = 12, MagnetT = 4, MagnetPitch = 40;
    public double RotorOd = 110, RotorT = 7, Bore = 8, PocketClearance = 0.15, PocketFloor = 1.2;
    public double BoltCircleD = 24, BoltHole = 3.4; public int BoltCount = 4;
    public string RotorMaterial = "PLA", StatorMaterial = "PLA", FormerMaterial = "PLA";
    public int Turns = 120;
    public double WireBare = 0.321, WireOverall = 0.357, Fill = 0.45, CoilHeight = 5, Core = 8, MaxTemp = 40;
    public double Flange = 0.8, Margin = 1.0;
    public double StatorId = 30, StatorOd = 130, StatorT = 6.6;
    public double AirGap = 1.0, MinGap = 0.3;
    public double PrintXy = 0.1, PrintZ = 0.1, Runout = 0.1, AxialPlay = 0.05;
    public double Nozzle = 0.4, Layer = 0.2; public int WallLines = 2;
    public double PullN = 20, CurrentDensity = 3;
    public string SensorKind = "hall"; public int SensorCount = 3; public double SensorLength = 4, SensorWidth = 3;
    public double MountCircleD = 122, MountHole = 4.5; public int MountCount = 4;
    public double BedX = 220, BedY = 220, BedZ = 250, CutSpacing = 2; public string? Sheets;

    public double BuildMm => Turns * Math.PI * WireBare * WireBare / 4 / (Fill * CoilHeight);

    public Design.Model.Design ToDesign() => new()
    {
        Name = "test-machine",
        Machine = new Machine { Layout = Layout, Poles = Poles, Coils = Coils, Phases = 3, MaxRpm = MaxRpm, RatedRpm = Math.Min(400, MaxRpm) },
        Magnets = new Magnets { Shape = "disc", Diameter = MagnetD, Thickness = MagnetT, PitchRadius = MagnetPitch },
        Rotor = new Rotor
        {
            OuterDiameter = RotorOd, Thickness = RotorT, Bore = Bore, PocketClearance = PocketClearance, PocketFloor = PocketFloor,
            BoltCircle = BoltCount > 0 ? new BoltCircle { Diameter = BoltCircleD, Count = BoltCount, Hole = BoltHole } : null, Material = RotorMaterial,
        },
        Coils = new Design.Model.Coils
        {
            Wire = new Wire { Diameter = WireBare }, Turns = Turns, FillFactor = Fill, Height = CoilHeight,
            Core = new Core { Diameter = Core }, MaxTemperature = MaxTemp, PitchRadius = MagnetPitch,
        },
        Former = new Former { Flange = Flange, Margin = Margin },
        Stator = new Stator
        {
            InnerDiameter = StatorId, OuterDiameter = StatorOd, Thickness = StatorT, Material = StatorMaterial,
            Mount = MountCount > 0 ? new Mount { CircleDiameter = MountCircleD, Count = MountCount, Hole = MountHole } : null,
        },
        Sensor = new Sensor { Kind = SensorKind, Count = SensorCount, Body = new SensorBody { Length = SensorLength, Width = SensorWidth, Height = 1.6 } },
        Gap = new Gap { AirGap = AirGap, MinRunningGap = MinGap },
        Tolerances = new Tolerances { PrintXy = PrintXy, PrintZ = PrintZ, Runout = Runout, AxialPlay = AxialPlay },
        Process = new Process { Nozzle = Nozzle, Layer = Layer, MinWallLines = WallLines },
        Printer = new Printer { BedX = BedX, BedY = BedY, BedZ = BedZ },
        Cutter = new Cutter { Spacing = CutSpacing, Sheets = Sheets },
        Parts = new PartOverrides { Former = new PartOverride { Material = FormerMaterial } },
    };

    public ElectricalFacts ToFacts()
    {
        var rotors = Layout == "dual-rotor" ? new[] { PartForge.Design.Parts.PartId.RotorFront, PartForge.Design.Parts.PartId.RotorBack } : new[] { PartForge.Design.Parts.PartId.Rotor };
        return new ElectricalFacts
        {
            Turns = Turns, WireBareMm = WireBare, WireOverallMm = WireOverall,
            Outline = CoilOutline.Round(MagnetPitch, CoilHeight, Core, BuildMm),
            CurrentDensityAPerMm2 = CurrentDensity, OperatingPoint = "test operating point",
            PullOnRotorN = rotors.ToDictionary(r => r, _ => PullN),
        };
    }

    public CheckReport Check(IReadOnlyList<PartView>? parts = null) =>
        CheckRunner.Run(PartForge.Design.Machines.MachineModel.From(ToDesign()), ToFacts(), parts ?? Array.Empty<PartView>());

    /// <summary>The real part builders' parts for this machine (sized from the real electrical engine's coil).</summary>
    public PartSet Parts()
    {
        var d = ToDesign();
        return PartsBuilder.Build(PartForge.Design.Machines.MachineModel.From(d), ElectricalEngine.Evaluate(PartForge.Design.Machines.MachineModel.From(d)), Precision.FromChordalTolerance(d.Mesh.ChordalTolerance));
    }

    /// <summary>Every check with the real parts (printability and fit included) and this machine's electrical facts.</summary>
    public CheckReport CheckWithParts() => Check(CheckRunner.ViewsFrom(Parts()));

    public TestMachine With(Action<TestMachine> change)
    {
        var m = (TestMachine)MemberwiseClone();
        change(m);
        return m;
    }
}
