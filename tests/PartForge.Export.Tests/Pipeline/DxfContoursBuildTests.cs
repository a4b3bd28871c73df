using System.Text.Json;
using PartForge.Design.Presets;
using PartForge.Export.Pipeline;
using PartForge.Formats.Cutting;
using PartForge.Geometry.Profiles;

namespace PartForge.Export.Tests.Pipeline;

/// <summary>
/// <c>process.dxf_contours</c> through a whole build: a cut acrylic rotor with through pockets (block pockets,
/// an index notch in the rim, engraved polarity dots) written as LINE and ARC chains, read back with Debian's
/// python3-ezdxf (tests/readers/dxf-chains.py). Source for the entities: DXF reference (R12), LINE and ARC.
/// </summary>
public sealed class DxfContoursBuildTests : IDisposable
{
    private readonly string _dir = Path.Combine(Path.GetTempPath(), "pf-dxf-contours-" + Guid.NewGuid().ToString("N"));

    public void Dispose()
    {
        if (Directory.Exists(_dir)) Directory.Delete(_dir, true);
    }

    /// <summary>wind-duo with through pockets and its rotors cut from acrylic; <paramref name="contours"/> null leaves the key out.</summary>
    private PipelineResult Build(string? contours, string folder)
    {
        Directory.CreateDirectory(_dir);
        string text = PresetLibrary.Find("wind-duo")!.Text.Replace("pocket_floor: 1.5", "pocket_floor: 0", StringComparison.Ordinal)
                      + "parts:\n  rotor: { process: cut, material: acrylic }\n"
                      + (contours is null ? "" : $"process:\n  dxf_contours: {contours}\n");
        string design = Path.Combine(_dir, folder + ".yaml");
        File.WriteAllText(design, text);
        var r = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = Path.Combine(_dir, folder), Formats = "dxf" });
        Assert.True(r.Status == PipelineStatus.Ok, string.Join("\n", r.Problems));
        return r;
    }

    private static JsonElement Read(string file)
    {
        string script = Path.Combine(Report.Pipeline.RepoRoot(), "tests", "readers", "dxf-chains.py");
        var (code, stdout, stderr) = ExternalReaders.Run(ExternalReaders.Python, script, file);
        Assert.True(code == 0, $"python reader failed ({code}): {stderr}");
        using var doc = JsonDocument.Parse(stdout);
        return doc.RootElement.Clone();
    }

    private static CutPlan PlanOf(PipelineResult r, string part)
    {
        var p = r.Evaluation!.Parts!.Parts.Single(x => x.Name == part);
        return KerfCompensation.Apply(new CutSheet(p.Name, p.CutProfile!, p.Marks, r.Evaluation.Machine.Process.KerfMm));
    }

    [Fact]
    public void EntitiesChainEveryContourOfTheCutRotor()
    {
        var r = Build("entities", "entities");
        var plan = PlanOf(r, "rotor-front");
        var read = Read(Path.Combine(r.OutputFolder!, "wind-duo-rotor-front.dxf"));
        Assert.Equal(0, read.GetProperty("errors").GetInt32());
        Assert.Equal(0, read.GetProperty("fixes").GetInt32());
        Assert.Equal(0, read.GetProperty("polylines").GetArrayLength());

        // One closed chain per contour that is not a full circle, on its layer, in the plan's order.
        var loops = plan.Paths.Where(p => p.Contour.Circle is null).ToList();
        var chains = read.GetProperty("chains").EnumerateArray().ToList();
        Assert.Equal(loops.Count, chains.Count);
        Assert.Contains(loops, p => p.Kind == CutPathKind.Hole);    // the 16 block pockets
        Assert.Contains(loops, p => p.Kind == CutPathKind.Outline); // the rim with its notch
        for (int i = 0; i < loops.Count; i++)
        {
            Assert.Equal(loops[i].Kind == CutPathKind.Mark ? "MARK" : "CUT", chains[i][0].GetString());
            Assert.Equal(loops[i].Contour.Segments.Count, chains[i][1].GetInt32());
            Assert.True(chains[i][2].GetBoolean(), $"chain {i} closes");
            Assert.InRange(chains[i][3].GetDouble(), 0, 1e-9);
        }

        // Every ARC is the compensated profile's arc: same centre and radius, in order.
        var arcs = read.GetProperty("arcs").EnumerateArray().ToList();
        var planArcs = loops.SelectMany(p => p.Contour.Segments.OfType<ArcSegment>()).ToList();
        Assert.Equal(planArcs.Count, arcs.Count);
        for (int i = 0; i < arcs.Count; i++)
        {
            Assert.Equal(planArcs[i].Center.X, arcs[i][1].GetDouble(), 12);
            Assert.Equal(planArcs[i].Center.Y, arcs[i][2].GetDouble(), 12);
            Assert.Equal(planArcs[i].Radius, arcs[i][3].GetDouble(), 12);
        }
        // The rim: rotor.outer_diameter / 2 grown by half of process.kerf (0.15 mm default), about the axis.
        double rim = 160.0 / 2 + 0.15 / 2;
        Assert.Contains(arcs, a => Math.Abs(a[3].GetDouble() - rim) < 1e-12 && a[1].GetDouble() == 0 && a[2].GetDouble() == 0);
    }

    [Fact]
    public void TheDefaultWritesTheSameLoopsAsPolylines()
    {
        var entities = Build("entities", "entities");
        var byDefault = Build(null, "default");
        var polyline = Build("polyline", "polyline");
        string name = "wind-duo-rotor-front.dxf";
        // Leaving the key out is the polyline form.
        Assert.Equal(File.ReadAllBytes(Path.Combine(byDefault.OutputFolder!, name)), File.ReadAllBytes(Path.Combine(polyline.OutputFolder!, name)));

        var chains = Read(Path.Combine(entities.OutputFolder!, name)).GetProperty("chains").EnumerateArray().ToList();
        var polys = Read(Path.Combine(byDefault.OutputFolder!, name)).GetProperty("polylines").EnumerateArray().ToList();
        Assert.Equal(polys.Count, chains.Count);
        for (int i = 0; i < polys.Count; i++)
        {
            Assert.Equal(polys[i][0].GetString(), chains[i][0].GetString());
            Assert.True(polys[i][1].GetBoolean());
            Assert.Equal(polys[i][2].GetDouble(), chains[i][4].GetDouble(), 9); // same area from bulges and from ARC angles
        }

        // The back iron is all circles: both forms write the same file.
        Assert.Equal(File.ReadAllBytes(Path.Combine(byDefault.OutputFolder!, "wind-duo-back-iron.dxf")),
                     File.ReadAllBytes(Path.Combine(entities.OutputFolder!, "wind-duo-back-iron.dxf")));
    }

    [Fact]
    public void AnUnknownFormIsALocatedDesignError()
    {
        Directory.CreateDirectory(_dir);
        string design = Path.Combine(_dir, "bad.yaml");
        File.WriteAllText(design, PresetLibrary.Find("wind-duo")!.Text + "process:\n  dxf_contours: spline\n");
        var r = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = Path.Combine(_dir, "bad"), Formats = "dxf" });
        Assert.Equal(PipelineStatus.BadInput, r.Status);
        var line = Assert.Single(r.Problems);
        Assert.Contains("process.dxf_contours", line);
        Assert.Contains("entities", line);
        Assert.False(Directory.Exists(Path.Combine(_dir, "bad")) && Directory.EnumerateFiles(Path.Combine(_dir, "bad")).Any());
    }
}
