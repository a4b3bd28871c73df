using System.Globalization;
using PartForge.Checks;
using PartForge.Design.Loading;
using PartForge.Electrical;
using PartForge.Geometry;
using PartForge.Parts;

namespace PartForge.Bench;

/// <summary>
/// Where the memory of a build goes, on the invented scaling design (<see cref="ScalingDesigns"/>; 64 pockets at
/// 0.001 mm unless PF_PROBE_POCKETS / PF_PROBE_TOL say otherwise): the live heap held by the design, the
/// electrical results, the parts and the checks; for each part, the peak live heap while its solid and mesh
/// are made (sampled with <see cref="ScalingMemory"/> in live mode) and what it holds afterwards, against
/// its mesh size (vertices x 24 B + triangles x 12 B). A last line checks the sampler itself on a loop that
/// holds at most about 1.5 MB while it makes garbage fast. Run with <c>--runs 1</c>.
/// </summary>
public sealed class MemoryProbeCase : IBenchCase
{
    public string Name => "memory-parts";
    public string Description => "live heap per stage and per part (peak while meshing, held after) against the mesh size (use --runs 1)";
    public void Setup() { }

    private int _calls;

    public IReadOnlyDictionary<string, double> Run()
    {
        if (_calls++ == 0) return new Dictionary<string, double> { ["warm_up"] = 1 };
        var inv = CultureInfo.InvariantCulture;
        double tol = double.TryParse(Environment.GetEnvironmentVariable("PF_PROBE_TOL"), NumberStyles.Float, inv, out var t) ? t : 0.001;
        int pockets = int.TryParse(Environment.GetEnvironmentVariable("PF_PROBE_POCKETS"), NumberStyles.Integer, inv, out var pk) ? pk : 64;
        string dir = Path.Combine(Path.GetTempPath(), $"pf-memory-{Environment.ProcessId}");
        Directory.CreateDirectory(dir);
        try
        {
            string design = Path.Combine(dir, "memory.yaml");
            File.WriteAllText(design, ScalingDesigns.Yaml(pockets, ScalingDesigns.CoilsFor(pockets), tol));
            long a0 = Live();
            var d = DesignLoader.Load(design).Machine!;
            long a1 = Live();
            var el = ElectricalEngine.Evaluate(d);
            long a2 = Live();
            var parts = PartsBuilder.Build(d, el);
            long a3 = Live();
            var checks = CheckRunner.Run(d, el, parts);
            long a4 = Live();
            Console.WriteLine(string.Create(inv, $"# {pockets} pockets, {tol} mm: design {(a1 - a0) / 1e6:F2} MB, electrical {(a2 - a1) / 1e6:F2} MB, parts (exact primitives) {(a3 - a2) / 1e6:F2} MB, checks {(a4 - a3) / 1e6:F2} MB"));
            Console.WriteLine("| part | triangles | mesh MB | peak while made MB | held after MB | peak/mesh |");
            Console.WriteLine("|---|---|---|---|---|---|");
            double meshTotal = 0;
            foreach (var p in parts.Parts)
            {
                long s0 = Live();
                long peak;
                using (var mem = ScalingMemory.Start(live: true))
                {
                    _ = p.Mesh; // makes the solid, meshes it, lets go of the regions
                    peak = mem.StopPeakBytes();
                }
                long s1 = Live();
                double meshMb = (p.Mesh.VertexCount * 24.0 + p.Mesh.TriangleCount * 12.0) / 1e6;
                meshTotal += meshMb;
                Console.WriteLine(string.Create(inv, $"| {p.Name} | {p.Mesh.TriangleCount} | {meshMb:F2} | {peak / 1e6:F2} | {(s1 - s0) / 1e6:F2} | {peak / 1e6 / Math.Max(1e-9, meshMb):F2} |"));
            }
            long a5 = Live();
            Console.WriteLine(string.Create(inv, $"all meshes made: {(a5 - a4) / 1e6:F2} MB held against {meshTotal:F2} MB of mesh ({(a5 - a4) / 1e6 / meshTotal:F2}x)"));
            GC.KeepAlive(parts);
            GC.KeepAlive(checks);
            double sampler;
            using (var mem = ScalingMemory.Start(live: true))
            {
                // Garbage only: lists of 30,000 small arrays made and dropped for 1 s (at most ~1.5 MB live).
                var sw = System.Diagnostics.Stopwatch.StartNew();
                long sink = 0;
                while (sw.ElapsedMilliseconds < 1000)
                {
                    var l = new List<int[]>();
                    for (int i = 0; i < 30000; i++) l.Add(new int[4]);
                    sink += l.Count;
                }
                sampler = mem.StopPeakBytes() / 1e6;
                Console.WriteLine(string.Create(inv, $"sampler check: a loop holding at most ~1.5 MB reads {sampler:F2} MB peak live ({sink} arrays made)"));
            }
            return new Dictionary<string, double> { ["mesh_mb"] = Math.Round(meshTotal, 2), ["held_mb"] = Math.Round((a5 - a4) / 1e6, 2), ["sampler_check_mb"] = Math.Round(sampler, 2) };
        }
        finally
        {
            try { Directory.Delete(dir, true); } catch (IOException) { }
        }
    }

    private static long Live() => ScalingMemory.LiveAfterFullCollection();
}
