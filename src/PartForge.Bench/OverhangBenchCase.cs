using PartForge.Geometry.Fabrication;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Solids;

namespace PartForge.Bench;

/// <summary>
/// Overhang analysis of the R2 reference rotor printed upside down (its 64 pocket ceilings become bridges):
/// exactly on the layered solid and on its mesh (83,000 triangles). The mesh is made in Setup, not timed.
/// </summary>
public sealed class OverhangBenchCase : IBenchCase
{
    private LayeredSolid _solid = null!;
    private Mesh _mesh = Mesh.Empty;

    public string Name => "overhang-r2";
    public string Description => "overhang analysis of the R2 rotor upside down: layered solid (exact) and its mesh";

    public void Setup()
    {
        var r2 = KernelRotor.R2;
        var solid = r2.Build();
        double top = solid.ZRange.Z1;
        _solid = solid.MirroredZ().MapRegions(r => r.MirroredY()).Translated(top);
        _mesh = Mesher.Build(_solid, r2.Precision);
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        var sw = System.Diagnostics.Stopwatch.StartNew();
        var exact = OverhangAnalysis.OfSolid(_solid, new OverhangOptions());
        double solidMs = sw.Elapsed.TotalMilliseconds;
        var fromMesh = OverhangAnalysis.OfMesh(_mesh, new OverhangOptions());
        return new Dictionary<string, double>
        {
            ["solid-ms"] = solidMs,
            ["regions"] = exact.Regions.Count,
            ["span-mm"] = exact.MaxSpanMm,
            ["mesh-regions"] = fromMesh.Regions.Count,
            ["mesh-triangles"] = _mesh.TriangleCount,
        };
    }
}
