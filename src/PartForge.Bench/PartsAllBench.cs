using PartForge.Electrical;
using PartForge.Geometry;
using PartForge.Parts;

namespace PartForge.Bench;

/// <summary>
/// Every part of the largest machine we build (<see cref="ElectricalBenchCase.Largest"/>: 24 poles / 18 coils,
/// dual rotor), exact layers, solids and meshes. The electrical results are made once in Setup (not timed);
/// the timed part is PartsBuilder.Build plus meshing every part. Target: well under 0.3 s after warm-up.
/// </summary>
public sealed class PartsAllBench : IBenchCase
{
    private PartForge.Design.Machines.MachineModel _design = ElectricalBenchCase.Largest();
    private ElectricalResult? _electrical;
    private Precision _precision = Precision.FromChordalTolerance(0.01);

    public string Name => "parts-all";

    public string Description => "all parts of 24 poles / 18 coils dual rotor, built and meshed (target well under 300 ms)";

    public void Setup()
    {
        _design = ElectricalBenchCase.Largest();
        _electrical = ElectricalEngine.Evaluate(_design);
        _precision = _design.Precision;
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        var set = PartsBuilder.Build(_design, _electrical!, _precision);
        var figures = new Dictionary<string, double>();
        int total = 0;
        foreach (var p in set.Parts)
        {
            int t = p.Mesh.TriangleCount;
            figures[p.Name] = t;
            total += t;
        }
        figures["triangles"] = total;
        return figures;
    }
}
