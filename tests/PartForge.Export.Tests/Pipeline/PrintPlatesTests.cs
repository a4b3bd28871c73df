using System.Globalization;
using System.Text.Json;
using PartForge.Design.Presets;
using PartForge.Export.Exporters;
using PartForge.Export.Pipeline;

namespace PartForge.Export.Tests.Pipeline;

/// <summary>
/// The print 3MF of every preset read back by an independent reader (python3 zipfile + ElementTree + numpy,
/// Scripts/read_3mf_items.py, per the 3MF Core Specification's build items and row-vector transforms): no two
/// items closer in plan than printer.spacing (convex hulls, so no overlap), every item inside its plate and on the
/// bed (lowest z = 0, highest at most bed_z), each with its larger flat face down, positive volume (the transform
/// keeps the mesh outward), and as many copies of each part as the BOM lists.
/// </summary>
public sealed class PrintPlatesTests : IDisposable
{
    private readonly string _dir = Path.Combine(Path.GetTempPath(), "pf-plates-" + Guid.NewGuid().ToString("N"));

    public void Dispose()
    {
        if (Directory.Exists(_dir)) Directory.Delete(_dir, true);
    }

    public static TheoryData<string> Presets() => new(PresetLibrary.All.Select(p => p.Name));

    private const double BedX = 220, BedY = 220, BedZ = 250, Spacing = 3;

    /// <summary>Slack for the mesh grid (0.0001 mm snap) against the layout's exact outlines.</summary>
    private const double GridMm = 2e-4;

    private static JsonElement Read(params string[] paths) =>
        ExternalReaders.PythonJson(File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "Scripts", "read_3mf_items.py")), paths);

    [Theory]
    [MemberData(nameof(Presets))]
    public void Every_copy_is_on_a_plate_in_printing_orientation_and_apart_from_every_other(string preset)
    {
        string design = Path.Combine(_dir, preset + ".yaml");
        Directory.CreateDirectory(_dir);
        File.WriteAllText(design, PresetLibrary.Find(preset)!.Text);
        string outDir = Path.Combine(_dir, preset);
        var r = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = outDir, Formats = "3mf,csv,html" });
        Assert.True(r.Status == PipelineStatus.Ok, string.Join("\n", r.Problems));

        var bom = BomPrinted(Path.Combine(outDir, preset + "-bom.csv"));
        string all = Path.Combine(outDir, preset + ".3mf");
        var plateFiles = Directory.GetFiles(outDir, preset + "-plate-*.3mf").OrderBy(f => f.Length).ThenBy(f => f, StringComparer.Ordinal).ToArray();
        var read = Read([all, .. plateFiles]);

        // The package of all plates: plate k spans x from k (bed_x + gap).
        double pitch = BedX + ThreeMfExport.PlateGapMm;
        var whole = read.GetProperty(all);
        Assert.True(whole.GetProperty("min_gap").ValueKind == JsonValueKind.Null || whole.GetProperty("min_gap").GetDouble() >= Spacing - GridMm);
        var counts = new Dictionary<string, int>();
        var bottoms = new Dictionary<int, double>();
        int plates = 0;
        foreach (var it in whole.GetProperty("items").EnumerateArray())
        {
            int k = (int)Math.Floor((it.GetProperty("xmin").GetDouble() + GridMm) / pitch);
            plates = Math.Max(plates, k + 1);
            AssertOnBed(it, k * pitch);
            bottoms[k] = bottoms.GetValueOrDefault(k) + it.GetProperty("bottom").GetDouble();
            string name = it.GetProperty("name").GetString()!;
            counts[name] = counts.GetValueOrDefault(name) + 1;
        }
        Assert.Equal(bom.OrderBy(kv => kv.Key), counts.OrderBy(kv => kv.Key));

        // One file per plate when there are several, each at the origin, together the same copies.
        Assert.Equal(plates > 1 ? plates : 0, plateFiles.Length);
        var inPlates = new Dictionary<string, int>();
        foreach (var f in plateFiles)
        {
            var doc = read.GetProperty(f);
            if (doc.GetProperty("min_gap").ValueKind != JsonValueKind.Null) Assert.True(doc.GetProperty("min_gap").GetDouble() >= Spacing - GridMm, $"{f}: {doc.GetProperty("min_gap")}");
            foreach (var it in doc.GetProperty("items").EnumerateArray())
            {
                AssertOnBed(it, 0);
                string name = it.GetProperty("name").GetString()!;
                inPlates[name] = inPlates.GetValueOrDefault(name) + 1;
            }
        }
        if (plates > 1) Assert.Equal(bom.OrderBy(kv => kv.Key), inPlates.OrderBy(kv => kv.Key));

        // The report states the plate count and each plate's first-layer fill: the bed faces' area (here from the
        // meshes' downward faces at z = 0) over the bed's, to the report's 0.1 % plus the facets' chordal loss.
        string html = File.ReadAllText(Path.Combine(outDir, preset + "-report.html"));
        Assert.Contains($"Print plates: {plates} on a 220 x 220 mm bed", html);
        var fills = System.Text.RegularExpressions.Regex.Matches(html, @"<tr><td>(\d+)</td><td>[^<]*</td><td>([\d.]+) %</td>");
        Assert.Equal(plates, fills.Count);
        foreach (System.Text.RegularExpressions.Match m in fills)
        {
            int k = int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture) - 1;
            double expected = 100 * bottoms[k] / (BedX * BedY);
            Assert.True(Math.Abs(double.Parse(m.Groups[2].Value, CultureInfo.InvariantCulture) - expected) <= 0.1, $"plate {k + 1}: report {m.Groups[2].Value} %, meshes {expected} %");
        }
    }

    private static void AssertOnBed(JsonElement it, double x0)
    {
        string name = it.GetProperty("name").GetString()!;
        double D(string k) => it.GetProperty(k).GetDouble();
        Assert.True(D("xmin") >= x0 - GridMm && D("xmax") <= x0 + BedX + GridMm, $"{name}: x {D("xmin")}..{D("xmax")} outside the plate at {x0}");
        Assert.True(D("ymin") >= -GridMm && D("ymax") <= BedY + GridMm, $"{name}: y {D("ymin")}..{D("ymax")}");
        Assert.Equal(0, D("zmin"), 6);
        Assert.True(D("zmax") <= BedZ, name);
        Assert.True(D("volume") > 0, $"{name}: placed inside out");
        // Largest flat face down (to the mesh's own area, within a square millimetre of facet rounding).
        Assert.True(D("bottom") > 0 && D("bottom") >= D("top") - 1, $"{name}: bottom face {D("bottom")} mm^2, top face {D("top")} mm^2");
    }

    /// <summary>Printed part name -> quantity from the BOM (category "formers" or "printed parts"; the item of the former line is "coil former").</summary>
    private static Dictionary<string, int> BomPrinted(string csv)
    {
        var d = new Dictionary<string, int>();
        foreach (var line in File.ReadAllLines(csv).Skip(1))
        {
            var f = SplitCsv(line);
            if (f[2].StartsWith("printed", StringComparison.Ordinal))
                d[f[1] == "coil former" ? "former" : f[1]] = int.Parse(f[3], CultureInfo.InvariantCulture);
        }
        return d;
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
