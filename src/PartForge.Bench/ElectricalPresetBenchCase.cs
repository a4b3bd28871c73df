using PartForge.Design.Loading;
using PartForge.Design.Presets;
using PartForge.Electrical;

namespace PartForge.Bench;

/// <summary>
/// Full electrical evaluation of the largest bundled preset (most magnets x coils, dual layouts counted twice),
/// loaded once in Setup. Target: under 20 ms after warm-up.
/// </summary>
public sealed class ElectricalPresetBenchCase : IBenchCase
{
    private PartForge.Design.Machines.MachineModel? _design;

    public string Name => "electrical-preset";

    public string Description => "electrical engine on the largest bundled preset (target < 20 ms)";

    public void Setup()
    {
        var designs = PresetLibrary.All
            .Select(p => DesignLoader.LoadText(p.Text, p.Name + ".yaml").Machine)
            .Where(d => d is not null)
            .Select(d => d!)
            .ToList();
        _design = designs
            .OrderByDescending(d => d.Poles * d.CoilsPerStator * (d.Layout.Rotors.Count + d.Layout.Stators.Count - 1))
            .ThenBy(d => d.Name, StringComparer.Ordinal)
            .FirstOrDefault() ?? ElectricalBenchCase.Largest();
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        var r = ElectricalEngine.Evaluate(_design!);
        return new Dictionary<string, double>
        {
            ["poles"] = _design!.Poles,
            ["coils"] = _design.CoilsPerStator,
            ["line_emf_rms_v"] = r.LineEmfRmsV,
        };
    }
}
