using PartForge.Checks;
using PartForge.Electrical;
using PartForge.Geometry;
using PartForge.Parts;

namespace PartForge.Bench;

/// <summary>
/// Every check on the largest machine we build (the invented 24-pole / 18-coil dual-rotor design of
/// <see cref="ElectricalBenchCase.Largest"/>), rotation sweep at 0.5 degree steps included. The electrical
/// results and the parts are made once in Setup (not timed); the timed part is CheckRunner.Run, including the
/// pull estimate it asks the field model for. Target: under 50 ms after warm-up.
/// </summary>
public sealed class ChecksAllBench : IBenchCase
{
    private PartForge.Design.Machines.MachineModel _design = ElectricalBenchCase.Largest();
    private ElectricalResult? _electrical;
    private PartSet? _parts;

    public string Name => "checks-all";

    public string Description => "all checks on 24 poles / 18 coils dual rotor, rotation sweep at 0.5 degree (target < 50 ms)";

    public void Setup()
    {
        _design = ElectricalBenchCase.Largest();
        _electrical = ElectricalEngine.Evaluate(_design);
        _parts = PartsBuilder.Build(_design, _electrical);
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        var report = CheckRunner.Run(_design, _electrical!, _parts!, new CheckOptions { SweepStepDeg = 0.5 });
        var sweep = report.WithId(CheckIds.RotationClearance).FirstOrDefault();
        return new Dictionary<string, double>
        {
            ["checks"] = report.Checks.Count,
            ["fail"] = report.FailCount,
            ["warn"] = report.WarnCount,
            ["min_clearance_mm"] = sweep?.Value ?? double.NaN,
        };
    }
}
