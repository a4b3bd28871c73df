using PartForge.Electrical.Field;

namespace PartForge.Bench;

/// <summary>
/// The magnetic pull of the largest dual-rotor machine with back iron (<see cref="ElectricalBenchCase.Largest"/>):
/// the running pull by the full image series and the assembly curve against rotor separation, both timed (the
/// curve is the larger part). Target: under 20 ms after warm-up.
/// </summary>
public sealed class PullCurveBench : IBenchCase
{
    private PartForge.Design.Machines.MachineModel _design = ElectricalBenchCase.Largest();

    public string Name => "pull-curve";

    public string Description => "rotor-to-rotor pull with back iron (image series) and the assembly pull curve, 24-pole dual rotor (target < 20 ms)";

    public void Setup() => _design = ElectricalBenchCase.Largest();

    public IReadOnlyDictionary<string, double> Run()
    {
        var p = MagneticPull.Compute(_design);
        return new Dictionary<string, double>
        {
            ["pull_n"] = p.RotorToRotorN,
            ["curve_points"] = p.AssemblyCurve.Count,
            ["last_gap_mm"] = p.AssemblyCurve.Count > 0 ? p.AssemblyCurve[^1].FaceToFaceMm : double.NaN,
        };
    }
}
