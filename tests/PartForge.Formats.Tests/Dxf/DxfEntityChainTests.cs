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
    /// Reads the file with ezdxf, audits it, and walks the LINE and ARC entities in file order into chains: a
    /// chain starts at an entity and follows the entity that shares the current end point (an ARC may be
    /// walked from its end angle back to its start angle) until it returns to where it started. ezdxf computes
    /// each ARC's end points from centre, radius and angles itself. Each chain reports its layer, entity count,
    /// whether it closed, the largest gap between consecutive end points, and its signed area (shoelace over
    /// the end points plus the circular segment of every arc, sign by the walking direction).
    /// </summary>
    private const string ChainScript = """
import sys, json, math, ezdxf
doc = ezdxf.readfile(sys.argv[1])
auditor = doc.audit()
msp = doc.modelspace()
TOL = 1e-6
ents = []
for e in msp:
    t = e.dxftype()
    if t == "LINE":
        s, q = e.dxf.start, e.dxf.end
        ents.append({"t": "LINE", "layer": e.dxf.layer, "a": (s.x, s.y), "b": (q.x, q.y)})
    elif t == "ARC":
        s, q = e.start_point, e.end_point
        span = (e.dxf.end_angle - e.dxf.start_angle) % 360.0
        if span == 0: span = 360.0
        ents.append({"t": "ARC", "layer": e.dxf.layer, "a": (s.x, s.y), "b": (q.x, q.y), "r": e.dxf.radius, "span": span})
def dist(p, q): return math.hypot(p[0] - q[0], p[1] - q[1])
def walk(start, first_rev):
    # returns (end index, closed, max gap, area) walking from ents[start]
    e = ents[start]
    a, b = (e["b"], e["a"]) if first_rev else (e["a"], e["b"])
    origin, cur, gap, area, k = a, b, 0.0, 0.0, start
    def add(e, p, q, rev):
        nonlocal area
        area += (p[0] * q[1] - q[0] * p[1]) / 2
        if e["t"] == "ARC":
            phi = math.radians(e["span"]) * (-1 if rev else 1)
            area += e["r"] ** 2 / 2 * (phi - math.sin(phi))
    add(e, a, b, first_rev)
    while dist(cur, origin) > TOL:
        k += 1
        if k >= len(ents): return None
        e = ents[k]
        if dist(cur, e["a"]) <= TOL: rev = False; p, q = e["a"], e["b"]
        elif dist(cur, e["b"]) <= TOL: rev = True; p, q = e["b"], e["a"]
        else: return None
        gap = max(gap, dist(cur, p)); add(e, p, q, rev); cur = q
    gap = max(gap, dist(cur, origin))
    return k, gap, area
chains, i = [], 0
while i < len(ents):
    r = walk(i, False) or walk(i, True)
    if r is None:
        chains.append([ents[i]["layer"], 1, False, -1.0, 0.0]); i += 1; continue
    k, gap, area = r
    chains.append([ents[i]["layer"], k - i + 1, True, gap, area]); i = k + 1
out = {
  "errors": len(auditor.errors),
  "fixes": len(auditor.fixes),
  "types": [e.dxftype() for e in msp],
  "arcs": [[e.dxf.layer, e.dxf.center.x, e.dxf.center.y, e.dxf.radius, e.start_point.x, e.start_point.y, e.end_point.x, e.end_point.y]
           for e in msp.query("ARC")],
  "circles": [[e.dxf.layer, e.dxf.center.x, e.dxf.center.y, e.dxf.radius] for e in msp.query("CIRCLE")],
  "chains": chains,
}
print(json.dumps(out))
""";

    private static JsonElement Read(CutSheet sheet, DxfContours contours = DxfContours.Entities)
    {
        string path = ExternalReader.TempFile(".dxf");
        DxfWriter.WriteFile(path, sheet, contours);
        try { return ExternalReader.PythonJson(ChainScript, path); }
        finally { File.Delete(path); }
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
        string path = ExternalReader.TempFile(".dxf");
        DxfWriter.WriteFile(path, sheet);
        var polyAreas = ExternalReader.PythonJson("""
import sys, json, math, ezdxf
doc = ezdxf.readfile(sys.argv[1])
out = []
for pl in doc.modelspace().query("POLYLINE"):
    pts = [(v.dxf.location.x, v.dxf.location.y, v.dxf.bulge) for v in pl.vertices]
    area = 0.0
    for i, (x0, y0, b) in enumerate(pts):
        x1, y1, _ = pts[(i + 1) % len(pts)]
        area += (x0 * y1 - x1 * y0) / 2
        if b != 0:
            theta = 4 * math.atan(b)
            r = math.hypot(x1 - x0, y1 - y0) / (2 * abs(math.sin(theta / 2)))
            area += r * r / 2 * (theta - math.sin(theta))
    out.append(area)
print(json.dumps(out))
""", path).EnumerateArray().Select(x => x.GetDouble()).ToArray();
        File.Delete(path);
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
