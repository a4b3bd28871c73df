using System.Globalization;
using System.IO.Compression;
using System.Text.RegularExpressions;
using System.Xml;
using PartForge.Design.Presets;
using PartForge.Export.Pipeline;

namespace PartForge.Export.Tests.Bom;

/// <summary>
/// Every dual-rotor and dual-stator preset's BOM lists through-studs whose grip is the sum of the parts between
/// their nuts, read back from the assembled (not exploded) assembly 3MF with System.Xml: each part the BOM names
/// has the thickness it states, the parts touch face to face in the order listed, and the grip equals both the sum
/// and the distance between the outermost faces. Source: the grip of a bolted joint is the total thickness of the
/// clamped members (common mechanical-design practice).
/// </summary>
public sealed class StudGripTests : IDisposable
{
    private const string CoreNs = "http://schemas.microsoft.com/3dmanufacturing/core/2015/02";
    private readonly string _dir = Path.Combine(Path.GetTempPath(), "pf-stud-grip-" + Guid.NewGuid().ToString("N"));

    public void Dispose()
    {
        if (Directory.Exists(_dir)) Directory.Delete(_dir, true);
    }

    public static TheoryData<string> StackedPresets() => new() { "wind-duo", "creek-sector", "pulse-sculpture" };

    [Theory]
    [MemberData(nameof(StackedPresets))]
    public void StudGripIsTheSumOfThePartsBetweenTheNuts(string preset)
    {
        Directory.CreateDirectory(_dir);
        string design = Path.Combine(_dir, preset + ".yaml");
        var text = PresetLibrary.Find(preset)!.Text;
        Assert.DoesNotContain("\nassembly:", text);
        File.WriteAllText(design, text + "assembly:\n  explode: 0\n");
        var r = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = Path.Combine(_dir, preset), Formats = "3mf,csv", Force = true });
        Assert.True(r.Status == PipelineStatus.Ok, string.Join("\n", r.Problems));
        Assert.True(r.Evaluation!.Machine.Layout.Rotors.Count == 2 || r.Evaluation.Machine.Layout.Stators.Count == 2);

        var csv = File.ReadAllLines(Path.Combine(r.OutputFolder!, preset + "-bom.csv"));
        var studs = csv.Where(l => l.Contains("through-stud", StringComparison.Ordinal)).ToList();
        Assert.Single(studs);
        var m = Regex.Match(studs[0], @"grip ([\d.]+) mm = (.+)$");
        Assert.True(m.Success, studs[0]);
        double grip = double.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture);
        var listed = m.Groups[2].Value.Split(" + ").Select(s => s.Split(' ')).Select(a => (Name: a[0], T: double.Parse(a[1], CultureInfo.InvariantCulture))).ToList();
        Assert.True(listed.Count >= 3, studs[0]); // two outer parts and the spacer between them

        // The assembly's objects, their z extents from the vertices (no build transforms: placement is in the coordinates).
        using var zip = ZipFile.OpenRead(Path.Combine(r.OutputFolder!, preset + "-assembly.3mf"));
        var doc = new XmlDocument();
        using (var s = zip.GetEntry("3D/3dmodel.model")!.Open()) doc.Load(s);
        var ns = new XmlNamespaceManager(doc.NameTable);
        ns.AddNamespace("m", CoreNs);
        var objects = doc.SelectNodes("/m:model/m:resources/m:object", ns)!.Cast<XmlElement>().Select(o =>
        {
            var z = o.SelectNodes("m:mesh/m:vertices/m:vertex", ns)!.Cast<XmlElement>()
                .Select(v => double.Parse(v.GetAttribute("z"), NumberStyles.Float, CultureInfo.InvariantCulture)).ToArray();
            return (Name: Regex.Replace(o.GetAttribute("name"), @"-\d+$", ""), Lo: z.Min(), Hi: z.Max());
        }).OrderBy(o => o.Lo).ToList();

        // Walk the listed parts bottom to top: each is the 3MF object of that name whose bottom face is on the previous top.
        double? top = null, bottom = null;
        foreach (var (name, t) in listed)
        {
            var o = objects.Where(x => x.Name == name && (top is null || Math.Abs(x.Lo - top.Value) < 1e-3)).OrderBy(x => x.Lo).First();
            Assert.Equal(t, o.Hi - o.Lo, 3);
            bottom ??= o.Lo;
            top = o.Hi;
        }
        Assert.Equal(grip, listed.Sum(p => p.T), 3);
        Assert.Equal(grip, top!.Value - bottom!.Value, 3);
    }
}
