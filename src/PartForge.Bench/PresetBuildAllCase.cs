using PartForge.Design.Presets;
using PartForge.Export.Pipeline;

namespace PartForge.Bench;

/// <summary>
/// Issue 4's figure: every part of the largest bundled preset (by triangles) built and written in every format
/// (STL, both 3MF packages, DXF, SVG, PNG previews, results, report, BOM) in-process, into a temporary folder.
/// Target: under 0.3 s after warm-up. Figures: the preset, its triangles and files, and the stage split.
/// </summary>
public sealed class PresetBuildAllCase : IBenchCase
{
    private string _dir = "";
    private string _design = "";
    private string _preset = "";

    public string Name => "preset-build-all";

    public string Description => "largest preset, all parts, all formats, in-process (target 300 ms)";

    public void Setup()
    {
        _dir = Path.Combine(Path.GetTempPath(), "partforge-bench-presets-" + Environment.ProcessId);
        Directory.CreateDirectory(_dir);
        // The largest preset by triangles of all its parts, found once (not timed).
        long best = -1;
        foreach (var p in PresetLibrary.All)
        {
            string f = Path.Combine(_dir, p.Name + ".yaml");
            File.WriteAllText(f, p.Text);
            var r = BuildPipeline.Build(new BuildRequest { DesignPath = f, OutputDir = Path.Combine(_dir, "probe"), Formats = "json" });
            long tris = r.Results?.Parts.Sum(x => x.Triangles) ?? 0;
            if (tris > best) { best = tris; _design = f; _preset = p.Name; }
        }
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        var r = BuildPipeline.Build(new BuildRequest { DesignPath = _design, OutputDir = Path.Combine(_dir, "out") });
        if (r.Status != PipelineStatus.Ok) throw new InvalidOperationException($"preset-build-all: {_preset}: " + string.Join("; ", r.Problems));
        var figures = new Dictionary<string, double>
        {
            ["preset_" + _preset] = 1,
            ["triangles"] = r.Evaluation!.Parts!.Parts.Sum(p => p.Mesh.TriangleCount),
            ["files"] = r.Written.Count,
        };
        foreach (var (stage, ms) in r.Timings) figures[stage + "_ms"] = ms;
        return figures;
    }
}
