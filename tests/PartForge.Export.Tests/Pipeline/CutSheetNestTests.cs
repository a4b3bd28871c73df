using System.Globalization;
using System.Text.Json;
using PartForge.Design.Presets;
using PartForge.Export.Pipeline;

namespace PartForge.Export.Tests.Pipeline;

/// <summary>
/// The nested cut sheets of every preset with cut parts, and of designs whose parts need several sheets, read
/// back by an independent reader: Debian's python3-ezdxf (Scripts/read_dxf_sheets.py flattens every CUT-layer
/// entity to within 0.001 mm of the true curve and measures it). On every sheet: no two parts overlap and the
/// cutter's centre lines of two parts are at least cutter.spacing - kerf apart (design outlines cutter.spacing
/// apart: each centre line lies kerf/2 outside its part); every centre line at least cutter.spacing - kerf/2
/// inside the sheet edge; every hole inside its part (no loop nested two deep); and, matching each part on a
/// sheet to a per-part DXF by its area and hole count, as many copies of each part as the BOM CSV lists.
/// Source for the entities: DXF reference (R12), POLYLINE/VERTEX bulge and CIRCLE.
/// </summary>
public sealed class CutSheetNestTests : IDisposable
{
    private readonly string _dir = Path.Combine(Path.GetTempPath(), "pf-sheets-" + Guid.NewGuid().ToString("N"));

    public void Dispose()
    {
        if (Directory.Exists(_dir)) Directory.Delete(_dir, true);
    }

    /// <summary>Flattening distance of the reader, and the slack it allows in a measured distance (chords lie inside arcs).</summary>
    private const double Flat = 0.001, Slack = 0.003;

    public static TheoryData<string, string> Designs()
    {
        var d = new TheoryData<string, string>();
        foreach (var p in PresetLibrary.All) d.Add(p.Name, "");
        // wind-duo's rotors cut from acrylic with through pockets (marks, block pockets, a rim notch): with the back
        // irons and hub spacer that is three stocks; small sheets, two of a size per stock, then a larger size.
        d.Add("wind-duo", "cutter:\n  sheets: \"170x170:1, 400x200\"\n  spacing: 3\n");
        d.Add("creek-sector", "cutter:\n  sheets: \"200x180:1, 330x180:1, 400x400\"\n  kerf: 0.3\n");
        return d;
    }

    private (string OutDir, string Name) Build(string preset, string extra, string formats)
    {
        Directory.CreateDirectory(_dir);
        string text = PresetLibrary.Find(preset)!.Text + extra;
        if (preset == "wind-duo" && extra.Length > 0)
            text = text.Replace("pocket_floor: 1.5", "pocket_floor: 0", StringComparison.Ordinal) + "parts:\n  rotor: { process: cut, material: acrylic }\n";
        string tag = preset + "-" + (extra.Length == 0 ? "plain" : "small");
        string design = Path.Combine(_dir, tag + ".yaml");
        File.WriteAllText(design, text);
        string outDir = Path.Combine(_dir, tag);
        var r = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = outDir, Formats = formats });
        Assert.True(r.Status == PipelineStatus.Ok, string.Join("\n", r.Problems));
        return (outDir, preset);
    }

    [Theory]
    [MemberData(nameof(Designs))]
    public void Every_sheet_holds_its_parts_apart_and_inside_and_every_copy_of_the_BOM(string preset, string extra)
    {
        var (outDir, name) = Build(preset, extra, "dxf,svg,csv");
        var bom = BomCut(Path.Combine(outDir, name + "-bom.csv"));
        var sheets = Directory.GetFiles(outDir, name + "-sheet-*.dxf").OrderBy(f => f.Length).ThenBy(f => f, StringComparer.Ordinal).ToArray();
        if (bom.Parts.Count == 0)
        {
            Assert.Empty(sheets);
            return;
        }
        Assert.Equal(bom.Sheets, sheets.Length);
        foreach (var s in sheets) Assert.True(File.Exists(Path.ChangeExtension(s, ".svg")), $"{s}: no SVG beside it");

        var singles = bom.Parts.Keys.Select(p => Path.Combine(outDir, $"{name}-{p}.dxf")).ToArray();
        var read = ExternalReaders.PythonJson(File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "Scripts", "read_dxf_sheets.py")),
            [Flat.ToString(CultureInfo.InvariantCulture), .. singles, .. sheets]).EnumerateArray().ToArray();
        var (spacing, kerf) = Cutter(extra);

        // Each part's signature from its own DXF: area of the centre-line loops and hole count.
        var sig = new Dictionary<string, (double Area, int Holes)>();
        for (int i = 0; i < singles.Length; i++)
        {
            var part = Assert.Single(read[i].GetProperty("parts").EnumerateArray());
            sig[bom.Parts.Keys.ElementAt(i)] = (part.GetProperty("area").GetDouble(), part.GetProperty("holes").GetInt32());
        }

        var counts = new Dictionary<string, int>();
        foreach (var sheet in read.Skip(singles.Length))
        {
            string file = sheet.GetProperty("file").GetString()!;
            Assert.Equal(0, sheet.GetProperty("errors").GetInt32());
            Assert.Equal(0, sheet.GetProperty("nested_loops").GetInt32());
            Assert.True(sheet.GetProperty("width").ValueKind == JsonValueKind.Number, $"{file}: no sheet edge on the NOTES layer");
            foreach (var part in sheet.GetProperty("parts").EnumerateArray())
            {
                double edge = part.GetProperty("edge").GetDouble();
                Assert.True(edge >= spacing - kerf / 2 - Slack, $"{file}: a part's centre line is {edge} mm from the sheet edge");
                double a = part.GetProperty("area").GetDouble();
                int holes = part.GetProperty("holes").GetInt32();
                var match = sig.Where(kv => kv.Value.Holes == holes && Math.Abs(kv.Value.Area - a) <= 1e-6 * kv.Value.Area + 1e-3).Select(kv => kv.Key).ToArray();
                // Mirror-image parts (the two rotors of a dual-rotor machine) share a signature: they are counted together.
                Assert.True(match.Length >= 1, $"{file}: a part of area {a} mm2 with {holes} holes matches no part");
                counts[string.Join("+", match)] = counts.GetValueOrDefault(string.Join("+", match)) + 1;
            }
            foreach (var g in sheet.GetProperty("gaps").EnumerateArray())
                Assert.True(g[2].GetDouble() >= spacing - kerf - Slack, $"{file}: parts {g[0]} and {g[1]} are {g[2]} mm apart (centre lines)");
        }
        var classes = bom.Parts.Keys.GroupBy(k => sig[k]).Select(g => string.Join("+", g)).ToArray();
        foreach (var c in classes)
        {
            int q = c.Split('+').Sum(p => bom.Parts[p]);
            Assert.True(counts.GetValueOrDefault(c) == q, $"{c}: {counts.GetValueOrDefault(c)} on the sheets, the BOM lists {q}");
        }
        Assert.Equal(bom.Parts.Values.Sum(), counts.Values.Sum());
    }

    [Fact]
    public void Too_few_sheets_fail_cut_sheet_stock_and_one_more_passes()
    {
        // Planted fault: creek-sector's two 156 mm steel back irons on one 200 x 200 sheet (one fits, two do not).
        string Design(string sheets) => PresetLibrary.Find("creek-sector")!.Text + $"cutter:\n  sheets: \"{sheets}\"\n";
        var fail = Check(Design("200x200:1"));
        var pass = Check(Design("200x200:2"));
        var f = fail.Single(c => c.Id == "cut-sheet-stock" && c.Part == "back-iron");
        Assert.Equal("fail", f.Status);
        Assert.Equal(1, f.Value);
        Assert.Equal("pass", fail.Single(c => c.Id == "cut-sheet-stock" && c.Part == "hub-spacer").Status);
        Assert.All(pass.Where(c => c.Id == "cut-sheet-stock"), c => Assert.Equal("pass", c.Status));
        Assert.All(fail.Where(c => c.Id == "cut-sheet-fit"), c => Assert.Equal("pass", c.Status));
    }

    private sealed record Result(string Id, string Part, string Status, double Value);

    private List<Result> Check(string text)
    {
        var loaded = PartForge.Design.Loading.DesignLoader.LoadText(text, "creek-sector.yaml");
        Assert.True(loaded.Machine is not null, string.Join("\n", loaded.Errors));
        var ev = Stages.Evaluate(loaded.Machine!);
        return ev.Checks.Checks.Select(c => new Result(c.Id, c.PartName ?? "", c.StatusText, c.Value)).ToList();
    }

    private static (double Spacing, double Kerf) Cutter(string extra)
    {
        double spacing = 2, kerf = 0.15; // the key's default and the presets' process.kerf
        foreach (var line in extra.Split('\n'))
        {
            var t = line.Trim();
            if (t.StartsWith("spacing:", StringComparison.Ordinal)) spacing = double.Parse(t[8..], CultureInfo.InvariantCulture);
            if (t.StartsWith("kerf:", StringComparison.Ordinal)) kerf = double.Parse(t[5..], CultureInfo.InvariantCulture);
        }
        return (spacing, kerf);
    }

    /// <summary>Cut parts and their quantities, and the sheets, from the BOM CSV.</summary>
    private static (Dictionary<string, int> Parts, int Sheets) BomCut(string csv)
    {
        var parts = new Dictionary<string, int>();
        int sheets = 0;
        foreach (var line in File.ReadAllLines(csv).Skip(1))
        {
            var f = SplitCsv(line);
            if (f[0] == "cut parts") parts[f[1]] = int.Parse(f[3], CultureInfo.InvariantCulture);
            if (f[0] == "cut sheets") sheets += int.Parse(f[3], CultureInfo.InvariantCulture);
        }
        return (parts, sheets);
    }

    private static List<string> SplitCsv(string line)
    {
        var r = new List<string>();
        var sb = new System.Text.StringBuilder();
        bool q = false;
        foreach (char c in line)
        {
            if (c == '"') q = !q;
            else if (c == ',' && !q) { r.Add(sb.ToString()); sb.Clear(); }
            else sb.Append(c);
        }
        r.Add(sb.ToString());
        return r;
    }
}
