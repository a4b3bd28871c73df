using System.Diagnostics;
using System.Globalization;
using System.Text.RegularExpressions;
using System.Xml.Linq;
using PartForge.Checks;
using PartForge.Export.Bom;
using PartForge.Export.Report;

namespace PartForge.Export.Tests.Report;

public class HtmlReportTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    private static List<XElement> SvgBlocks(string html) =>
        Regex.Matches(html, "<svg .*?</svg>", RegexOptions.Singleline).Select(m => XElement.Parse(m.Value)).ToList();

    private static Dictionary<string, double> Dims(XElement svg) =>
        svg.Descendants().Where(e => e.Attribute("data-dim") != null)
           .GroupBy(e => e.Attribute("data-dim")!.Value)
           .ToDictionary(g => g.Key, g => double.Parse(g.First().Attribute("data-value")!.Value, CultureInfo.InvariantCulture));

    public static IEnumerable<object[]> Presets() => Pipeline.Presets();

    [Theory]
    [MemberData(nameof(Presets))]
    public void Drawing_dimensions_equal_the_design_values(string preset)
    {
        var ev = Pipeline.Evaluate(preset);
        var d = Pipeline.Design(preset);
        string html = HtmlReport.Render(ReportFiles.InputOf(ev, false, embedAssemblyPreview: false));
        var drawings = SvgBlocks(html).Where(s => s.Attribute("data-part") != null).ToDictionary(s => s.Attribute("data-part")!.Value);
        Assert.Equal(ev.Parts!.Parts.Select(p => p.Name).OrderBy(n => n), drawings.Keys.OrderBy(n => n));

        foreach (var (name, svg) in drawings)
        {
            var dims = Dims(svg);
            if (name.StartsWith("rotor", StringComparison.Ordinal))
            {
                Assert.Equal(d.Rotor.OuterDiameter, dims["outer_diameter"]);
                if (d.Rotor.Bore > 0) Assert.Equal(d.Rotor.Bore, dims["bore"]);
                Assert.Equal(d.Machine.Poles, dims["pocket_count"]);
                double c = d.Rotor.PocketClearance;
                switch (d.Magnets.Shape)
                {
                    case "disc": Assert.Equal(d.Magnets.Diameter!.Value + c, dims["pocket_diameter"], 4); break;
                    case "block":
                        Assert.Equal(d.Magnets.Length!.Value + c, dims["pocket_length"], 4);
                        Assert.Equal(d.Magnets.Width!.Value + c, dims["pocket_width"], 4);
                        break;
                    case "sector":
                    {
                        Assert.Equal(d.Magnets.Length!.Value + c, dims["pocket_length"], 4);
                        // Every side moved out by c/2: a side of slope k gains c/2 sqrt(1 + k^2) across it and c/2 k
                        // along the outer edge moved out by c/2 (plane geometry).
                        double k = (d.Magnets.OuterWidth!.Value - d.Magnets.InnerWidth!.Value) / (2 * d.Magnets.Length!.Value);
                        Assert.Equal(d.Magnets.OuterWidth!.Value + c * (k + Math.Sqrt(1 + k * k)), dims["pocket_outer_width"], 4);
                        break;
                    }
                    default:
                        Assert.Equal(d.Magnets.InnerRadius!.Value - c / 2, dims["pocket_inner_radius"], 4);
                        Assert.Equal(d.Magnets.OuterRadius!.Value + c / 2, dims["pocket_outer_radius"], 4);
                        break;
                }
                if (d.Magnets.PitchRadius is { } pr) Assert.Equal(2 * pr, dims["pitch_circle"], 4);
                if (d.Rotor.BoltCircle is { } bc)
                {
                    Assert.Equal(bc.Diameter, dims["bolt_circle"]);
                    Assert.Equal(bc.Count, dims["bolt_count"]);
                    Assert.Equal(bc.Hole, dims["bolt_hole"]);
                }
                // One polarity badge per pocket, alternating N/S around the rotor (all N with same-pole magnets).
                var poles = svg.Descendants().Where(e => e.Attribute("data-pole") != null).Select(e => e.Attribute("data-pole")!.Value).ToList();
                Assert.Equal(d.Machine.Poles, poles.Count);
                Assert.Equal(d.Magnets.Arrangement == "same" ? d.Machine.Poles : d.Machine.Poles / 2, poles.Count(p => p == "N"));
            }
            else if (name.StartsWith("stator", StringComparison.Ordinal))
            {
                Assert.Equal(d.Stator.OuterDiameter, dims["outer_diameter"]);
                if (d.Stator.InnerDiameter > 0) Assert.Equal(d.Stator.InnerDiameter, dims["inner_diameter"]);
                Assert.Equal(d.Machine.Coils, dims["seat_count"]);
                if (d.Stator.Mount is { } mt)
                {
                    Assert.Equal(mt.CircleDiameter, dims["mount_circle"]);
                    Assert.Equal(mt.Count, dims["mount_count"]);
                    Assert.Equal(mt.Hole, dims["mount_hole"]);
                }
            }
        }
    }

    [Theory]
    [MemberData(nameof(Presets))]
    public void Half_section_running_gap_is_the_checkers_value(string preset)
    {
        var ev = Pipeline.Evaluate(preset);
        string html = HtmlReport.Render(ReportFiles.InputOf(ev, false, embedAssemblyPreview: false));
        var section = SvgBlocks(html).Single(s => (string?)s.Attribute("data-section") == "half");
        var gaps = section.Descendants().Where(e => ((string?)e.Attribute("data-dim"))?.StartsWith("running_gap:") == true).ToList();
        var checker = ev.Checks.WithId(CheckIds.RunningGap).ToList();
        Assert.NotEmpty(checker);
        Assert.NotEmpty(gaps);
        foreach (var g in gaps)
        {
            string part = g.Attribute("data-dim")!.Value["running_gap:".Length..];
            double expected = checker.Where(c => c.PartName == part).Min(c => c.Value);
            Assert.Equal(Math.Round(expected, 4), double.Parse(g.Attribute("data-value")!.Value, CultureInfo.InvariantCulture));
        }
        // Every rotating part the checker reports a running gap for is marked in the section.
        Assert.Equal(checker.Select(c => c.PartName).Distinct().OrderBy(p => p), gaps.Select(g => g.Attribute("data-dim")!.Value["running_gap:".Length..]).Distinct().OrderBy(p => p));
    }

    [Theory]
    [MemberData(nameof(Presets))]
    public void Bom_quantities_follow_the_design_and_the_wire_total(string preset)
    {
        var ev = Pipeline.Evaluate(preset);
        var d = Pipeline.Design(preset);
        var bom = ReportFiles.BomOf(ev);
        int rotors = d.Machine.Layout == "dual-rotor" ? 2 : 1, stators = d.Machine.Layout == "dual-stator" ? 2 : 1;
        Assert.Equal(d.Machine.Poles * rotors, bom.InCategory("magnets").Single().Quantity);
        // Wire to buy = the engine's total (one coil's wire incl. leads x every coil) + 10 % + 1 m.
        double total = ev.Electrical.Coil!.WireLengthM * d.Machine.Coils * stators;
        var wire = bom.InCategory("wire").First(l => l.Unit == "m");
        Assert.Equal(Math.Round(total * 1.10 + 1.0, 2), wire.Quantity, 6);
        Assert.Equal(d.Machine.Coils * stators, bom.InCategory("formers").Single().Quantity);
        // One fastener per hole of a joint: a dual-rotor's rotors share through-studs, a dual-stator's stators too,
        // so each bolt circle counts once; the last rotor of a dual-rotor machine has a jacking screw between each
        // pair of bolt holes.
        var fasteners = bom.InCategory("fasteners").Where(f => !f.Item.Contains("jacking", StringComparison.Ordinal)).ToList();
        int expectedFasteners = (d.Rotor.BoltCircle?.Count ?? 0) + (d.Stator.Mount?.Count ?? 0);
        Assert.Equal(expectedFasteners, (int)fasteners.Sum(f => f.Quantity));
        var jacking = bom.InCategory("fasteners").Where(f => f.Item.Contains("jacking", StringComparison.Ordinal)).ToList();
        Assert.Equal(rotors == 2 ? d.Rotor.BoltCircle?.Count ?? 0 : 0, (int)jacking.Sum(f => f.Quantity));
        if (d.Sensor.Kind != "none") Assert.Equal(ev.Machine.Sensor.Count, bom.InCategory("sensors").Single().Quantity);
        // Every part appears with its quantity.
        foreach (var p in ev.Parts!.Parts)
            Assert.Contains(bom.Lines, l => (l.Item == p.Name || (p.Name == "former" && l.Category == "formers")) && l.Quantity == p.Quantity);
    }

    [Fact]
    public void Two_renders_are_byte_identical_and_png_included()
    {
        var ev = Pipeline.Evaluate("wind-duo");
        Assert.Equal(ReportFiles.Html(ev, false), ReportFiles.Html(ev, false));
        Assert.Equal(ReportFiles.Bom(ev), ReportFiles.Bom(ev));
        var a = ReportFiles.Pngs(ev);
        var b = ReportFiles.Pngs(ev);
        Assert.Equal(a.Select(x => x.FileName), b.Select(x => x.FileName));
        for (int i = 0; i < a.Count; i++) Assert.Equal(a[i].Png, b[i].Png);
        Assert.Contains(a, x => x.FileName == "wind-duo-assembly.png");
    }

    [Fact]
    public void A_forced_build_carries_the_failed_banner()
    {
        var ev = Pipeline.Evaluate("crank-bench");
        string forced = HtmlReport.Render(ReportFiles.InputOf(ev, true, false));
        string normal = HtmlReport.Render(ReportFiles.InputOf(ev, false, false));
        Assert.Contains("id=\"failed-banner\"", forced);
        Assert.DoesNotContain("failed-banner", normal);
    }

    [Fact]
    public void The_report_is_self_contained_and_carries_the_cautions()
    {
        var ev = Pipeline.Evaluate("pulse-sculpture");
        string html = HtmlReport.Render(ReportFiles.InputOf(ev, false));
        // Two scripts only: the 3D view's scene data and the project's own viewer code, neither naming a URL.
        var scripts = Regex.Matches(html, "<script[^>]*>(.*?)</script>", RegexOptions.Singleline).ToList();
        Assert.Equal(2, scripts.Count);
        Assert.Equal(Viewer3d.Script, scripts[1].Groups[1].Value.Trim('\n'), StringComparer.Ordinal);
        Assert.DoesNotMatch("https?:|fetch\\(|XMLHttpRequest|import\\(|WebSocket|EventSource", Viewer3d.Script);
        Assert.DoesNotMatch("https?:", scripts[0].Groups[1].Value);
        Assert.DoesNotMatch("(src|href)=\"(https?:)?//", html);
        Assert.DoesNotContain("@import", html);
        foreach (var (title, _) in Cautions.All) Assert.Contains(title, html);
        Assert.Contains("local electrical codes", html);
        // The plots have axes with units.
        Assert.Contains("rotor position, electrical degrees", html);
        Assert.Contains("back-EMF, V", html);
    }

    [Fact]
    public void Headless_chromium_renders_a_non_blank_page()
    {
        const string chromium = "/usr/bin/chromium";
        Assert.True(File.Exists(chromium), "Debian's chromium package is needed for this test (scripts/test.sh installs it)");
        var ev = Pipeline.Evaluate("wind-duo");
        string dir = Directory.CreateTempSubdirectory("pf-report-").FullName;
        try
        {
            string html = Path.Combine(dir, "r.html"), shot = Path.Combine(dir, "shot.png"), profile = Path.Combine(dir, "profile");
            File.WriteAllBytes(html, ReportFiles.Html(ev, false));
            var psi = new ProcessStartInfo(chromium,
            [
                "--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
                "--disable-component-update", "--disable-sync", "--user-data-dir=" + profile, "--screenshot=" + shot,
                "--window-size=1200,3000", "file://" + html,
            ]) { RedirectStandardOutput = true, RedirectStandardError = true };
            using var p = Process.Start(psi)!;
            var err = p.StandardError.ReadToEndAsync();
            p.StandardOutput.ReadToEnd();
            Assert.True(p.WaitForExit(120_000), "chromium did not finish in 2 minutes");
            Assert.True(File.Exists(shot), "no screenshot; chromium said: " + err.Result);
            var (w, h, bg, nonBg, colours) = PngProbe.Probe(shot);
            Assert.Equal(1200, w);
            Assert.Equal(3000, h);
            // The commonest colour is the report's paper or card colour (ReportStyle); text, tables and drawings cover a good part of the rest.
            Assert.Contains(bg, new[] { "f7f5ef", "fffefb" });
            Assert.True(nonBg > w * h / 10, $"only {nonBg} of {w * h} pixels differ from the background");
            Assert.True(colours > 50, $"only {colours} distinct colours");
        }
        finally { Directory.Delete(dir, true); }
    }
}

/// <summary>Every number of the report's electrical table is in the results document, at the path the row names.</summary>
public class ReportNumbersInResultsTests
{
    public static IEnumerable<object[]> Presets() => Pipeline.Presets();

    [Theory]
    [MemberData(nameof(Presets))]
    public void Every_electrical_row_of_the_report_is_a_value_of_the_results_document(string preset)
    {
        var ev = Pipeline.Evaluate(preset);
        string html = HtmlReport.Render(ReportFiles.InputOf(ev, false, embedAssemblyPreview: false));
        using var json = System.Text.Json.JsonDocument.Parse(PartForge.Export.Results.ResultsJson.Serialize(PartForge.Export.Results.ResultsBuilder.Build(ev)));
        var table = Regex.Match(html, "<table[^>]*id=\"electrical-table\".*?</table>", RegexOptions.Singleline).Value;
        var rows = Regex.Matches(table, "<tr data-key=\"([^\"]+)\"><th>.*?</th><td class=\"num\">([^<]*)</td>").ToList();
        Assert.True(rows.Count > 25, $"{preset}: only {rows.Count} keyed rows in the electrical table");
        foreach (Match row in rows)
        {
            string path = row.Groups[1].Value, shown = row.Groups[2].Value;
            var node = json.RootElement;
            foreach (var part in path.Split('.'))
            {
                Assert.True(node.TryGetProperty(part, out var next), $"{preset}: the report shows {path} = {shown} but the results document has no {path}");
                node = next;
            }
            double value = node.GetDouble();
            int decimals = shown.Contains('.') ? shown.Length - shown.IndexOf('.') - 1 : 0;
            Assert.True(Math.Round(value, decimals) == double.Parse(shown, CultureInfo.InvariantCulture),
                $"{preset}: the report shows {path} = {shown}, the results document {value}");
        }
    }
}
