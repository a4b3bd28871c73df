using PartForge.Design.Model;
using PartForge.Electrical.Coils;
using PartForge.Geometry;
using D = PartForge.Design.Model;

namespace PartForge.Parts.Tests;

/// <summary>Designs for the tests, built with object initialisers (invented numbers, not presets).</summary>
internal static class TestDesigns
{
    public const double Tol = 0.01;

    /// <summary>A single-rotor machine: 12 disc magnets D12 x 4 on r 40, 9 round coils, blind pockets, 3 hall sensors.</summary>
    public static D.Design SingleRotor(string sensorKind = "hall") => new()
    {
        Name = "test-single",
        Machine = new Machine { Layout = "single-rotor", Poles = 12, Coils = 9, Phases = 3 },
        Magnets = new Magnets { Shape = "disc", Diameter = 12, Thickness = 4, PitchRadius = 40 },
        Rotor = new D.Rotor
        {
            OuterDiameter = 110, Thickness = 7, Bore = 8, PocketClearance = 0.15, PocketFloor = 1.2,
            BoltCircle = new BoltCircle { Diameter = 24, Count = 4, Hole = 3.4 },
        },
        Coils = new Coils { Shape = "round", Turns = 120, Wire = new Wire { Awg = 28 }, Height = 5, PitchRadius = 40, Core = new Core { Diameter = 8 } },
        Former = new Former { Flange = 0.8, Margin = 1.0 },
        Stator = new D.Stator { InnerDiameter = 30, OuterDiameter = 130, Thickness = 6, Mount = new Mount { CircleDiameter = 122, Count = 4, Hole = 4.5 } },
        Sensor = new Sensor { Kind = sensorKind, Count = 3 },
        Mesh = new MeshSettings { ChordalTolerance = Tol },
    };

    /// <summary>A dual-rotor machine with back iron and block magnets 20 x 10 on r 60, 12 coils.</summary>
    public static D.Design DualRotor() => new()
    {
        Name = "test-dual-rotor",
        Machine = new Machine { Layout = "dual-rotor", Poles = 16, Coils = 12, Phases = 3 },
        Magnets = new Magnets { Shape = "block", Length = 20, Width = 10, Thickness = 5, PitchRadius = 60 },
        Rotor = new D.Rotor
        {
            OuterDiameter = 150, Thickness = 8, Bore = 10, PocketClearance = 0.2, PocketFloor = 1.5,
            BoltCircle = new BoltCircle { Diameter = 30, Count = 6, Hole = 4.5 },
            BackIron = new BackIron { Thickness = 2 },
        },
        Coils = new Coils { Shape = "round", Turns = 80, Wire = new Wire { Awg = 24 }, Height = 6, PitchRadius = 60, Core = new Core { Diameter = 10 } },
        Former = new Former { Flange = 1.0, Margin = 1.2 },
        Stator = new D.Stator { InnerDiameter = 60, OuterDiameter = 170, Thickness = 8, Mount = new Mount { CircleDiameter = 160, Count = 6, Hole = 4.5 } },
        Sensor = new Sensor { Kind = "hall", Count = 3 },
        Mesh = new MeshSettings { ChordalTolerance = Tol },
    };

    /// <summary>A dual-stator pulse machine: arc magnets, 8 poles, 4 coils, one rotor with through pockets.</summary>
    public static D.Design DualStator() => new()
    {
        Name = "test-dual-stator",
        Machine = new Machine { Layout = "dual-stator", Poles = 8, Coils = 4, Phases = 1, Connection = "series" },
        Magnets = new Magnets { Shape = "arc", InnerRadius = 30, OuterRadius = 45, Span = 30, Thickness = 6 },
        Rotor = new D.Rotor
        {
            OuterDiameter = 104, Thickness = 6, Bore = 8, PocketClearance = 0.2, PocketFloor = 0,
            BoltCircle = new BoltCircle { Diameter = 20, Count = 3, Hole = 3.4 },
        },
        Coils = new Coils { Shape = "round", Turns = 200, Wire = new Wire { Awg = 30 }, Height = 5, PitchRadius = 37.5, Core = new Core { Diameter = 6 } },
        Former = new Former { Flange = 0.8, Margin = 1.0 },
        Stator = new D.Stator { InnerDiameter = 20, OuterDiameter = 130, Thickness = 5, Mount = new Mount { CircleDiameter = 120, Count = 4, Hole = 4.5 } },
        Sensor = new Sensor { Kind = "hall", Count = 1 },
        Mesh = new MeshSettings { ChordalTolerance = Tol },
    };

    /// <summary>A round coil of the given radial build from the electrical engine's outline API, with fixed sensor angles.</summary>
    public static CoilGeometry RoundCoil(D.Design d, double buildMm, params double[] sensorAngles)
    {
        var outline = CoilOutline.Round(d.Coils.PitchRadius!.Value, d.Coils.Height, d.Coils.Core.Diameter!.Value, buildMm);
        return new CoilGeometry(outline.PitchRadiusMm, outline.Outer, outline.Window, outline.HeightMm, d.Coils.Turns ?? 100, 0.357, sensorAngles, outline.PitchRadiusMm);
    }

    public static Precision Prec(D.Design d) => Precision.FromChordalTolerance(d.Mesh.ChordalTolerance);
}
