using PartForge.Design.Model;
using PartForge.Electrical;
using M = PartForge.Design.Model;

namespace PartForge.Bench;

/// <summary>
/// Full electrical evaluation (field integration, EMF, winding, sensors, operating points) of the largest
/// machine we build: an invented 24-pole / 18-coil dual-rotor generator with block magnets, keystone coils and
/// back iron. Target: under 20 ms after warm-up.
/// </summary>
public sealed class ElectricalBenchCase : IBenchCase
{
    private PartForge.Design.Machines.MachineModel _design = Largest();

    public string Name => "electrical-eval";

    public string Description => "electrical engine on 24 poles / 18 keystone coils, dual rotor, block magnets, back iron (target < 20 ms)";

    public void Setup() => _design = Largest();

    public IReadOnlyDictionary<string, double> Run()
    {
        var r = ElectricalEngine.Evaluate(_design);
        return new Dictionary<string, double>
        {
            ["line_emf_rms_v"] = r.LineEmfRmsV,
            ["flux_linkage_peak_wb"] = r.CoilFluxLinkagePeakWb,
            ["diagnostics"] = r.Diagnostics.Count,
        };
    }

    /// <summary>The invented bench machine.</summary>
    public static PartForge.Design.Machines.MachineModel Largest() => PartForge.Design.Machines.MachineModel.From(LargestDesign());

    /// <summary>The invented bench machine as a design file would give it.</summary>
    public static M.Design LargestDesign() => new()
    {
        Name = "bench-large",
        Machine = new Machine { Layout = "dual-rotor", Poles = 24, Coils = 18, Phases = 3, Connection = "star", RatedRpm = 300, MaxRpm = 600 },
        Magnets = new Magnets { Shape = "block", Length = 30, Width = 12, Thickness = 6, Grade = "N45", PitchRadius = 110 },
        Rotor = new Rotor { OuterDiameter = 270, Thickness = 8, PocketFloor = 2, BackIron = new BackIron { Thickness = 3 } },
        Coils = new M.Coils { Shape = "keystone", Wire = new M.Wire { Awg = 22 }, Enamel = "grade-2", Turns = 60, FillFactor = 0.5, Height = 8, Core = new Core { Width = 10 } },
        Stator = new Stator { InnerDiameter = 150, OuterDiameter = 300, Thickness = 10 },
        Sensor = new Sensor { Kind = "hall", Count = 3, Body = new SensorBody { Length = 4, Width = 3, Height = 1.6 } },
    };
}
