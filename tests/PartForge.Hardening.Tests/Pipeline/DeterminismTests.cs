using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.Pipeline;

/// <summary>Builds are byte-identical: in-process against the executable, and with builds running side by side.</summary>
public sealed class DeterminismTests
{
    [Fact]
    public void Parallel_builds_of_every_preset_equal_a_sequential_in_process_build_byte_for_byte()
    {
        using var tmp = new TempFolder("det");
        var presets = Repo.PresetNames;
        var reference = new Dictionary<string, Dictionary<string, byte[]>>();
        foreach (var p in presets)
        {
            string o = tmp.Sub("ref-" + p);
            var r = Pf.Run("build", Repo.PresetPath(p), "-o", o);
            Assert.True(r.ExitCode == 0, p + ": " + Pf.Describe(r));
            reference[p] = Directory.GetFiles(o).ToDictionary(f => Path.GetFileName(f)!, File.ReadAllBytes);
        }
        // Every preset twice, as child processes, all started together.
        var runs = presets.SelectMany(p => new[] { (p, 0), (p, 1) }).ToArray();
        var results = new (string Preset, string Out, PartForge.Fuzz.Running.CliRun Run)[runs.Length];
        Parallel.For(0, runs.Length, new ParallelOptions { MaxDegreeOfParallelism = runs.Length }, i =>
        {
            var (p, k) = runs[i];
            string o = tmp.Sub($"par-{p}-{k}");
            results[i] = (p, o, Pf.Exe("build", Repo.PresetPath(p), "-o", o));
        });
        foreach (var (p, o, r) in results)
        {
            Assert.True(r.ExitCode == 0, p + ": " + Pf.Describe(r));
            var files = Directory.GetFiles(o).ToDictionary(f => Path.GetFileName(f)!, File.ReadAllBytes);
            Assert.Equal(reference[p].Keys.Order(), files.Keys.Order());
            foreach (var (name, bytes) in reference[p])
                Assert.True(bytes.AsSpan().SequenceEqual(files[name]), $"{p}: {name} differs between a parallel executable build and the in-process build");
        }
    }
}
