using System.Diagnostics;
using PartForge.Formats.Cutting;
using PartForge.Formats.Dxf;
using PartForge.Formats.Svg;
using PartForge.Formats.ThreeMf;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Bench;

/// <summary>
/// The format writers alone, in memory: a 100,000-triangle ring mesh (coordinates on the 1e-4 mm grid, like
/// the kernel's) as 3MF, and a 400 mm disc with 100 holes (64 circles, 36 annular-sector windows) as DXF
/// and SVG with kerf compensation. Figures: the wall time of each writer in the last run (and the process CPU time of the 3MF write) and the output sizes.
/// </summary>
public sealed class FormatsAllBench : IBenchCase
{
    private Mesh _mesh = Mesh.Empty;
    private CutSheet _sheet = CutSheet.Of("", new Profile(Array.Empty<Contour>(), Array.Empty<Contour>()), 0);

    public string Name => "formats-all";

    public string Description => "3MF of a 100k-triangle mesh + DXF and SVG of a disc with 100 holes (kerf 0.15), in memory";

    public void Setup()
    {
        _mesh = Ring(60, 200, 8, 12_500);
        var holes = new List<Contour>();
        for (int i = 0; i < 64; i++) holes.Add(Contour.FullCircle(Vec2.FromAngleDeg(i * 360.0 / 64) * 180, 7.6));
        for (int i = 0; i < 36; i++) holes.Add(Contour.AnnularSector(90, 140, i * 10 + 1, 7));
        var outer = Contour.FullCircle(new Vec2(0, 0), 200);
        _sheet = new CutSheet("bench-disc", new Profile(new[] { outer }, holes), new[] { Contour.FullCircle(new Vec2(0, 0), 30) }, 0.15);
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        // Process CPU time beside the wall time: on a shared, loaded machine it is the steadier figure.
        var cpu0 = Environment.CpuUsage.TotalTime;
        var sw = Stopwatch.StartNew();
        using var threeMf = new MemoryStream();
        ThreeMfWriter.Write(threeMf, "bench", new[] { ThreeMfObject.At("ring", _mesh) });
        double t3 = sw.Elapsed.TotalMilliseconds;
        double c3 = (Environment.CpuUsage.TotalTime - cpu0).TotalMilliseconds;
        sw.Restart();
        var plan = KerfCompensation.Apply(_sheet);
        using var dxf = new MemoryStream();
        DxfWriter.Write(dxf, plan);
        double td = sw.Elapsed.TotalMilliseconds;
        sw.Restart();
        using var svg = new MemoryStream();
        SvgWriter.Write(svg, plan);
        double ts = sw.Elapsed.TotalMilliseconds;
        return new Dictionary<string, double>
        {
            ["triangles"] = _mesh.TriangleCount,
            ["3mf_ms"] = t3,
            ["3mf_cpu_ms"] = c3,
            ["3mf_kB"] = threeMf.Length / 1024.0,
            ["dxf_ms(incl. kerf)"] = td,
            ["dxf_kB"] = dxf.Length / 1024.0,
            ["svg_ms"] = ts,
            ["svg_kB"] = svg.Length / 1024.0,
        };
    }

    /// <summary>A flat ring (annulus extruded by h) with n segments: 4n vertices, 8n triangles, outward.</summary>
    private static Mesh Ring(double rIn, double rOut, double h, int n)
    {
        static double Snap(double v) => Math.Round(v * 1e4) / 1e4;
        var v = new Vec3[4 * n];
        for (int i = 0; i < n; i++)
        {
            double a = 360.0 * i / n;
            var u = Vec2.FromAngleDeg(a);
            v[4 * i] = new Vec3(Snap(u.X * rIn), Snap(u.Y * rIn), 0);
            v[4 * i + 1] = new Vec3(Snap(u.X * rOut), Snap(u.Y * rOut), 0);
            v[4 * i + 2] = new Vec3(Snap(u.X * rIn), Snap(u.Y * rIn), h);
            v[4 * i + 3] = new Vec3(Snap(u.X * rOut), Snap(u.Y * rOut), h);
        }
        var t = new List<int>(24 * n);
        for (int i = 0; i < n; i++)
        {
            int j = (i + 1) % n;
            int bi = 4 * i, bo = 4 * i + 1, ti = 4 * i + 2, to = 4 * i + 3;
            int bi1 = 4 * j, bo1 = 4 * j + 1, ti1 = 4 * j + 2, to1 = 4 * j + 3;
            t.AddRange(new[] { bi, bi1, bo1, bi, bo1, bo });     // bottom, facing down
            t.AddRange(new[] { ti, to, to1, ti, to1, ti1 });     // top, facing up
            t.AddRange(new[] { bo, bo1, to1, bo, to1, to });     // outer wall
            t.AddRange(new[] { bi, ti, ti1, bi, ti1, bi1 });     // inner wall (faces the axis)
        }
        return new Mesh(v, t);
    }
}
