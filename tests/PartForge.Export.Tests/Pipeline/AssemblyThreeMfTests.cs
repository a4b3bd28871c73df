using System.Globalization;
using System.IO.Compression;
using System.Text.Json;
using System.Text.RegularExpressions;
using System.Xml;
using PartForge.Design.Presets;
using PartForge.Export.Pipeline;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;

namespace PartForge.Export.Tests.Pipeline;

/// <summary>
/// <c>&lt;name&gt;-assembly.3mf</c>: every copy of every part in the exploded machine, one named object each. Read
/// back with System.Xml (the model part, per the 3MF Core Specification: resources/object/mesh/vertices/triangles,
/// build/item) and with assimp-utils (`assimp info`: mesh count, faces per mesh, overall extent).
/// </summary>
public sealed class AssemblyThreeMfTests : IDisposable
{
    private const string CoreNs = "http://schemas.microsoft.com/3dmanufacturing/core/2015/02";
    private readonly string _dir = Path.Combine(Path.GetTempPath(), "pf-assembly-3mf-" + Guid.NewGuid().ToString("N"));

    public void Dispose()
    {
        if (Directory.Exists(_dir)) Directory.Delete(_dir, true);
    }

    private PipelineResult Build(string designText, string folder, string formats = "3mf", string? parts = null)
    {
        Directory.CreateDirectory(_dir);
        string design = Path.Combine(_dir, folder + ".yaml");
        File.WriteAllText(design, designText);
        var r = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = Path.Combine(_dir, folder), Formats = formats, Parts = parts });
        Assert.True(r.Status == PipelineStatus.Ok, string.Join("\n", r.Problems));
        return r;
    }

    private static string Preset(string name) => PresetLibrary.Find(name)!.Text;

    /// <summary>wind-duo (dual rotor, 12 keystone coils, a steel back iron behind each rotor) exploded by 20 mm.</summary>
    private const double Explode = 20;

    private static string WindDuo() => Preset("wind-duo") + $"assembly:\n  explode: {Explode.ToString(CultureInfo.InvariantCulture)}\n";

    private sealed record Obj(string Name, Mesh Mesh, double ZMin, double ZMax);

    /// <summary>The model part's objects (in id order) and build items, read with System.Xml.</summary>
    private static (List<Obj> Objects, List<XmlElement> Items) ReadModel(string path)
    {
        using var zip = ZipFile.OpenRead(path);
        var doc = new XmlDocument();
        using (var s = zip.GetEntry("3D/3dmodel.model")!.Open()) doc.Load(s);
        var ns = new XmlNamespaceManager(doc.NameTable);
        ns.AddNamespace("m", CoreNs);
        Assert.Equal("millimeter", doc.DocumentElement!.GetAttribute("unit"));
        var objects = new List<Obj>();
        foreach (XmlElement o in doc.SelectNodes("/m:model/m:resources/m:object", ns)!)
        {
            Assert.Equal((objects.Count + 1).ToString(CultureInfo.InvariantCulture), o.GetAttribute("id"));
            var verts = o.SelectNodes("m:mesh/m:vertices/m:vertex", ns)!.Cast<XmlElement>()
                .Select(v => new Vec3(D(v, "x"), D(v, "y"), D(v, "z"))).ToArray();
            var idx = o.SelectNodes("m:mesh/m:triangles/m:triangle", ns)!.Cast<XmlElement>()
                .SelectMany(t => new[] { I(t, "v1"), I(t, "v2"), I(t, "v3") }).ToArray();
            objects.Add(new Obj(o.GetAttribute("name"), new Mesh(verts, idx), verts.Min(v => v.Z), verts.Max(v => v.Z)));
        }
        var items = doc.SelectNodes("/m:model/m:build/m:item", ns)!.Cast<XmlElement>().ToList();
        return (objects, items);

        static double D(XmlElement e, string a) => double.Parse(e.GetAttribute(a), NumberStyles.Float, CultureInfo.InvariantCulture);
        static int I(XmlElement e, string a) => int.Parse(e.GetAttribute(a), CultureInfo.InvariantCulture);
    }

    /// <summary>`assimp info`: mesh count, faces of each mesh in order, and the overall z extent.</summary>
    private static (int Meshes, int[] Faces, double ZMin, double ZMax) Assimp(string path)
    {
        var (code, stdout, stderr) = ExternalReaders.Run(ExternalReaders.Assimp, "info", path);
        Assert.True(code == 0, $"assimp info failed ({code}): {stderr}\n{stdout}");
        int meshes = int.Parse(Regex.Match(stdout, @"^Meshes:\s+(\d+)", RegexOptions.Multiline).Groups[1].Value, CultureInfo.InvariantCulture);
        var faces = Regex.Matches(stdout, @"^\s+\d+ \(\d+\): \[\d+ / \d+ / (\d+) \|", RegexOptions.Multiline)
            .Select(m => int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture)).ToArray();
        double Z(string label)
        {
            var m = Regex.Match(stdout, "^" + label + @"\s+\(([-\d.e+]+) ([-\d.e+]+) ([-\d.e+]+)\)", RegexOptions.Multiline);
            Assert.True(m.Success, $"no '{label}' in assimp output:\n{stdout}");
            return double.Parse(m.Groups[3].Value, NumberStyles.Float, CultureInfo.InvariantCulture);
        }
        return (meshes, faces, Z("Minimum point"), Z("Maximum point"));
    }

    private static string[] Plates(int n) => Enumerable.Range(1, n).Select(k => $"wind-duo-plate-{k}.3mf").ToArray();

    [Fact]
    public void EveryCopyIsItsOwnNamedClosedObject()
    {
        var r = Build(WindDuo(), "a");
        // The print plates (four on the default 220 mm bed: each rotor, the stator, the twelve formers) come first.
        Assert.Equal(["wind-duo.3mf", .. Plates(4), "wind-duo-assembly.3mf", "wind-duo-manifest.json"], r.Written);
        var set = r.Evaluation!.Parts!;
        var (objects, items) = ReadModel(Path.Combine(r.OutputFolder!, "wind-duo-assembly.3mf"));

        // wind-duo: two rotors, a back iron behind each, 12 formers (machine.coils), one stator, one hub spacer.
        string[] expected = ["rotor-front", "rotor-back", "back-iron-0", "back-iron-1",
            .. Enumerable.Range(0, 12).Select(k => $"former-{k}"), "stator", "hub-spacer"];
        Assert.Equal(set.Parts.Sum(p => p.Quantity), objects.Count);
        Assert.Equal(expected, objects.Select(o => o.Name));
        Assert.Equal(objects.Count, objects.Select(o => o.Name).Distinct(StringComparer.Ordinal).Count());

        // One untransformed build item per object: the placement is in the coordinates.
        Assert.Equal(objects.Count, items.Count);
        for (int i = 0; i < items.Count; i++)
        {
            Assert.Equal((i + 1).ToString(CultureInfo.InvariantCulture), items[i].GetAttribute("objectid"));
            Assert.False(items[i].HasAttribute("transform"));
        }

        foreach (var o in objects)
        {
            var part = set.Parts.Single(p => p.Name == Regex.Replace(o.Name, @"-\d+$", ""));
            var report = MeshValidator.Validate(o.Mesh);
            Assert.True(report.IsValid, $"{o.Name}: {report}"); // closed, outward, no degenerate triangle
            Assert.Equal(part.Mesh.TriangleCount, o.Mesh.TriangleCount);
            Assert.True(Math.Abs(part.VolumeMm3 - report.SignedVolume) < 1e-6 * part.VolumeMm3, $"{o.Name}: volume {report.SignedVolume} vs {part.VolumeMm3}");
        }

        // The other file keeps its contract form: one object per printed part (the back irons are cut steel).
        var (perPart, _) = ReadModel(Path.Combine(r.OutputFolder!, "wind-duo.3mf"));
        Assert.Equal(set.Parts.Where(p => p.Process == PartForge.Design.Machines.PartProcess.Print).Select(p => p.Name), perPart.Select(o => o.Name));
    }

    [Fact]
    public void AssimpReadsOneMeshPerCopy()
    {
        var r = Build(WindDuo(), "a");
        string file = Path.Combine(r.OutputFolder!, "wind-duo-assembly.3mf");
        var (objects, _) = ReadModel(file);
        var a = Assimp(file);
        Assert.Equal(18, a.Meshes);
        Assert.Equal(objects.Select(o => o.Mesh.TriangleCount), a.Faces);
        // The outermost faces are the back irons' (see the stack below): 13.8 mm nominal plus twice the explode distance.
        Assert.Equal(-(13.8 + 2 * Explode), a.ZMin, 4);
        Assert.Equal(13.8 + 2 * Explode, a.ZMax, 4);
    }

    [Fact]
    public void ZRangesFollowTheExplodedStack()
    {
        // Expected stack worked out by hand from presets/wind-duo.yaml and the axial rules of the contract: the
        // stator ring (thickness 7.6) and the formers (flange 0.8 + winding 6 + flange 0.8) are centred on z = 0;
        // pocket depth = thickness 6.5 - floor 1.5 = 5 = magnet thickness, so the magnets are flush and each rotor
        // face is gap.air_gap = 1.5 from the stationary face: rotor 3.8 + 1.5 = 5.3 .. 11.8; the 2 mm back irons
        // behind them 11.8 .. 13.8; the hub spacer spans the rotor faces, -5.3 .. 5.3. Exploded
        // (assembly.explode = E): rotors move by +-E, back irons by +-2E, the stationary pack and spacer stay.
        var r = Build(WindDuo(), "a");
        var (objects, _) = ReadModel(Path.Combine(r.OutputFolder!, "wind-duo-assembly.3mf"));
        const double e = Explode;
        var expected = new Dictionary<string, (double Lo, double Hi)>
        {
            ["rotor-front"] = (5.3 + e, 11.8 + e),
            ["rotor-back"] = (-11.8 - e, -5.3 - e),
            ["back-iron-0"] = (11.8 + 2 * e, 13.8 + 2 * e),
            ["back-iron-1"] = (-13.8 - 2 * e, -11.8 - 2 * e),
            ["stator"] = (-3.8, 3.8),
            ["hub-spacer"] = (-5.3, 5.3),
        };
        for (int k = 0; k < 12; k++) expected[$"former-{k}"] = (-3.8, 3.8);
        foreach (var o in objects)
        {
            var (lo, hi) = expected[o.Name];
            Assert.True(Math.Abs(o.ZMin - lo) < 1e-9 && Math.Abs(o.ZMax - hi) < 1e-9, $"{o.Name}: z {o.ZMin} .. {o.ZMax}, expected {lo} .. {hi}");
        }

        // Read as a stack from the top down: back iron, rotor, the stationary pack, rotor, back iron; neighbours
        // apart by their nominal clearance plus the explode distance.
        Obj Of(string n) => objects.Single(o => o.Name == n);
        Assert.Equal(1.5 + e, Of("rotor-front").ZMin - Of("stator").ZMax, 9);
        Assert.Equal(1.5 + e, Of("stator").ZMin - Of("rotor-back").ZMax, 9);
        Assert.Equal(e, Of("back-iron-0").ZMin - Of("rotor-front").ZMax, 9);
        Assert.Equal(e, Of("rotor-back").ZMin - Of("back-iron-1").ZMax, 9);

        // Each former sits in its seat: its volume centroid on the coil pitch radius 60 at k x 30 degrees (the
        // lead slot and key flat pull it off the coil centre by a fraction of a millimetre).
        foreach (var o in objects.Where(o => o.Name.StartsWith("former-", StringComparison.Ordinal)))
        {
            int k = int.Parse(o.Name["former-".Length..], CultureInfo.InvariantCulture);
            var c = Centroid(o.Mesh);
            var seat = Vec2.FromAngleDeg(k * 30.0) * 60;
            Assert.True(Math.Sqrt((c.X - seat.X) * (c.X - seat.X) + (c.Y - seat.Y) * (c.Y - seat.Y)) < 1.0, $"{o.Name}: centroid ({c.X}, {c.Y}), seat ({seat.X}, {seat.Y})");
        }
    }

    /// <summary>Volume centroid of a closed mesh (sum over the tetrahedra from the origin to each triangle).</summary>
    private static Vec3 Centroid(Mesh m)
    {
        double v = 0, x = 0, y = 0, z = 0;
        for (int t = 0; t < m.TriangleCount; t++)
        {
            var (a, b, c) = m.Triangle(t);
            double dv = a.Dot(b.Cross(c)) / 6;
            v += dv;
            x += dv * (a.X + b.X + c.X) / 4;
            y += dv * (a.Y + b.Y + c.Y) / 4;
            z += dv * (a.Z + b.Z + c.Z) / 4;
        }
        return new Vec3(x / v, y / v, z / v);
    }

    [Theory]
    [InlineData("crank-bench")]
    [InlineData("hydro-arc")]
    [InlineData("pulse-sculpture")]
    public void EveryLayoutPlacesEveryCopyAtItsInstanceZ(string preset)
    {
        // Single-rotor and dual-stator presets: one closed named object per copy, and each copy's z-range its
        // nominal place (PartInstance) moved by its explode rank x assembly.explode (default 15 mm).
        var r = Build(Preset(preset), preset);
        var set = r.Evaluation!.Parts!;
        string file = Path.Combine(r.OutputFolder!, preset + "-assembly.3mf");
        var (objects, items) = ReadModel(file);
        var copies = set.Parts.SelectMany(p => p.Instances.Select(i => (Part: p, Inst: i))).ToList();
        Assert.Equal(copies.Count, objects.Count);
        Assert.Equal(copies.Count, items.Count);
        Assert.Equal(objects.Count, objects.Select(o => o.Name).Distinct(StringComparer.Ordinal).Count());
        for (int i = 0; i < copies.Count; i++)
        {
            var (p, inst) = copies[i];
            var o = objects[i];
            Assert.Equal(p.Quantity > 1 ? $"{p.Name}-{inst.Index}" : p.Name, o.Name);
            Assert.True(MeshValidator.Validate(o.Mesh).IsValid, o.Name);
            double dz = inst.ExplodeRank * 15.0;
            Assert.True(Math.Abs(o.ZMin - (inst.BottomZMm + dz)) < 1e-9 && Math.Abs(o.ZMax - (inst.TopZMm + dz)) < 1e-9,
                $"{o.Name}: z {o.ZMin} .. {o.ZMax}, expected {inst.BottomZMm + dz} .. {inst.TopZMm + dz}");
        }
        // Rotating parts and the stationary ones do not overlap along z once exploded (a visual check shows each).
        var rotating = objects.Where((o, i) => copies[i].Part.Rotating && copies[i].Part.Name.StartsWith("rotor", StringComparison.Ordinal)).ToList();
        var stators = objects.Where((o, i) => copies[i].Part.Name.StartsWith("stator", StringComparison.Ordinal)).ToList();
        foreach (var a in rotating)
            foreach (var b in stators)
                Assert.True(a.ZMin >= b.ZMax || a.ZMax <= b.ZMin, $"{a.Name} overlaps {b.Name} along z");
        Assert.Equal(copies.Count, Assimp(file).Meshes);
    }

    [Fact]
    public void RebuildIsByteIdentical()
    {
        var a = Build(WindDuo(), "a");
        var b = Build(WindDuo(), "b");
        Assert.Equal(File.ReadAllBytes(Path.Combine(a.OutputFolder!, "wind-duo-assembly.3mf")), File.ReadAllBytes(Path.Combine(b.OutputFolder!, "wind-duo-assembly.3mf")));
    }

    [Fact]
    public void WrittenOnlyForTheWholeMachineAndListedForEveryPart()
    {
        // A subset of the parts gives no assembly; naming every part is the whole machine.
        var some = Build(WindDuo(), "some", "3mf,json", "rotor-front,former");
        Assert.Equal(["wind-duo.3mf", .. Plates(2), "wind-duo-results.json", "wind-duo-manifest.json"], some.Written);

        var names = string.Join(",", some.Evaluation!.Parts!.Parts.Select(p => p.Name));
        var all = Build(WindDuo(), "all", "3mf,json", names);
        Assert.Equal(["wind-duo.3mf", .. Plates(4), "wind-duo-assembly.3mf", "wind-duo-results.json", "wind-duo-manifest.json"], all.Written);
        using var doc = JsonDocument.Parse(File.ReadAllText(Path.Combine(all.OutputFolder!, "wind-duo-results.json")));
        foreach (var p in doc.RootElement.GetProperty("parts").EnumerateArray())
            Assert.Contains("wind-duo-assembly.3mf", p.GetProperty("files").EnumerateArray().Select(f => f.GetString()));
        // Every part was meshed for it, cut parts included.
        Assert.All(all.Evaluation!.Parts!.Parts, p => Assert.True(p.MeshMade, p.Name));

        // Without 3mf in --formats there is none.
        var none = Build(WindDuo(), "none", "json");
        Assert.Equal(["wind-duo-results.json", "wind-duo-manifest.json"], none.Written);
    }
}
