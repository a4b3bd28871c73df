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

/// <summary>A parallel sweep gives the same document every time, and each variant equals a single check of it.</summary>
public sealed class SweepDeterminismTests
{
    [Fact]
    public void A_parallel_sweep_is_byte_identical_across_runs_and_agrees_with_single_checks()
    {
        using var tmp = new TempFolder("sweep");
        string design = Repo.PresetPath("crank-bench");
        string csv1 = tmp.Sub("a.csv"), csv2 = tmp.Sub("b.csv");
        var a = Pf.Run("sweep", design, "--vary", "coils.turns=100..140:10", "--vary", "gap.air_gap=0.8..1.2:0.2", "--json", "--csv", csv1);
        var b = Pf.Run("sweep", design, "--vary", "coils.turns=100..140:10", "--vary", "gap.air_gap=0.8..1.2:0.2", "--json", "--csv", csv2);
        Assert.True(a.ExitCode is 0 or 1, Pf.Describe(a));
        Assert.Equal(a.ExitCode, b.ExitCode);
        Assert.Equal(a.Stdout, b.Stdout);
        Assert.Equal(File.ReadAllBytes(csv1), File.ReadAllBytes(csv2));
        Assert.False(string.IsNullOrWhiteSpace(a.Stdout));

        // One variant checked on its own gives the same phase EMF as its sweep row (same model, no sharing bugs).
        string one = tmp.Sub("one.yaml");
        File.WriteAllText(one, Repo.WithKey(Repo.WithKey(Repo.PresetText("crank-bench"), "coils", "turns", "130"), "gap", "air_gap", "1"));
        var single = Pf.Run("check", one, "--json");
        Assert.True(single.ExitCode is 0 or 1, Pf.Describe(single));
        using var doc = System.Text.Json.JsonDocument.Parse(single.Stdout);
        double emf = doc.RootElement.GetProperty("electrical").GetProperty("phase").GetProperty("emf_rms_v").GetDouble();
        string emfText = emf.ToString("R", System.Globalization.CultureInfo.InvariantCulture);
        var rows = File.ReadAllLines(csv1);
        var header = rows[0].Split(',');
        int ti = Array.FindIndex(header, h => h.Trim('"') == "coils.turns"), gi = Array.FindIndex(header, h => h.Trim('"') == "gap.air_gap");
        int ei = Array.FindIndex(header, h => h.Trim('"').Contains("emf_rms_v", StringComparison.Ordinal) && h.Contains("phase", StringComparison.Ordinal));
        Assert.True(ti >= 0 && gi >= 0 && ei >= 0, "CSV header: " + rows[0]);
        var row = rows.Skip(1).Select(r => r.Split(',')).Single(c => double.Parse(c[ti].Trim('"'), System.Globalization.CultureInfo.InvariantCulture) == 130
            && Math.Abs(double.Parse(c[gi].Trim('"'), System.Globalization.CultureInfo.InvariantCulture) - 1) < 1e-9);
        double swept = double.Parse(row[ei].Trim('"'), System.Globalization.CultureInfo.InvariantCulture);
        Assert.True(Math.Abs(swept - emf) <= 1e-6 * Math.Max(1, Math.Abs(emf)) + 1e-4, $"sweep row {swept} vs single check {emfText}");
    }
}
