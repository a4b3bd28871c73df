using PartForge.Formats.Stl;
using PartForge.Geometry.Meshes;

namespace PartForge.Bench;

/// <summary>Reference rotor R1 from profiles to binary STL in memory.</summary>
public sealed class KernelR1Case : IBenchCase
{
    private readonly MemoryStream _stream = new();
    public string Name => "kernel-r1";
    public string Description => "R1 rotor: profiles -> regions -> mesh -> binary STL in memory";
    public void Setup() { }

    public IReadOnlyDictionary<string, double> Run() => BuildAndWrite(KernelRotor.R1, _stream);

    internal static IReadOnlyDictionary<string, double> BuildAndWrite(KernelRotor r, MemoryStream stream)
    {
        var proc = System.Diagnostics.Process.GetCurrentProcess();
        var cpu0 = proc.TotalProcessorTime;
        var solid = r.Build();
        var mesh = Mesher.Build(solid, r.Precision);
        stream.SetLength(0);
        StlWriter.WriteBinary(stream, mesh, "rotor");
        proc.Refresh();
        return new Dictionary<string, double>
        {
            // process CPU time of this run (all threads): a steadier figure than wall time on a busy machine
            ["cpu_ms"] = Math.Round((proc.TotalProcessorTime - cpu0).TotalMilliseconds, 1),
            ["triangles"] = mesh.TriangleCount,
            ["vertices"] = mesh.VertexCount,
            ["stl_bytes"] = stream.Length,
            ["volume_mm3"] = solid.AnalyticVolume,
        };
    }
}
