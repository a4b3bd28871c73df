using System.Runtime.CompilerServices;
using System.Text;
using System.Text.Json;
using PartForge.Formats.Cutting;
using PartForge.Formats.Dxf;
using PartForge.Formats.Tests.Cutting;
using PartForge.Formats.Tests.Golden;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Formats.Tests.Dxf;

/// <summary>
/// The LINE and ARC form of <see cref="DxfWriter"/> (<see cref="DxfContours.Entities"/>), read back with
/// Debian's python3-ezdxf. Source for the entity definitions: DXF reference (R12), ENTITIES section: LINE
/// (groups 10/20/30 start, 11/21/31 end), ARC (10/20/30 centre, 40 radius, 50 start angle, 51 end angle, in
/// degrees, counter-clockwise about the extrusion direction 0,0,1).
/// </summary>
public class DxfEntityChainTests
{
    private static byte[] Write(CutSheet sheet, DxfContours contours)
    {
        using var ms = new MemoryStream();
        DxfWriter.Write(ms, sheet, contours);
        return ms.ToArray();
    }

    /// <summary>
    /// tests/readers/dxf-chains.py: reads the file with ezdxf, audits it, and walks the LINE and ARC entities in
    /// file order into closed chains (layer, entity count, closed, largest end-point gap, signed area).
    /// </summary>
    private static string ChainScript([CallerFilePath] string here = "")
    {
        string beside = Path.GetFullPath(Path.Combine(Path.GetDirectoryName(here)!, "..", "..", "readers", "dxf-chains.py"));
        if (File.Exists(beside)) return beside;
        // Built elsewhere: walk up from the test output to the repository's tests folder.
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            string candidate = Path.Combine(dir.FullName, "tests", "readers", "dxf-chains.py");
            if (File.Exists(candidate)) return candidate;
        }
        throw new FileNotFoundException("cannot find tests/readers/dxf-chains.py");
    }

    private static JsonElement Read(CutSheet sheet, DxfContours contours = DxfContours.Entities)
    {
        string path = ExternalReader.TempFile(".dxf");
        DxfWriter.WriteFile(path, sheet, contours);
        try { return PythonFile(ChainScript(), path); }
        finally { File.Delete(path); }
    }

    private static JsonElement PythonFile(string script, string file)
    {
        var (code, stdout, stderr) = ExternalReader.Run(ExternalReader.Python, script, file);
        Assert.True(code == 0, $"python reader failed ({code}): {stderr}");
        using var doc = JsonDocument.Parse(stdout);
        return doc.RootElement.Clone();
    }

    /// <summary>The compensated plan's arc segments, in writing order, with the layer they go to.</summary>
    private static List<(string Layer, ArcSegment Arc)> PlanArcs(CutSheet sheet) =>
        KerfCompensation.Apply(sheet).Paths
            .Where(p => p.Contour.Circle is null)
            .SelectMany(p => p.Contour.Segments.OfType<ArcSegment>().Select(a => (p.Kind == CutPathKind.Mark ? "MARK" : "CUT", a)))
            .ToList();

    [Fact]
    public void MatchesTheGoldenFile() => GoldenFile.AssertMatches("plate-entities.dxf", Write(SamplePlate.Sheet(), DxfContours.Entities));

    [Fact]
    public void TheDefaultIsStillThePolylineFile() =>
        // The stored polyline file (written before the entity form existed) is what the default still writes.
        GoldenFile.AssertMatches("plate.dxf", Write(SamplePlate.Sheet(), DxfContours.Polyline));

    [Fact]
    public void RewriteIsByteIdentical() =>
        Assert.Equal(Write(SamplePlate.Sheet(), DxfContours.Entities), Write(SamplePlate.Sheet(), DxfContours.Entities));

    [Fact]
    public void PlateAuditsCleanAndEveryChainCloses()
    {
        var sheet = SamplePlate.Sheet();
        var r = Read(sheet);
        Assert.Equal(0, r.GetProperty("errors").GetInt32());
        Assert.Equal(0, r.GetProperty("fixes").GetInt32());
        var types = r.GetProperty("types").EnumerateArray().Select(t => t.GetString()).ToArray();
        Assert.DoesNotContain("POLYLINE", types);
        Assert.DoesNotContain("VERTEX", types);

        // Same order as the polyline form and the plan (marks, holes, outline), one entity per segment, then the note.
        var expected = KerfCompensation.Apply(sheet).Paths
            .SelectMany(p => p.Contour.Circle is not null ? ["CIRCLE"] : p.Contour.Segments.Select(s => s is ArcSegment ? "ARC" : "LINE"))
            .Append("TEXT").ToArray();
        Assert.Equal(expected, types);

        var chains = r.GetProperty("chains").EnumerateArray().ToList();
        Assert.Equal(3, chains.Count);
        Assert.Equal(new[] { "MARK", "CUT", "CUT" }, chains.Select(c => c[0].GetString()));
        Assert.Equal(new[] { 4, 4, 8 }, chains.Select(c => c[1].GetInt32()));
        foreach (var c in chains)
        {
            Assert.True(c[2].GetBoolean(), "the chain returns to its start");
            Assert.InRange(c[3].GetDouble(), 0, 1e-9); // consecutive end points coincide
        }

        // Areas from ezdxf's own end points. Mark rectangle 6 x 2 as designed (counter-clockwise).
        Assert.Equal(12, chains[0][4].GetDouble(), 9);
        // Slot hole, clockwise, radius less half the kerf: a stadium.
        double h = SamplePlate.Kerf / 2, rs = SamplePlate.SlotRadius - h;
        Assert.Equal(-(2 * rs * SamplePlate.SlotStraight + Math.PI * rs * rs), chains[1][4].GetDouble(), 9);
        // Outline grown by half the kerf with round corners: Steiner's formula A + P h + pi h^2.
        double w = SamplePlate.Width, ht = SamplePlate.Height;
        Assert.Equal(w * ht + 2 * (w + ht) * h + Math.PI * h * h, chains[2][4].GetDouble(), 9);
    }

    [Fact]
    public void EveryArcIsTheCompensatedProfilesArcWithItsEndsInContourOrder()
    {
        var sheet = SamplePlate.Sheet();
        var r = Read(sheet);
        var arcs = r.GetProperty("arcs").EnumerateArray().ToList();
        var plan = PlanArcs(sheet);
        Assert.Equal(plan.Count, arcs.Count);
        for (int i = 0; i < plan.Count; i++)
        {
            var (layer, a) = plan[i];
            var e = arcs[i];
            Assert.Equal(layer, e[0].GetString());
            Assert.Equal(a.Center.X, e[1].GetDouble(), 12);
            Assert.Equal(a.Center.Y, e[2].GetDouble(), 12);
            Assert.Equal(a.Radius, e[3].GetDouble(), 12);
            // A counter-clockwise segment starts at the ARC's start angle; a clockwise one (the hole's) at its end angle.
            var (first, last) = a.SweepDeg > 0 ? (a.Start, a.End) : (a.End, a.Start);
            Assert.True(Math.Abs(first.X - e[4].GetDouble()) < 1e-9 && Math.Abs(first.Y - e[5].GetDouble()) < 1e-9, $"arc {i} start point");
            Assert.True(Math.Abs(last.X - e[6].GetDouble()) < 1e-9 && Math.Abs(last.Y - e[7].GetDouble()) < 1e-9, $"arc {i} end point");
        }
        // The hole arcs are clockwise in the plan, so the swap was exercised.
        Assert.Contains(plan, p => p.Arc.SweepDeg < 0);
        Assert.Contains(plan, p => p.Arc.SweepDeg > 0);
    }

    [Fact]
    public void ChainsHaveTheSameAreasAsThePolylineForm()
    {
        // The two forms of one sheet describe the same loops: ezdxf's areas of the entity chains (from the ARC
        // angles) equal the areas of the polylines (from the bulges) of the default file.
        var sheet = SamplePlate.Sheet();
        var chains = Read(sheet).GetProperty("chains").EnumerateArray().Select(c => c[4].GetDouble()).ToArray();
        var polyAreas = Read(sheet, DxfContours.Polyline).GetProperty("polylines").EnumerateArray().Select(p => p[2].GetDouble()).ToArray();
        Assert.Equal(polyAreas.Length, chains.Length);
        for (int i = 0; i < chains.Length; i++) Assert.Equal(polyAreas[i], chains[i], 9);
    }

    [Fact]
    public void ArcBeyondAHalfTurnIsOneArc()
    {
        // A 300 degree arc closed through the centre: one ARC (an ARC may sweep up to a full turn), two LINEs.
        var arc = new ArcSegment(new Vec2(0, 0), 10, 30, 300);
        var c = Contour.FromSegments(new Segment[] { arc, new LineSegment(arc.End, new Vec2(0, 0)), new LineSegment(new Vec2(0, 0), arc.Start) });
        var r = Read(CutSheet.Of("pie", Profile.Of(c), 0));
        Assert.Equal(0, r.GetProperty("errors").GetInt32());
        Assert.Equal(new[] { "ARC", "LINE", "LINE", "TEXT" }, r.GetProperty("types").EnumerateArray().Select(t => t.GetString()));
        var chain = Assert.Single(r.GetProperty("chains").EnumerateArray());
        Assert.True(chain[2].GetBoolean());
        Assert.InRange(chain[3].GetDouble(), 0, 1e-9);
        Assert.Equal(300.0 / 360 * Math.PI * 100, chain[4].GetDouble(), 9);
    }

    [Fact]
    public void DiscWithSectorWindowsKeepsCirclesAndChainsEveryWindow()
    {
        // 400 mm disc, 64 round holes D15.2 on r 180 and 36 annular-sector windows (r 90..140, 7 degrees), kerf 0.15.
        var holes = new List<Contour>();
        for (int i = 0; i < 64; i++) holes.Add(Contour.FullCircle(Vec2.FromAngleDeg(i * 360.0 / 64) * 180, 7.6));
        for (int i = 0; i < 36; i++) holes.Add(Contour.AnnularSector(90, 140, i * 10 + 1, 7));
        var sheet = CutSheet.Of("disc", new Profile(new[] { Contour.FullCircle(new Vec2(0, 0), 200) }, holes), 0.15);
        var r = Read(sheet);
        Assert.Equal(0, r.GetProperty("errors").GetInt32());
        Assert.Equal(65, r.GetProperty("circles").GetArrayLength());
        var chains = r.GetProperty("chains").EnumerateArray().ToList();
        Assert.Equal(36, chains.Count);
        // A shrunk window keeps sharp corners: arc, line, arc, line; clockwise (a hole). Its area: the annular
        // sector of radii 90.075 and 139.925 over 7 degrees, less a strip of width h = 0.075 inside each radial
        // side, strip = integral over v in 0..h of (sqrt(r2^2 - v^2) - sqrt(r1^2 - v^2)) dv, with
        // integral sqrt(R^2 - v^2) dv from 0 to h = (h sqrt(R^2 - h^2) + R^2 asin(h / R)) / 2 (standard integral).
        const double h = 0.075, r1 = 90.075, r2 = 139.925;
        static double Quarter(double R, double t) => (t * Math.Sqrt(R * R - t * t) + R * R * Math.Asin(t / R)) / 2;
        double area = 7.0 / 360 * Math.PI * (r2 * r2 - r1 * r1) - 2 * (Quarter(r2, h) - Quarter(r1, h));
        foreach (var c in chains)
        {
            Assert.Equal(4, c[1].GetInt32());
            Assert.True(c[2].GetBoolean());
            Assert.InRange(c[3].GetDouble(), 0, 1e-9);
            Assert.True(Math.Abs(-area - c[4].GetDouble()) < 1e-9, $"window area {c[4].GetDouble()}, expected {-area}");
        }
        var arcs = r.GetProperty("arcs").EnumerateArray().ToList();
        Assert.Equal(72, arcs.Count);
        Assert.All(arcs, a => Assert.True(a[1].GetDouble() == 0 && a[2].GetDouble() == 0, "centred on the disc"));
        Assert.Equal(36, arcs.Count(a => Math.Abs(a[3].GetDouble() - 90.075) < 1e-12));
        Assert.Equal(36, arcs.Count(a => Math.Abs(a[3].GetDouble() - 139.925) < 1e-12));
    }

    [Fact]
    public void LinesShareTheirEndPointsDigitForDigit()
    {
        // Neighbouring LINEs of the mark rectangle: the end (11/21) of one is the start (10/20) of the next, as text.
        string text = Encoding.ASCII.GetString(Write(SamplePlate.Sheet(), DxfContours.Entities));
        var lines = text.Split("\r\n");
        var segs = new List<(string X0, string Y0, string X1, string Y1)>();
        for (int i = 0; i + 1 < lines.Length; i += 2)
        {
            if (lines[i].Trim() != "0" || lines[i + 1] != "LINE") continue;
            var g = new Dictionary<string, string>();
            for (int j = i + 2; lines[j].Trim() != "0"; j += 2) g[lines[j].Trim()] = lines[j + 1];
            segs.Add((g["10"], g["20"], g["11"], g["21"]));
        }
        // The first four LINEs are the rectangle mark, a closed loop.
        for (int i = 0; i < 4; i++)
        {
            var (a, b) = (segs[i], segs[(i + 1) % 4]);
            Assert.Equal((a.X1, a.Y1), (b.X0, b.Y0));
        }
    }
}
