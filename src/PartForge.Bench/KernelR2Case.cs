using PartForge.Formats.Stl;
using PartForge.Geometry.Meshes;

namespace PartForge.Bench;

/// <summary>Reference rotor R2 from profiles to binary STL in memory (target &lt; 100 ms, &lt;= 82,996 triangles).</summary>
public sealed class KernelR2Case : IBenchCase
{
    private readonly MemoryStream _stream = new();
    public string Name => "kernel-r2";
    public string Description => "R2 rotor: profiles -> regions -> mesh -> binary STL in memory; target < 100 ms, <= 82,996 triangles";
    public void Setup() { }

    public IReadOnlyDictionary<string, double> Run() => KernelR1Case.BuildAndWrite(KernelRotor.R2, _stream);
}
