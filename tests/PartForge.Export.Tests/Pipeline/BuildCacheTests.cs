using System.Text.RegularExpressions;
using PartForge.Export.Pipeline;

namespace PartForge.Export.Tests.Pipeline;

/// <summary>
/// A build that reuses the previous build's meshes and previews (what <c>partforge watch</c> does) writes exactly
/// the bytes a fresh build writes, reuses the parts whose exact layers did not change, and makes the others again.
/// </summary>
public class BuildCacheTests
{
    [Fact]
    public void A_cached_rebuild_after_a_turns_change_writes_the_same_files_as_a_fresh_build()
    {
        string dir = Directory.CreateTempSubdirectory("pf-cache-").FullName;
        try
        {
            string yaml = File.ReadAllText(Path.Combine(PartForge.Export.Tests.Report.Pipeline.RepoRoot(), "presets", "wind-duo.yaml"));
            var m = Regex.Match(yaml, @"^  turns: *(\d+)", RegexOptions.Multiline);
            Assert.True(m.Success);
            string design = Path.Combine(dir, "d.yaml");
            File.WriteAllText(design, yaml);
            var cache = new BuildCache();
            var first = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = Path.Combine(dir, "cached"), Force = true, Cache = cache });
            Assert.NotEqual(PipelineStatus.BadInput, first.Status);
            Assert.Empty(cache.LastReusedParts);

            string edited = yaml[..m.Index] + "  turns: " + (int.Parse(m.Groups[1].Value, System.Globalization.CultureInfo.InvariantCulture) + 9) + yaml[(m.Index + m.Length)..];
            File.WriteAllText(design, edited);
            var second = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = Path.Combine(dir, "cached"), Force = true, Cache = cache });
            Assert.NotEqual(PipelineStatus.BadInput, second.Status);
            var fresh = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = Path.Combine(dir, "fresh"), Force = true });

            // The rotors keep their geometry when only the winding changes; the former follows the winding.
            Assert.Contains("rotor-front", cache.LastReusedParts);
            Assert.DoesNotContain("former", cache.LastReusedParts);
            Assert.True(cache.LastReusedPreviews > 0, "no preview was reused");
            var reused = second.Evaluation!.Parts!.Parts.Where(p => cache.LastReusedParts.Contains(p.Name)).ToArray();
            foreach (var p in reused)
                Assert.Same(first.Evaluation!.Parts!.Get(p.Id).Mesh, p.Mesh);

            Assert.Equal(fresh.Written.Order(StringComparer.Ordinal), second.Written.Order(StringComparer.Ordinal));
            foreach (var f in fresh.Written)
                Assert.True(File.ReadAllBytes(Path.Combine(dir, "fresh", f)).AsSpan().SequenceEqual(File.ReadAllBytes(Path.Combine(dir, "cached", f))), $"{f} differs between the cached and the fresh build");
        }
        finally { Directory.Delete(dir, true); }
    }
}
