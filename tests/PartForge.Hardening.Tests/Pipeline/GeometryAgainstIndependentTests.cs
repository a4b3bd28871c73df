using System.Text.Json;
using CsCheck;
using PartForge.Checks;
using PartForge.Design.Loading;
using PartForge.Export.Pipeline;
using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.Pipeline;

/// <summary>
/// The exported meshes against independent computations made here:
/// (1) each STL's volume against the true-circle volume of the part's exact layers (NetTopologySuite on finely
///     flattened arcs, <see cref="TrueArea"/>), within the chordal bound sum(height x perimeter x tolerance);
/// (2) the checker's minimum rotating clearance against a brute-force estimate from the STL files placed in
///     the machine (surface point clouds, rotor turned through a pole pitch): the checker may be more
///     cautious (it also knows the magnets, the windings and the tolerances) but never more optimistic than
///     the sampled meshes by more than the mesh's own deviation from the true geometry.
/// </summary>
public sealed class GeometryAgainstIndependentTests
{
    private readonly Xunit.Abstractions.ITestOutputHelper _log;

    public GeometryAgainstIndependentTests(Xunit.Abstractions.ITestOutputHelper log) => _log = log;

    private void Verify(string yaml, string label)
    {
        using var tmp = new TempFolder("geo");
        var file = tmp.Sub("design.yaml");
        File.WriteAllText(file, yaml);
        string outDir = tmp.Sub("out");
        var r = Pf.Run("build", file, "-o", outDir, "--force", "--formats", "stl,json");
        Assert.True(r.ExitCode is 0 or 1, $"{label}\n{Pf.Describe(r)}");
        var loaded = DesignLoader.Load(file);
        Assert.True(loaded.Success, label);
        var d = loaded.Design!;
        var ev = BuildPipeline.Evaluate(PartForge.Design.Machines.MachineModel.From(d));
        Assert.NotNull(ev.Parts);
        double tol = d.Mesh.ChordalTolerance;
        const double grid = 1e-4; // the kernel's snap grid (Precision.DefaultGridMm)

        var resultsFile = Directory.GetFiles(outDir, "*-results.json").Single();
        using var doc = JsonDocument.Parse(File.ReadAllText(resultsFile));
        var stlOf = doc.RootElement.GetProperty("parts").EnumerateArray().ToDictionary(
            p => p.GetProperty("name").GetString()!,
            p => p.GetProperty("files").EnumerateArray().Select(x => x.GetString()!).FirstOrDefault(x => x.EndsWith(".stl", StringComparison.Ordinal)));

        var rotating = new PointCloud();
        var stationary = new PointCloud();
        var rnd = new Random(12345);
        foreach (var part in ev.Parts!.Parts)
        {
            if (stlOf.GetValueOrDefault(part.Name) is not { } stlName) continue;
            var stl = StlMesh.Read(Path.Combine(outDir, Path.GetFileName(stlName)));
            double vMesh = new MeshAudit(stl).SignedVolume;
            double vTrue = 0, bound = 0;
            foreach (var layer in part.ExactLayers)
            {
                var (area, perimeter) = TrueArea.Of(layer);
                vTrue += area * layer.ThicknessMm;
                bound += perimeter * (tol + 2 * grid) * layer.ThicknessMm;
            }
            _log.WriteLine($"{label} {part.Name}: mesh {vMesh:F3} mm3, true circles {vTrue:F3} mm3, bound {bound:F3}");
            Assert.True(Math.Abs(vMesh - vTrue) <= bound + 1e-6 * vTrue,
                $"{label} {part.Name}: mesh volume {vMesh:F4} differs from the true-circle volume {vTrue:F4} by {vMesh - vTrue:F4}, more than the chordal bound {bound:F4}");
            foreach (var at in part.Instances) (part.Rotating ? rotating : stationary).Add(stl, at, 0.5, rnd);
        }

        var clearances = ev.Checks.WithId(CheckIds.RotationClearance).ToArray();
        if (clearances.Length == 0 || rotating.Points.Count == 0 || stationary.Points.Count == 0) return;
        double checker = clearances.Min(c => c.Value);
        double pitch = 360.0 / d.Machine.Poles;
        double brute = double.PositiveInfinity;
        foreach (double f in new[] { 0, 0.25, 0.5, 0.75 })
            brute = Math.Min(brute, rotating.MinDistance(stationary, f * pitch, Math.Max(checker, 0) + 3));
        _log.WriteLine($"{label}: checker rotation clearance {checker:F4} mm, brute force from the STL files {brute:F4} mm ({rotating.Points.Count} + {stationary.Points.Count} points)");
        Assert.True(checker <= brute + tol + 4 * grid + 1e-3,
            $"{label}: the checker says {checker:F4} mm but the exported meshes come as close as {brute:F4} mm");
    }

    [Theory]
    [InlineData("crank-bench")]
    [InlineData("wind-duo")]
    [InlineData("hydro-arc")]
    [InlineData("pulse-sculpture")]
    public void Each_preset_matches_the_independent_volume_and_clearance(string preset) => Verify(Repo.PresetText(preset), preset);

    [Fact]
    public void Random_designs_match_the_independent_volume_and_clearance()
    {
        RandomDesign.Gen.Sample(dsg => Verify(dsg.Yaml, $"{dsg.Layout}/{dsg.MagnetShape}/{dsg.CoilShape}/{dsg.Phases}ph"), iter: 6, threads: 1);
    }
}
