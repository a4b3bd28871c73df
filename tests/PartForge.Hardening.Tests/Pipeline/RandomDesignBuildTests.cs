using System.Text.Json;
using CsCheck;
using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.Pipeline;

/// <summary>
/// Random valid designs through the whole build: every written STL is closed and 2-manifold (exact
/// directed-edge pairing on the float32 vertex bits), has no degenerate or non-finite triangle, has the
/// triangle count and (to float32 rounding) the volume the results document states, and a second build gives
/// byte-identical files.
/// </summary>
public sealed class RandomDesignBuildTests
{
    private static void BuildAndAudit(RandomDesign d)
    {
        using var tmp = new TempFolder("rnd");
        string design = tmp.Sub("random-design.yaml");
        File.WriteAllText(design, d.Yaml);
        string out1 = tmp.Sub("out1"), out2 = tmp.Sub("out2");
        var r = Pf.Run("build", design, "-o", out1, "--force", "--formats", "stl,json");
        Assert.True(r.ExitCode is 0 or 1, $"{d}\n{Pf.Describe(r)}");
        string resultsPath = Path.Combine(out1, "random-design-results.json");
        Assert.True(File.Exists(resultsPath), $"no results document\n{d}\n{Pf.Describe(r)}");
        using var doc = JsonDocument.Parse(File.ReadAllText(resultsPath));
        var parts = doc.RootElement.GetProperty("parts").EnumerateArray().ToArray();
        Assert.NotEmpty(parts);
        int stls = 0;
        foreach (var p in parts)
        {
            string name = p.GetProperty("name").GetString()!;
            foreach (var f in p.GetProperty("files").EnumerateArray().Select(x => x.GetString()!).Where(x => x.EndsWith(".stl", StringComparison.Ordinal)))
            {
                stls++;
                var audit = new MeshAudit(StlMesh.Read(Path.Combine(out1, Path.GetFileName(f))));
                Assert.True(audit.ClosedManifold, $"{f}: {audit}\n{d}");
                // A print piece's STL (former-base, former-cap) is listed under its part but is its own mesh.
                if (!Path.GetFileName(f).EndsWith($"-{name}.stl", StringComparison.Ordinal)) continue;
                Assert.Equal(p.GetProperty("triangles").GetInt32(), audit.TriangleCount);
                double v = p.GetProperty("volume_mm3").GetDouble();
                // float32 vertices (24-bit mantissa) on parts under 400 mm: relative volume error far below 1e-4.
                Assert.True(Math.Abs(audit.SignedVolume - v) <= 1e-4 * v + 1e-3, $"{name}: STL volume {audit.SignedVolume:F4} vs results {v:F4}\n{d}");
            }
        }
        Assert.True(stls >= 2, $"only {stls} STL files\n{d}");

        var r2 = Pf.Run("build", design, "-o", out2, "--force", "--formats", "stl,json");
        Assert.Equal(r.ExitCode, r2.ExitCode);
        var f1 = Directory.GetFiles(out1).Select(Path.GetFileName).Order().ToArray();
        Assert.Equal(f1, Directory.GetFiles(out2).Select(Path.GetFileName).Order().ToArray());
        foreach (var f in f1) Assert.True(File.ReadAllBytes(Path.Combine(out1, f!)).AsSpan().SequenceEqual(File.ReadAllBytes(Path.Combine(out2, f!))), $"{f} differs between two builds\n{d}");
    }

    [Fact]
    public void Random_valid_designs_build_closed_manifold_meshes_with_the_stated_volumes_deterministically()
    {
        RandomDesign.Gen.Sample(BuildAndAudit, iter: 12, threads: 1);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(1)]
    [InlineData(2)]
    public void Every_layout_with_every_magnet_shape_builds(int layout)
    {
        // The corners of the generator, so each layout/shape pairing is covered on every run, not by chance.
        double[] mid = [0.5, 0.5, 0.5, 0.5, 0.5, 0.3, 0.5, 0.5];
        for (int shape = 0; shape < 3; shape++)
            BuildAndAudit(RandomDesign.Make(layout, shape, (layout + shape) % 2, shape % 2, shape, mid));
    }
}
