using System.Globalization;
using System.Text;
using System.Text.Json;
using PartForge.Formats.Cutting;
using PartForge.Formats.Dxf;
using PartForge.Formats.Tests.Cutting;
using PartForge.Formats.Tests.Golden;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Formats.Tests.Dxf;

public class DxfWriterTests
{
    private static byte[] Write(CutSheet sheet)
    {
        using var ms = new MemoryStream();
        DxfWriter.Write(ms, sheet);
        return ms.ToArray();
    }

    /// <summary>The file as (group code, value) pairs; asserts the line structure on the way.</summary>
    private static List<(int Code, string Value)> Pairs(byte[] bytes)
    {
        string text = Encoding.ASCII.GetString(bytes);
        Assert.All(bytes, b => Assert.True(b < 0x80, "DXF R12 text must be ASCII"));
        Assert.EndsWith("\r\n", text);
        var lines = text[..^2].Split("\r\n");
        Assert.DoesNotContain(lines, l => l.Contains('\n') || l.Contains('\r'));
        Assert.True(lines.Length % 2 == 0, "group codes and values come in pairs");
        var pairs = new List<(int, string)>();
        for (int i = 0; i < lines.Length; i += 2)
        {
            Assert.True(int.TryParse(lines[i], NumberStyles.AllowLeadingWhite, CultureInfo.InvariantCulture, out int code), $"line {i + 1} is not a group code: '{lines[i]}'");
            pairs.Add((code, lines[i + 1]));
        }
        return pairs;
    }

    [Fact]
    public void MatchesTheGoldenFile() => GoldenFile.AssertMatches("plate.dxf", Write(SamplePlate.Sheet()));

    [Fact]
    public void RewriteIsByteIdenticalInAnyCulture()
    {
        var first = Write(SamplePlate.Sheet());
        var saved = CultureInfo.CurrentCulture;
        try
        {
            var comma = (CultureInfo)CultureInfo.InvariantCulture.Clone();
            comma.NumberFormat.NumberDecimalSeparator = ",";
            comma.NumberFormat.NegativeSign = "~";
            CultureInfo.CurrentCulture = comma;
            Assert.Equal(first, Write(SamplePlate.Sheet()));
        }
        finally { CultureInfo.CurrentCulture = saved; }
    }

    [Fact]
    public void EntityStructureIsWellFormed()
    {
        // DXF reference (R12): sections HEADER, TABLES, BLOCKS, ENTITIES, then EOF; a POLYLINE is followed by
        // its VERTEX entities and ended by SEQEND. Checked here because ezdxf silently repairs a missing SEQEND.
        var pairs = Pairs(Write(SamplePlate.Sheet()));
        var sections = new List<string>();
        for (int i = 0; i < pairs.Count; i++)
            if (pairs[i] == (0, "SECTION")) sections.Add(pairs[i + 1].Value);
        Assert.Equal(new[] { "HEADER", "TABLES", "BLOCKS", "ENTITIES" }, sections);
        Assert.Equal((0, "EOF"), pairs[^1]);
        Assert.Equal(pairs.Count(p => p == (0, "SECTION")), pairs.Count(p => p == (0, "ENDSEC")));

        int start = pairs.IndexOf((2, "ENTITIES")) + 1;
        var entities = new List<(string Type, List<(int, string)> Groups)>();
        for (int i = start; pairs[i] != (0, "ENDSEC"); i++)
        {
            if (pairs[i].Code == 0) entities.Add((pairs[i].Value, new()));
            else entities[^1].Groups.Add(pairs[i]);
        }
        for (int i = 0; i < entities.Count; i++)
        {
            if (entities[i].Type != "POLYLINE") continue;
            Assert.Contains((66, "1"), entities[i].Groups);
            Assert.Contains((70, "1"), entities[i].Groups);
            int j = i + 1;
            while (entities[j].Type == "VERTEX") j++;
            Assert.True(j - i - 1 >= 2, "a closed polyline needs vertices");
            Assert.Equal("SEQEND", entities[j].Type);
            Assert.Equal(entities[i].Groups.Single(g => g.Item1 == 8), entities[j].Groups.Single(g => g.Item1 == 8));
        }
        Assert.Equal(entities.Count(e => e.Type == "POLYLINE"), entities.Count(e => e.Type == "SEQEND"));
        Assert.DoesNotContain(entities.Select((e, k) => (e, k)), x => x.e.Type == "VERTEX" && entities[x.k - 1].Type is not ("VERTEX" or "POLYLINE"));

        // Marks first, then holes (circle, slot), then the outline.
        var order = entities.Where(e => e.Type is "CIRCLE" or "POLYLINE").Select(e => (e.Type, e.Groups.Single(g => g.Item1 == 8).Item2)).ToArray();
        Assert.Equal(new[] { ("CIRCLE", "MARK"), ("POLYLINE", "MARK"), ("CIRCLE", "CUT"), ("POLYLINE", "CUT"), ("POLYLINE", "CUT") }, order);

        var header = pairs.Take(pairs.IndexOf((0, "ENDSEC"))).ToList();
        Assert.Equal((1, "AC1009"), header[header.IndexOf((9, "$ACADVER")) + 1]);
        Assert.Equal((70, "4"), header[header.IndexOf((9, "$INSUNITS")) + 1]);
        Assert.Contains(pairs, p => p.Code == 999 && p.Value.Contains("kerf 0.2 mm compensated"));
    }

    private const string EzdxfScript = """
import sys, json, math, ezdxf
doc = ezdxf.readfile(sys.argv[1])
auditor = doc.audit()
msp = doc.modelspace()
def arcs_and_area(pl):
    # Bulge = tan(sweep / 4) (DXF reference, VERTEX group 42); area from the chord polygon plus circular segments.
    pts = [(v.dxf.location.x, v.dxf.location.y, v.dxf.bulge) for v in pl.vertices]
    area, radii = 0.0, []
    for i, (x0, y0, b) in enumerate(pts):
        x1, y1, _ = pts[(i + 1) % len(pts)]
        area += (x0 * y1 - x1 * y0) / 2
        if b != 0:
            theta = 4 * math.atan(b)
            chord = math.hypot(x1 - x0, y1 - y0)
            r = chord / (2 * abs(math.sin(theta / 2)))
            radii.append(r)
            area += r * r / 2 * (theta - math.sin(theta))
    return area, radii
out = {
  "version": doc.dxfversion,
  "errors": len(auditor.errors),
  "fixes": len(auditor.fixes),
  "insunits": doc.header.get("$INSUNITS"),
  "layers": {l.dxf.name: l.dxf.color for l in doc.layers},
  "circles": [[e.dxf.layer, e.dxf.center.x, e.dxf.center.y, e.dxf.radius] for e in msp.query("CIRCLE")],
  "polylines": [[e.dxf.layer, e.is_closed, len(e.vertices)] + list(arcs_and_area(e)) for e in msp.query("POLYLINE")],
  "texts": [[e.dxf.layer, e.dxf.text] for e in msp.query("TEXT")],
}
print(json.dumps(out))
""";

    [Fact]
    public void EzdxfReadsItBack()
    {
        // Independent reader: Debian's python3-ezdxf (readfile + audit).
        string path = ExternalReader.TempFile(".dxf");
        File.WriteAllBytes(path, Write(SamplePlate.Sheet()));
        var r = ExternalReader.PythonJson(EzdxfScript, path);
        File.Delete(path);

        Assert.Equal("AC1009", r.GetProperty("version").GetString());
        Assert.Equal(0, r.GetProperty("errors").GetInt32());
        Assert.Equal(0, r.GetProperty("fixes").GetInt32()); // nothing had to be repaired either
        Assert.Equal(4, r.GetProperty("insunits").GetInt32());
        var layers = r.GetProperty("layers");
        Assert.Equal(DxfLayers.CutColor, layers.GetProperty("CUT").GetInt32());
        Assert.Equal(DxfLayers.MarkColor, layers.GetProperty("MARK").GetInt32());

        double h = SamplePlate.Kerf / 2;
        var circles = r.GetProperty("circles").EnumerateArray().ToList();
        var cutCircle = Assert.Single(circles, c => c[0].GetString() == "CUT");
        Assert.Equal(SamplePlate.HoleRadius - h, cutCircle[3].GetDouble(), 12);
        Assert.Equal(SamplePlate.HoleCenter.X, cutCircle[1].GetDouble(), 12);
        var markCircle = Assert.Single(circles, c => c[0].GetString() == "MARK");
        Assert.Equal(0.5, markCircle[3].GetDouble(), 12); // marks are not compensated

        var polys = r.GetProperty("polylines").EnumerateArray().ToList();
        Assert.Equal(3, polys.Count);
        Assert.All(polys, p => Assert.True(p[1].GetBoolean(), "every polyline is closed"));
        // The slot (clockwise hole): its arcs have the design radius less half the kerf; stadium area.
        var slot = polys[1];
        double rs = SamplePlate.SlotRadius - h;
        Assert.All(slot[4].EnumerateArray(), x => Assert.Equal(rs, x.GetDouble(), 9));
        Assert.Equal(-(2 * rs * SamplePlate.SlotStraight + Math.PI * rs * rs), slot[3].GetDouble(), 9);
        // The outline: four round corners of radius kerf/2; Steiner's formula A + P h + pi h^2.
        var outline = polys[2];
        Assert.Equal(4, outline[4].GetArrayLength());
        Assert.All(outline[4].EnumerateArray(), x => Assert.Equal(h, x.GetDouble(), 9));
        double w = SamplePlate.Width, ht = SamplePlate.Height;
        Assert.Equal(w * ht + 2 * (w + ht) * h + Math.PI * h * h, outline[3].GetDouble(), 9);
        // The mark rectangle is written as designed: 6 x 2.
        Assert.Equal(12, polys[0][3].GetDouble(), 9);

        var text = Assert.Single(r.GetProperty("texts").EnumerateArray());
        Assert.Equal("NOTES", text[0].GetString());
        Assert.Contains("kerf 0.2 mm", text[1].GetString());
    }

    [Fact]
    public void ArcsBeyondAHalfTurnAreSplitAndStillExact()
    {
        // A keyhole-like outline: a 300 degree arc closed by two lines through the centre region.
        var arc = new ArcSegment(new Vec2(0, 0), 10, 30, 300);
        var c = Contour.FromSegments(new Segment[] { arc, new LineSegment(arc.End, new Vec2(0, 0)), new LineSegment(new Vec2(0, 0), arc.Start) });
        string path = ExternalReader.TempFile(".dxf");
        using (var f = File.Create(path)) DxfWriter.Write(f, CutSheet.Of("pie", Profile.Of(c), 0));
        var r = ExternalReader.PythonJson(EzdxfScript, path);
        File.Delete(path);
        Assert.Equal(0, r.GetProperty("errors").GetInt32());
        var poly = Assert.Single(r.GetProperty("polylines").EnumerateArray());
        Assert.Equal(2, poly[4].GetArrayLength());
        Assert.Equal(300.0 / 360 * Math.PI * 100, poly[3].GetDouble(), 9);
    }

    [Fact]
    public void DiscWithAHundredHolesReadsBackCompensated()
    {
        // 400 mm disc, 64 round holes D15.2 on r 180 and 36 annular-sector windows (r 90..140, 7 degrees), kerf 0.15.
        var holes = new List<Contour>();
        for (int i = 0; i < 64; i++) holes.Add(Contour.FullCircle(Vec2.FromAngleDeg(i * 360.0 / 64) * 180, 7.6));
        for (int i = 0; i < 36; i++) holes.Add(Contour.AnnularSector(90, 140, i * 10 + 1, 7));
        var sheet = CutSheet.Of("disc", new Profile(new[] { Contour.FullCircle(new Vec2(0, 0), 200) }, holes), 0.15);
        string path = ExternalReader.TempFile(".dxf");
        DxfWriter.WriteFile(path, sheet);
        var r = ExternalReader.PythonJson(EzdxfScript, path);
        File.Delete(path);
        Assert.Equal(0, r.GetProperty("errors").GetInt32());
        var circles = r.GetProperty("circles").EnumerateArray().Select(c => c[3].GetDouble()).ToList();
        Assert.Equal(65, circles.Count);
        Assert.Equal(64, circles.Count(x => Math.Abs(x - (7.6 - 0.075)) < 1e-12));
        Assert.Equal(200.075, circles[^1], 12); // the outline comes last
        var polys = r.GetProperty("polylines").EnumerateArray().ToList();
        Assert.Equal(36, polys.Count);
        foreach (var p in polys)
        {
            Assert.True(p[1].GetBoolean());
            // A shrunk window keeps sharp corners: two concentric arcs, radii 90 + h and 140 - h.
            var radii = p[4].EnumerateArray().Select(x => x.GetDouble()).OrderBy(x => x).ToArray();
            Assert.Equal(2, radii.Length);
            Assert.Equal(90.075, radii[0], 9);
            Assert.Equal(139.925, radii[1], 9);
        }
    }

    [Fact]
    public void NonAsciiNamesAreEscaped()
    {
        var bytes = Write(SamplePlate.Sheet() with { PartName = "Läufer\nplate" });
        string text = Encoding.ASCII.GetString(bytes);
        Assert.Contains("L\\U+00E4ufer plate", text);
        Pairs(bytes);
    }

    [Fact]
    public void FileIsWrittenAtomically()
    {
        string path = ExternalReader.TempFile(".dxf");
        DxfWriter.WriteFile(path, SamplePlate.Sheet());
        Assert.Equal(Write(SamplePlate.Sheet()), File.ReadAllBytes(path));
        var bad = CutSheet.Of("p", Profile.Of(Contour.Rectangle(new Vec2(0, 0), 10, 10, 0), Contour.FullCircle(new Vec2(0, 0), 0.05)), 0.15);
        Assert.Throws<KerfCompensationException>(() => DxfWriter.WriteFile(path, bad));
        Assert.Equal(Write(SamplePlate.Sheet()), File.ReadAllBytes(path)); // the previous file is untouched
        // Only this file's temporary name (".<name>.<random>.partial"): other tests write beside it at the same time.
        Assert.Empty(Directory.GetFiles(Path.GetDirectoryName(path)!, "." + Path.GetFileName(path) + ".*.partial"));
        File.Delete(path);
    }

    [Fact]
    public void TooSmallHoleIsReportedNotWritten()
    {
        using var ms = new MemoryStream();
        var sheet = CutSheet.Of("p", Profile.Of(Contour.Rectangle(new Vec2(0, 0), 10, 10, 0), Contour.FullCircle(new Vec2(0, 0), 0.05)), 0.15);
        Assert.Throws<KerfCompensationException>(() => DxfWriter.Write(ms, sheet));
        Assert.Equal(0, ms.Length);
    }
}
