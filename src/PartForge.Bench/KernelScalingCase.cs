using System.Diagnostics;
using System.Globalization;
using PartForge.Formats.Stl;
using PartForge.Geometry.Meshes;

namespace PartForge.Bench;

/// <summary>
/// Cost of the kernel against pocket count (16..256 on an R2-like disc) and chordal tolerance (0.01..0.0001 mm
/// on R2): wall and process CPU time (best of 3; CPU time is the steadier figure on a shared machine), triangles, bytes allocated, final mesh size and process peak working set,
/// plus the fitted exponent of time against triangles (log-log least squares). Prints a Markdown table.
/// Run with `--runs 1`.
/// </summary>
public sealed class KernelScalingCase : IBenchCase
{
    public static readonly int[] PocketCounts = { 16, 32, 64, 128, 256 };
    public static readonly double[] Tolerances = { 0.01, 0.003, 0.001, 0.0003, 0.0001 };
    private int _calls;

    public string Name => "kernel-scaling";
    public string Description => "kernel time/memory vs pocket count (16..256) and chordal tolerance (0.01..0.0001); prints a table (use --runs 1)";
    public void Setup() { }

    public IReadOnlyDictionary<string, double> Run()
    {
        var inv = CultureInfo.InvariantCulture;
        var figures = new Dictionary<string, double>();
        var lines = new List<string> { "| sweep | value | triangles | best wall ms | best CPU ms | allocated MB | mesh MB | CPU ns/triangle |", "|---|---|---|---|---|---|---|---|" };
        var ptsP = new List<(double Tris, double Ms)>();
        var ptsE = new List<(double Tris, double Ms)>();
        foreach (int n in PocketCounts)
        {
            // Pocket diameter shrinks with the count so that the pockets always fit on the pitch circle.
            double d = Math.Min(15.2, 0.6 * 2 * Math.PI * 180 / n);
            var r = KernelRotor.R2 with { Pockets = n, PocketD = d };
            var (tris, ms, cpu, alloc, meshMb) = Measure(r);
            ptsP.Add((tris, cpu));
            lines.Add(string.Create(inv, $"| pockets | {n} | {tris} | {ms:F1} | {cpu:F1} | {alloc:F1} | {meshMb:F1} | {cpu * 1e6 / tris:F0} |"));
            figures[$"p{n}_ms"] = Math.Round(ms, 2);
        }
        foreach (double e in Tolerances)
        {
            var r = KernelRotor.R2 with { E = e };
            var (tris, ms, cpu, alloc, meshMb) = Measure(r);
            ptsE.Add((tris, cpu));
            lines.Add(string.Create(inv, $"| tolerance mm | {e} | {tris} | {ms:F1} | {cpu:F1} | {alloc:F1} | {meshMb:F1} | {cpu * 1e6 / tris:F0} |"));
            figures[$"e{e}_ms"] = Math.Round(ms, 2);
        }
        figures["exp_pockets"] = Math.Round(Slope(ptsP), 3);
        figures["exp_tolerance"] = Math.Round(Slope(ptsE), 3);
        figures["peak_ws_mb"] = Math.Round(Process.GetCurrentProcess().PeakWorkingSet64 / 1e6, 1);
        Console.WriteLine(_calls++ == 0 ? "# kernel-scaling (warm-up pass)" : "# kernel-scaling");
        foreach (var l in lines) Console.WriteLine(l);
        Console.WriteLine(string.Create(inv, $"fitted exponent of CPU time vs triangles: pockets {figures["exp_pockets"]}, tolerance {figures["exp_tolerance"]}; peak working set {figures["peak_ws_mb"]} MB"));
        return figures;
    }

    private static (int Tris, double Ms, double CpuMs, double AllocMb, double MeshMb) Measure(KernelRotor r)
    {
        var ms = new MemoryStream();
        var proc = Process.GetCurrentProcess();
        double best = double.PositiveInfinity, bestCpu = double.PositiveInfinity;
        int tris = 0;
        double alloc = 0, meshMb = 0;
        for (int k = 0; k < 3; k++)
        {
            GC.Collect();
            long a0 = GC.GetTotalAllocatedBytes(true);
            proc.Refresh();
            var c0 = proc.TotalProcessorTime;
            var sw = Stopwatch.StartNew();
            var solid = r.Build();
            var mesh = Mesher.Build(solid, r.Precision);
            ms.SetLength(0);
            StlWriter.WriteBinary(ms, mesh, "rotor");
            double t = sw.Elapsed.TotalMilliseconds;
            proc.Refresh();
            bestCpu = Math.Min(bestCpu, (proc.TotalProcessorTime - c0).TotalMilliseconds);
            alloc = (GC.GetTotalAllocatedBytes(true) - a0) / 1e6;
            best = Math.Min(best, t);
            tris = mesh.TriangleCount;
            meshMb = (mesh.VertexCount * 24.0 + mesh.TriangleCount * 12.0) / 1e6;
        }
        return (tris, best, bestCpu, alloc, meshMb);
    }

    /// <summary>Least-squares slope of log(CPU ms) against log(triangles).</summary>
    private static double Slope(List<(double X, double Y)> pts)
    {
        var l = pts.Select(p => (X: Math.Log(p.X), Y: Math.Log(p.Y))).ToList();
        double mx = l.Average(p => p.X), my = l.Average(p => p.Y);
        double sxy = l.Sum(p => (p.X - mx) * (p.Y - my)), sxx = l.Sum(p => (p.X - mx) * (p.X - mx));
        return sxx > 0 ? sxy / sxx : double.NaN;
    }
}
