using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using System.Xml;
using PartForge.Formats.Cutting;
using PartForge.Formats.Svg;
using PartForge.Formats.Tests.Cutting;
using PartForge.Formats.Tests.Golden;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Formats.Tests.Svg;

public class SvgWriterTests
{
    private const string SvgNs = "http://www.w3.org/2000/svg";

    private static byte[] Write(CutSheet sheet)
    {
        using var ms = new MemoryStream();
        SvgWriter.Write(ms, sheet);
        return ms.ToArray();
    }

    private static XmlDocument Parse(byte[] bytes)
    {
        // System.Xml as the reader; DTDs are not used and not allowed.
        var doc = new XmlDocument();
        using var reader = XmlReader.Create(new MemoryStream(bytes), new XmlReaderSettings { DtdProcessing = DtdProcessing.Prohibit });
        doc.Load(reader);
        return doc;
    }

    private static double D(string s) => double.Parse(s, NumberStyles.Float, CultureInfo.InvariantCulture);

    [Fact]
    public void MatchesTheGoldenFile() => GoldenFile.AssertMatches("plate.svg", Write(SamplePlate.Sheet()));

    [Fact]
    public void RewriteIsByteIdenticalInAnyCulture()
    {
        var first = Write(SamplePlate.Sheet());
        Assert.Equal(first, Write(SamplePlate.Sheet()));
        Assert.Equal(first, HostileCulture.Run(() => Write(SamplePlate.Sheet())));
    }

    [Fact]
    public void ParsesWithMillimetreUnitsViewBoxAndLayerGroups()
    {
        var doc = Parse(Write(SamplePlate.Sheet()));
        var svg = doc.DocumentElement!;
        Assert.Equal("svg", svg.LocalName);
        Assert.Equal(SvgNs, svg.NamespaceURI);
        string width = svg.GetAttribute("width"), height = svg.GetAttribute("height");
        Assert.EndsWith("mm", width);
        Assert.EndsWith("mm", height);
        var vb = svg.GetAttribute("viewBox").Split(' ').Select(D).ToArray();
        Assert.Equal(4, vb.Length);
        // One user unit is one millimetre: the viewBox size equals the physical size.
        Assert.Equal(D(width[..^2]), vb[2], 12);
        Assert.Equal(D(height[..^2]), vb[3], 12);
        double m = SvgWriter.MarginMm, h = SamplePlate.Kerf / 2;
        Assert.Equal(-h - m, vb[0], 12);
        Assert.Equal(-(SamplePlate.Height + h + m), vb[1], 12); // y flipped: the top of the part is at -maxY
        Assert.Equal(SamplePlate.Width + 2 * h + 2 * m, vb[2], 12);

        var ns = new XmlNamespaceManager(doc.NameTable);
        ns.AddNamespace("s", SvgNs);
        var groups = svg.SelectNodes("s:g", ns)!.Cast<XmlElement>().ToList();
        Assert.Equal(new[] { "mark", "cut" }, groups.Select(g => g.GetAttribute("id")));
        Assert.All(groups, g =>
        {
            Assert.Equal("none", g.GetAttribute("fill"));
            Assert.Equal(SvgWriter.StrokeWidthMm, D(g.GetAttribute("stroke-width")));
        });
        var cut = groups[1];
        var circle = Assert.Single(cut.SelectNodes("s:circle", ns)!.Cast<XmlElement>());
        Assert.Equal(SamplePlate.HoleRadius - h, D(circle.GetAttribute("r")), 12);
        Assert.Equal(SamplePlate.HoleCenter.X, D(circle.GetAttribute("cx")), 12);
        Assert.Equal(-SamplePlate.HoleCenter.Y, D(circle.GetAttribute("cy")), 12);
        // Hole (slot) before the outline; both closed paths with true arcs.
        var paths = cut.SelectNodes("s:path", ns)!.Cast<XmlElement>().Select(p => p.GetAttribute("d")).ToList();
        Assert.Equal(2, paths.Count);
        Assert.All(paths, d => Assert.EndsWith("Z", d));
        var slotArcs = Regex.Matches(paths[0], @"A(\S+) (\S+) 0 0 ([01])").Select(x => (R: D(x.Groups[1].Value), Sweep: x.Groups[3].Value)).ToList();
        Assert.Equal(2, slotArcs.Count);
        Assert.All(slotArcs, a => Assert.Equal(SamplePlate.SlotRadius - h, a.R, 12));
        // The hole is clockwise in the design (y up): in SVG's y-down frame that is the positive-angle direction.
        Assert.All(slotArcs, a => Assert.Equal("1", a.Sweep));
        var cornerArcs = Regex.Matches(paths[1], @"A(\S+) (\S+) 0 0 ([01])").Select(x => D(x.Groups[1].Value)).ToList();
        Assert.Equal(4, cornerArcs.Count);
        Assert.All(cornerArcs, r => Assert.Equal(h, r, 12));
        // Marks keep their design size.
        var markCircle = Assert.Single(groups[0].SelectNodes("s:circle", ns)!.Cast<XmlElement>());
        Assert.Equal(0.5, D(markCircle.GetAttribute("r")));
        Assert.Contains("Kerf 0.2 mm compensated", svg.SelectSingleNode("s:desc", ns)!.InnerText);
    }

    [Fact]
    public void PathsAreExactAgainstTheSvgArcDefinition()
    {
        // Endpoint parametrisation of SVG 1.1 (implementation notes, F.6.5): from the endpoints, radius and
        // flags, recover the centre and check it against the design's arc centre (y negated).
        var doc = Parse(Write(SamplePlate.Sheet()));
        var d = doc.GetElementsByTagName("path").Cast<XmlElement>().First(p => ((XmlElement)p.ParentNode!).GetAttribute("id") == "cut").GetAttribute("d");
        var tokens = Regex.Matches(d, @"[MALZ]|-?[0-9.]+").Select(x => x.Value).ToList();
        var cur = new Vec2(0, 0);
        var centres = new List<Vec2>();
        for (int i = 0; i < tokens.Count;)
        {
            string cmd = tokens[i++];
            if (cmd == "M" || cmd == "L") { cur = new Vec2(D(tokens[i]), D(tokens[i + 1])); i += 2; }
            else if (cmd == "A")
            {
                double r = D(tokens[i]); bool sweep = tokens[i + 4] == "1";
                var end = new Vec2(D(tokens[i + 5]), D(tokens[i + 6])); i += 7;
                Vec2 mid = (cur + end) * 0.5, half = (end - cur) * 0.5;
                double hl = half.Length, off = Math.Sqrt(Math.Max(0, r * r - hl * hl));
                var perp = new Vec2(-half.Y / hl, half.X / hl);
                // large-arc = 0: the centre is on the side given by sweep (F.6.5.2, sign + when fA != fS).
                centres.Add(mid + perp * (sweep ? off : -off));
                cur = end;
            }
            else i++;
        }
        Assert.Equal(2, centres.Count);
        var expected = new[] { SamplePlate.SlotCenter + new Vec2(SamplePlate.SlotStraight / 2, 0), SamplePlate.SlotCenter - new Vec2(SamplePlate.SlotStraight / 2, 0) };
        // Half-turn arcs leave the centre ill-conditioned across the chord (the square root of a difference
        // at rounding level, about 1e-8 mm), hence 1e-6 mm here.
        foreach (var c in centres)
            Assert.Contains(expected, e => (new Vec2(e.X, -e.Y) - c).Length < 1e-6);
    }

    [Fact]
    public void TextIsEscaped()
    {
        var doc = Parse(Write(SamplePlate.Sheet() with { PartName = "a<b & \"c\"\u0001" }));
        Assert.Equal("a<b & \"c\" ", doc.GetElementsByTagName("title")[0]!.InnerText);
    }
}
