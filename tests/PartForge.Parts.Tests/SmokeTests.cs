using PartForge.Geometry.Meshes;

namespace PartForge.Parts.Tests;

public class SmokeTests
{
    [Fact]
    public void AllLayoutsBuild()
    {
        foreach (var (d, coil) in new[]
        {
            (TestDesigns.SingleRotor(), TestDesigns.RoundCoil(TestDesigns.SingleRotor(), 5, 10, 50, 90)),
            (TestDesigns.DualRotor(), TestDesigns.RoundCoil(TestDesigns.DualRotor(), 6, 15, 45, 75)),
            (TestDesigns.DualStator(), TestDesigns.RoundCoil(TestDesigns.DualStator(), 6, 22.5)),
        })
        {
            var set = PartsBuilder.Build(d, coil, TestDesigns.Prec(d));
            foreach (var p in set.Parts)
            {
                var r = MeshValidator.Validate(p.Mesh);
                Console.WriteLine($"{d.Name} {p.Name} x{p.Quantity} {p.Process} {p.Material} V={p.VolumeMm3:F1} tri={p.Mesh.TriangleCount} {r}");
            }
            foreach (var x in set.Diagnostics) Console.WriteLine($"  {x}");
        }
    }
}
