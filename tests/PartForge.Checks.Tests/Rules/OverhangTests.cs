using PartForge.Design.Loading;
using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Design.Presets;
using PartForge.Electrical;
using PartForge.Geometry.Meshes;
using PartForge.Parts;
using PartForge.Parts.Fabrication;

namespace PartForge.Checks.Tests.Rules;

/// <summary>
/// print-overhang against the meshes, measured in the test: every printed part of every preset, or each of its print
/// pieces, is turned into its printing orientation (as the plates lay it: turned over about x when its footprint says
/// so) and every triangle of its mesh that faces down more than 45 degrees from vertical (unit normal n with -n_z >
/// sin 45 deg; 45 degrees is common practice for filament printing) and is not on the bed is summed. A part whose
/// meshes have no such surface must pass; one with such a surface must warn. Control: the one-piece coil former (the
/// part as assembled, lower flange on the bed) has exactly the underside of its upper flange facing down, the
/// flange's area less the core's (shoelace areas of the exact contours, flattened here), and would need supports.
/// </summary>
public sealed class OverhangTests
{
    private const double Sliver = 0.01;

    public static TheoryData<string> Presets() => new(PresetLibrary.All.Select(p => p.Name));

    private static (MachineModel M, PartSet Parts, CheckReport Report) Evaluate(string preset)
    {
        var loaded = DesignLoader.LoadText(PresetLibrary.Find(preset)!.Text, preset + ".yaml");
        Assert.True(loaded.Machine is not null, string.Join("\n", loaded.Errors));
        var m = loaded.Machine!;
        var e = ElectricalEngine.Evaluate(m);
        var parts = PartsBuilder.Build(m, e, m.Precision);
        return (m, parts, CheckRunner.Run(m, e, parts));
    }

    /// <summary>Area of the triangles facing down beyond 45 degrees from vertical and not on the bed, mm^2.</summary>
    private static double DownArea(Mesh mesh, bool flipped)
    {
        var (lo, hi) = mesh.Bounds();
        double h = hi.Z;
        Geometry.Primitives.Vec3 Bed(Geometry.Primitives.Vec3 p) => flipped ? new(p.X, -p.Y, h - p.Z) : p;
        double zMin = double.PositiveInfinity;
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            var (a, b, c) = mesh.Triangle(t);
            zMin = Math.Min(zMin, Math.Min(Bed(a).Z, Math.Min(Bed(b).Z, Bed(c).Z)));
        }
        double sum = 0, s45 = Math.Sin(Math.PI / 4);
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            var (a0, b0, c0) = mesh.Triangle(t);
            var (a, b, c) = (Bed(a0), Bed(b0), Bed(c0));
            var n = (b - a).Cross(c - a);
            double len = n.Length;
            if (len == 0 || -n.Z / len <= s45 + 1e-9) continue;
            if (Math.Max(a.Z, Math.Max(b.Z, c.Z)) <= zMin + 1e-6) continue;
            sum += len / 2;
        }
        return sum;
    }

    [Theory]
    [MemberData(nameof(Presets))]
    public void Every_printed_part_mesh_agrees_with_the_overhang_check(string preset)
    {
        var (_, parts, report) = Evaluate(preset);
        foreach (var part in parts.Parts.Where(p => p.Process == PartProcess.Print))
        {
            double down = part.PrintUnits.Sum(u => DownArea(u.Mesh, PrintFootprint.Of(u.ExactLayers).Flipped));
            var check = report.Checks.Single(c => c.Id == "print-overhang" && c.Part == part.Id);
            // Below 0.01 mm^2 (a grid sliver, far under one extrusion line squared, about 0.16 mm^2) nothing is printed.
            if (down < Sliver) Assert.True(check.Status == CheckStatus.Pass, $"{preset} {part.Name}: no down-facing surface, but the check says {check.Status}: {check.Message}");
            else Assert.True(check.Status == CheckStatus.Warn, $"{preset} {part.Name}: {down} mm2 faces down off the bed, but the check says {check.Status}: {check.Message}");
            if (part.Role == PartRole.Former) Assert.True(down < Sliver, $"{preset}: the former's pieces have {down} mm2 of overhang");
        }
    }

    [Fact]
    public void The_one_piece_former_would_overhang_by_its_upper_flange()
    {
        var (_, parts, _) = Evaluate("wind-duo");
        var former = parts.Get(PartId.Former);
        double down = DownArea(former.Mesh, false);
        var flange = former.Feature("flange-upper").Contour;
        var core = former.Feature("core").Contour;
        // The upper flange's underside: the flange less the core (the spindle hole goes through both; the lead slot is
        // only in the upper flange, so its part outside the core is open underneath too and faces down nowhere).
        var slot = former.Feature("lead-slot").Contour;
        double expected = Area(flange) - Area(core) - (SlotOutside(former));
        Assert.True(down > 10, $"only {down} mm2 faces down");
        Assert.Equal(expected, down, expected * 0.01);
    }

    private static double SlotOutside(PartModel former)
    {
        // Slot width x its length from the core surface to the flange edge (its part beyond the flange is not material).
        var slot = former.Feature("lead-slot").Contour;
        var pts = Flatten(slot);
        double w = pts.Max(p => p.Y) - pts.Min(p => p.Y);
        double x0 = pts.Min(p => p.X);
        var flange = Flatten(former.Feature("flange-upper").Contour);
        double xEdge = flange.Where(p => Math.Abs(p.Y) < w).Select(p => p.X).DefaultIfEmpty(flange.Max(p => p.X)).Max();
        return w * (xEdge - x0);
    }

    private static double Area(Geometry.Profiles.Contour c)
    {
        var pts = Flatten(c);
        double a = 0;
        for (int i = 0; i < pts.Count; i++) a += pts[i].X * pts[(i + 1) % pts.Count].Y - pts[(i + 1) % pts.Count].X * pts[i].Y;
        return Math.Abs(a) / 2;
    }

    private static List<Geometry.Primitives.Vec2> Flatten(Geometry.Profiles.Contour c)
    {
        var pts = new List<Geometry.Primitives.Vec2>();
        if (c.Circle is { } k)
        {
            for (int i = 0; i < 4096; i++) pts.Add(k.Center + Geometry.Primitives.Vec2.FromAngleDeg(360.0 * i / 4096) * k.Radius);
            return pts;
        }
        foreach (var s in c.Segments)
        {
            if (s is Geometry.Profiles.ArcSegment a)
            {
                int n = Math.Max(4, (int)Math.Ceiling(Math.Abs(a.SweepDeg)));
                for (int i = 0; i < n; i++) pts.Add(a.Center + Geometry.Primitives.Vec2.FromAngleDeg(a.StartDeg + a.SweepDeg * i / n) * a.Radius);
            }
            else pts.Add(s.Start);
        }
        return pts;
    }
}
