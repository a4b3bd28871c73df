using PartForge.Design.Presets;
using PartForge.Export.Pipeline;

namespace PartForge.Export.Tests.Pipeline;

/// <summary>What a build makes: only the meshes its files need, and its stage clock.</summary>
public sealed class BuildPipelineTests : IDisposable
{
    private readonly string _dir = Path.Combine(Path.GetTempPath(), "pf-pipeline-" + Guid.NewGuid().ToString("N"));

    public void Dispose()
    {
        if (Directory.Exists(_dir)) Directory.Delete(_dir, true);
    }

    private PipelineResult Build(string preset, string? formats, string? parts)
    {
        Directory.CreateDirectory(_dir);
        string design = Path.Combine(_dir, preset + ".yaml");
        File.WriteAllText(design, PresetLibrary.Find(preset)!.Text);
        return BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = Path.Combine(_dir, "out"), Formats = formats, Parts = parts });
    }

    [Fact]
    public void OneStlMeshesOnlyItsPart()
    {
        var r = Build("wind-duo", "stl", "rotor-front");
        Assert.Equal(PipelineStatus.Ok, r.Status);
        Assert.Equal(["wind-duo-rotor-front.stl"], r.Written);
        foreach (var p in r.Evaluation!.Parts!.Parts) Assert.Equal(p.Name == "rotor-front", p.MeshMade);
        // The results document is not written, so it carries no measurements.
        Assert.All(r.Results!.Parts, e => Assert.Equal(0, e.Triangles));
    }

    [Fact]
    public void CutFilesAloneMeshNothing()
    {
        var r = Build("wind-duo", "dxf,svg", null);
        Assert.Equal(PipelineStatus.Ok, r.Status);
        Assert.NotEmpty(r.Written);
        Assert.All(r.Evaluation!.Parts!.Parts, p => Assert.False(p.MeshMade));
    }

    [Fact]
    public void TheResultsDocumentMeasuresEveryPart()
    {
        var r = Build("wind-duo", "json", null);
        Assert.Equal(PipelineStatus.Ok, r.Status);
        Assert.All(r.Evaluation!.Parts!.Parts, p => Assert.True(p.MeshMade));
        foreach (var e in r.Results!.Parts)
        {
            var p = r.Evaluation.Parts.Get(e.Name);
            Assert.Equal(p.Mesh.TriangleCount, e.Triangles);
            Assert.Equal(p.VolumeMm3, e.VolumeMm3);
            Assert.True(e.VolumeMm3 > 0);
        }
    }

    [Fact]
    public void TheStageClockCoversEveryStageInOrder()
    {
        var r = Build("crank-bench", "stl", null);
        Assert.Equal(["load", "budget", "electrical", "parts", "checks", "mesh", "write"], r.Timings.Select(t => t.Stage).ToArray());
        Assert.All(r.Timings, t => Assert.True(t.Ms >= 0));
    }
}
