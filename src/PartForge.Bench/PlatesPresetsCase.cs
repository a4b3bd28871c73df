using PartForge.Design.Loading;
using PartForge.Design.Machines;
using PartForge.Design.Presets;
using PartForge.Electrical;
using PartForge.Parts;
using PartForge.Parts.Fabrication;

namespace PartForge.Bench;

/// <summary>
/// Print-plate layout of every bundled preset (every copy of every printed part on the design's printer bed,
/// PrintPlates.Of from the exact layers); the parts are built in Setup (not timed). A build lays the plates out
/// once per 3MF file and once for the report, so this is the layout's share of a build of all presets in one
/// go. Target: under 100 ms for all presets together.
/// </summary>
public sealed class PlatesPresetsCase : IBenchCase
{
    private readonly List<(MachineModel Machine, PartSet Parts)> _sets = new();

    public string Name => "plates-presets";

    public string Description => "print plates of every preset's printed parts, one layout each (target < 100 ms in all)";

    public void Setup()
    {
        _sets.Clear();
        foreach (var p in PresetLibrary.All)
        {
            var m = DesignLoader.LoadText(p.Text, p.Name + ".yaml").Machine!;
            _sets.Add((m, PartsBuilder.Build(m, ElectricalEngine.Evaluate(m), m.Precision)));
        }
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        int plates = 0, copies = 0;
        foreach (var (m, set) in _sets)
        {
            var pl = PrintPlates.Of(set.Parts, m.Printer, m.Precision);
            plates += pl.PlateCount;
            copies += pl.Layout.Placements.Count;
        }
        return new Dictionary<string, double> { ["presets"] = _sets.Count, ["plates"] = plates, ["copies"] = copies };
    }
}
