using System.Diagnostics;
using System.Globalization;
using PartForge.Checks;
using PartForge.Design.Loading;
using PartForge.Electrical;
using PartForge.Export.Pipeline;
using PartForge.Formats.Stl;
using PartForge.Geometry;
using PartForge.Parts;

namespace PartForge.Bench;

/// <summary>
/// End-to-end build cost against pocket count (16..256 at tolerance 0.01) and chordal tolerance (0.01..0.0001
/// at 64 pockets) on the invented R2-like machine (<see cref="ScalingDesigns"/>): the whole
/// <c>partforge build</c> pipeline in-process writing STL, 3MF and JSON to a temporary folder (wall and process CPU time; CPU time is the
/// figure to read on a shared machine), the CPU time of each stage (electrical, parts and meshes, checks, STL encoding), the emitted triangles, the
/// peak managed heap during a build against the final mesh size, and the fitted exponents of time and
/// memory against triangles. Prints a Markdown table (docs/scaling.md). Run with <c>--runs 1</c>.
/// </summary>
public sealed class ScalingBuildCase : IBenchCase
{
    public static readonly int[] PocketCounts = [16, 32, 64, 128, 256];
    public static readonly double[] Tolerances = [0.01, 0.003, 0.001, 0.0003, 0.0001];
    private int _calls;

    public string Name => "scaling-build";
    public string Description => "end-to-end build time/memory vs pocket count 16..256 and chordal tolerance 0.01..0.0001, stage split, exponents (use --runs 1)";
    public void Setup() { }

    public sealed record Row(string Sweep, string Value, int Triangles, double BuildMs, double BuildCpuMs, double ElectricalMs, double PartsMs, double ChecksMs, double StlMs,
        double PeakHeapMb, double PeakLiveMb, double MeshMb, double StlMb, string Status);

    public IReadOnlyDictionary<string, double> Run()
    {
        if (_calls++ == 0)
        {
            // The harness's warm-up call: JIT every stage on the smallest design only (the full sweep takes minutes).
            Measure("pockets", "16", ScalingDesigns.Yaml(16, 12, 0.01));
            return new Dictionary<string, double> { ["warm_up"] = 1 };
        }
        const bool print = true;
        var rows = new List<Row>();
        PrintHeader();
        void Add(Row r) { rows.Add(r); PrintRow(r); }
        foreach (int n in PocketCounts) Add(Measure("pockets", n.ToString(CultureInfo.InvariantCulture), ScalingDesigns.Yaml(n, ScalingDesigns.CoilsFor(n), 0.01)));
        foreach (double e in Tolerances) Add(Measure("tolerance mm", e.ToString("R", CultureInfo.InvariantCulture), ScalingDesigns.Yaml(64, 48, e)));
        var figures = new Dictionary<string, double>();
        var byP = rows.Where(r => r.Sweep == "pockets" && r.Triangles > 0).ToArray();
        var byE = rows.Where(r => r.Sweep != "pockets" && r.Triangles > 0).ToArray();
        figures["exp_time_vs_tris_pockets"] = Math.Round(ScalingFit.Exponent(byP.Select(r => ((double)r.Triangles, r.BuildCpuMs)).ToArray()), 3);
        figures["exp_time_vs_tris_tolerance"] = Math.Round(ScalingFit.Exponent(byE.Select(r => ((double)r.Triangles, r.BuildCpuMs)).ToArray()), 3);
        figures["exp_tris_vs_pockets"] = Math.Round(ScalingFit.Exponent(byP.Select(r => (double.Parse(r.Value, CultureInfo.InvariantCulture), (double)r.Triangles)).ToArray()), 3);
        figures["exp_tris_vs_1/tolerance"] = Math.Round(ScalingFit.Exponent(byE.Select(r => (1 / double.Parse(r.Value, CultureInfo.InvariantCulture), (double)r.Triangles)).ToArray()), 3);
        figures["exp_peak_vs_tris"] = Math.Round(ScalingFit.Exponent(rows.Where(r => r.Triangles > 0).Select(r => ((double)r.Triangles, r.PeakHeapMb)).ToArray()), 3);
        figures["max_peak_over_mesh"] = Math.Round(rows.Where(r => r.MeshMb > 0).Max(r => r.PeakHeapMb / r.MeshMb), 2);
        figures["max_live_over_mesh"] = Math.Round(rows.Where(r => r.MeshMb > 0).Max(r => r.PeakLiveMb / r.MeshMb), 2);
        if (print) Console.WriteLine(string.Join(", ", figures.Select(kv => $"{kv.Key} {kv.Value.ToString("G4", CultureInfo.InvariantCulture)}")));
        return figures;
    }

    private static void PrintHeader()
    {
        Console.WriteLine("| sweep | value | triangles | build wall ms | build CPU ms | electrical CPU ms | parts+mesh CPU ms | checks CPU ms | STL encode CPU ms | CPU ns/triangle | peak heap MB | peak live MB | mesh MB | STL MB | peak/mesh | live/mesh |");
        Console.WriteLine("|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|---|");
        Console.Out.Flush();
    }

    private static void PrintRow(Row r)
    {
        var inv = CultureInfo.InvariantCulture;
        if (r.Status != "ok")
            Console.WriteLine($"| {r.Sweep} | {r.Value} | - | - | - | - | - | - | - | - | - | - | - | {r.Status} |");
        else
            Console.WriteLine(string.Create(inv, $"| {r.Sweep} | {r.Value} | {r.Triangles} | {r.BuildMs:F0} | {r.BuildCpuMs:F0} | {r.ElectricalMs:F0} | {r.PartsMs:F0} | {r.ChecksMs:F0} | {r.StlMs:F0} | {r.BuildCpuMs * 1e6 / r.Triangles:F0} | {r.PeakHeapMb:F1} | {r.PeakLiveMb:F1} | {r.MeshMb:F1} | {r.StlMb:F1} | {r.PeakHeapMb / r.MeshMb:F2} | {r.PeakLiveMb / r.MeshMb:F2} |"));
        Console.Out.Flush();
    }

    private static double CpuMs() => System.Diagnostics.Process.GetCurrentProcess().TotalProcessorTime.TotalMilliseconds;

    private static Row Measure(string sweep, string value, string yaml)
    {
        string dir = Path.Combine(Path.GetTempPath(), $"pf-scaling-{Environment.ProcessId}");
        Directory.CreateDirectory(dir);
        string design = Path.Combine(dir, "scaling.yaml");
        File.WriteAllText(design, yaml);
        string outDir = Path.Combine(dir, "out");
        var request = new BuildRequest { DesignPath = design, OutputDir = outDir, Formats = "stl,3mf,json", Force = true };
        try
        {
            // Stage split (one evaluation by hand, stage by stage, best of 3).
            var d = DesignLoader.Load(design).Machine ?? throw new InvalidOperationException("scaling design does not load: " + string.Join("; ", DesignLoader.Load(design).Errors));
            double eMs = double.MaxValue, pMs = double.MaxValue, cMs = double.MaxValue, sMs = double.MaxValue, bMs = double.MaxValue;
            int tris = 0;
            double meshMb = 0, stlMb = 0;
            string status = "ok";
            for (int k = 0; k < 1; k++)
            {
                double c0 = CpuMs();
                var el = ElectricalEngine.Evaluate(d);
                eMs = Math.Min(eMs, CpuMs() - c0);
                c0 = CpuMs();
                var parts = PartsBuilder.Build(d, el);
                tris = parts.Parts.Sum(p => p.Mesh.TriangleCount); // meshes are made on first use: force them here
                pMs = Math.Min(pMs, CpuMs() - c0);
                c0 = CpuMs();
                CheckRunner.Run(d, el, parts);
                cMs = Math.Min(cMs, CpuMs() - c0);
                var printed = parts.Parts.Where(p => p.Process == PartForge.Design.Machines.PartProcess.Print).ToArray();
                c0 = CpuMs();
                long bytes = 0;
                foreach (var p in printed) bytes += StlWriter.ToBinaryBytes(p.Mesh, p.Name).Length;
                sMs = Math.Min(sMs, CpuMs() - c0);
                meshMb = parts.Parts.Sum(p => p.Mesh.VertexCount * 24.0 + p.Mesh.TriangleCount * 12.0) / 1e6;
                stlMb = bytes / 1e6;
            }
            // End to end, as `partforge build` does it (wall and process CPU time).
            double bCpu = double.MaxValue;
            for (int k = 0; k < 1; k++)
            {
                double c0 = CpuMs();
                var sw = Stopwatch.StartNew();
                var r = BuildPipeline.Build(request);
                bMs = Math.Min(bMs, sw.Elapsed.TotalMilliseconds);
                bCpu = Math.Min(bCpu, CpuMs() - c0);
                if (r.Status == PipelineStatus.BadInput) { status = "refused: " + string.Join("; ", r.Problems).Replace("|", "/"); break; }
            }
            // Peak heap in a run of its own (the sampler would disturb the timings).
            double peakMb, liveMb;
            using (var mem = ScalingMemory.Start())
            {
                BuildPipeline.Build(request);
                peakMb = mem.StopPeakBytes() / 1e6;
            }
            using (var mem = ScalingMemory.Start(live: true))
            {
                BuildPipeline.Build(request);
                liveMb = mem.StopPeakBytes() / 1e6;
            }
            return new Row(sweep, value, status == "ok" ? tris : 0, bMs, bCpu, eMs, pMs, cMs, sMs, peakMb, liveMb, meshMb, stlMb, status);
        }
        catch (Exception ex) when (ex is InvalidOperationException or PartsException or ArgumentException)
        {
            return new Row(sweep, value, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, "error: " + ex.Message.Replace("|", "/"));
        }
        finally
        {
            try { Directory.Delete(dir, recursive: true); } catch (IOException) { }
        }
    }
}
