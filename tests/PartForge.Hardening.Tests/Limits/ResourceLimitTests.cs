using System.Diagnostics;
using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using PartForge.Fuzz.Oracle;
using PartForge.Fuzz.Running;
using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.Limits;

/// <summary>
/// Hostile sizes are refused at once with one clear line: an oversized file, an alias bomb, deep nesting, too
/// many values, and a chordal tolerance so fine that the mesh would not fit the triangle budget.
/// </summary>
public sealed class ResourceLimitTests
{
    private static readonly TimeSpan Quick = TimeSpan.FromSeconds(1);

    private static (CliRun Run, string File) CheckText(TempFolder tmp, string name, string text)
    {
        string f = tmp.Sub(name);
        File.WriteAllText(f, text);
        Pf.Run("check", Repo.PresetPath("crank-bench")); // warm-up, so the timing below is the limit's, not the JIT's
        return (Pf.Run("check", f), name);
    }

    private static void AssertRefusedQuickly((CliRun Run, string File) r, string mustMention)
    {
        Assert.True(r.Run.ExitCode == 2, Pf.Describe(r.Run));
        Assert.True(r.Run.Elapsed < Quick, $"took {r.Run.Elapsed.TotalMilliseconds:F0} ms; " + Pf.Describe(r.Run));
        var lines = r.Run.Stderr.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.NotEmpty(lines);
        Assert.Contains(r.File, lines[0]);
        Assert.Contains(mustMention, r.Run.Stderr, StringComparison.OrdinalIgnoreCase);
        Assert.True(lines.Length <= 3, "expected one line for one problem: " + r.Run.Stderr);
    }

    [Fact]
    public void A_two_megabyte_file_is_refused_by_size()
    {
        using var tmp = new TempFolder("big");
        var sb = new StringBuilder(Repo.PresetText("crank-bench"));
        while (sb.Length < 2 << 20) sb.Append("# padding padding padding padding padding padding padding padding\n");
        AssertRefusedQuickly(CheckText(tmp, "big.yaml", sb.ToString()), "bytes");
    }

    [Fact]
    public void A_fifty_megabyte_file_is_refused_without_being_read()
    {
        using var tmp = new TempFolder("huge");
        string f = tmp.Sub("huge.yaml");
        using (var fs = new FileStream(f, FileMode.CreateNew))
        {
            fs.Write(Encoding.UTF8.GetBytes("partforge: 1\nname: huge\n"));
            fs.SetLength(50L << 20); // sparse: 50 MB of NUL
        }
        Pf.Run("check", Repo.PresetPath("crank-bench"));
        var r = Pf.Run("check", f);
        AssertRefusedQuickly((r, "huge.yaml"), "bytes");
    }

    [Fact]
    public void A_billion_laughs_alias_bomb_is_refused_quickly()
    {
        using var tmp = new TempFolder("lol");
        var sb = new StringBuilder();
        sb.Append("lol0: &l0 [\"lol\", \"lol\", \"lol\", \"lol\", \"lol\", \"lol\", \"lol\", \"lol\", \"lol\", \"lol\"]\n");
        for (int i = 1; i < 10; i++)
            sb.Append(CultureInfo.InvariantCulture, $"lol{i}: &l{i} [{string.Join(", ", Enumerable.Repeat($"*l{i - 1}", 10))}]\n");
        string text = Repo.PresetText("crank-bench").Replace("name: crank-bench", "name: *l9\n" + sb);
        AssertRefusedQuickly(CheckText(tmp, "lol.yaml", text), "alias");
    }

    [Theory]
    [InlineData(100)]
    [InlineData(100_000)]
    public void Deep_flow_nesting_is_refused_quickly(int depth)
    {
        using var tmp = new TempFolder("deep");
        string text = Repo.PresetText("crank-bench").Replace("bore: 8", "bore: " + new string('[', depth) + new string(']', depth));
        AssertRefusedQuickly(CheckText(tmp, "deep.yaml", text), "nested");
    }

    [Fact]
    public void Deep_block_nesting_is_refused_quickly()
    {
        using var tmp = new TempFolder("deepb");
        var sb = new StringBuilder(Repo.PresetText("crank-bench")).Append('\n');
        for (int i = 0; i < 500; i++) sb.Append(' ', i).Append('k').Append(i).Append(":\n");
        sb.Append(' ', 500).Append("leaf\n");
        AssertRefusedQuickly(CheckText(tmp, "deepb.yaml", sb.ToString()), "nested");
    }

    [Fact]
    public void Too_many_values_are_refused_quickly()
    {
        using var tmp = new TempFolder("many");
        string text = Repo.PresetText("crank-bench") + "\nextra: [" + string.Join(", ", Enumerable.Repeat("1", 50_000)) + "]\n";
        AssertRefusedQuickly(CheckText(tmp, "many.yaml", text), "values");
    }

    /// <summary>
    /// The acceptance case of the resource limits: a chordal tolerance far too fine for the triangle budget is
    /// refused by <c>build</c> in under a second, before meshing, with the estimate and the smallest tolerance
    /// that fits; nothing is written.
    /// </summary>
    [Theory]
    [InlineData("wind-duo", "1e-9")]
    [InlineData("crank-bench", "0.000001")]
    public void A_tiny_chordal_tolerance_is_refused_in_under_a_second_with_the_estimate(string preset, string tolerance)
    {
        using var tmp = new TempFolder("tol");
        string design = tmp.Sub(preset + "-fine.yaml");
        File.WriteAllText(design, Repo.WithKey(Repo.PresetText(preset), "mesh", "chordal_tolerance", tolerance));
        string outDir = tmp.Sub("out");
        // First as a child process with a timeout, so that a missing gate shows as a failure here instead of
        // an in-process thread meshing for minutes (it could not be stopped and would block every later case).
        var exe = Repo.Executable.Run(["build", design, "-o", outDir], TimeSpan.FromSeconds(20));
        Assert.True(exe.ExitCode == 2, "the executable did not refuse the tolerance at once (no mesh-size estimate before meshing?): " + Pf.Describe(exe));
        Assert.False(Directory.Exists(outDir) && Directory.EnumerateFileSystemEntries(outDir).Any(), "files were written");
        Pf.Run("check", Repo.PresetPath(preset)); // warm-up of loader, electrical engine and checks
        var r = Pf.Run("build", design, "-o", outDir);
        Assert.True(r.ExitCode == 2, Pf.Describe(r));
        // The run's own time (Elapsed excludes waiting for other tests' in-process runs to finish).
        Assert.True(r.Elapsed < Quick, $"refusal took {r.Elapsed.TotalMilliseconds:F0} ms (must be under 1 s); " + Pf.Describe(r));
        Assert.Contains(preset + "-fine.yaml", r.Stderr);
        Assert.Contains("chordal_tolerance", r.Stderr);
        Assert.Contains("triangle", r.Stderr, StringComparison.OrdinalIgnoreCase);
        Assert.Empty(CaseOracle.Snapshot(tmp.Path).Keys.Where(k => k.StartsWith(outDir, StringComparison.Ordinal)));

        // The smallest tolerance that fits: the largest-looking number in the message that is a tolerance.
        var numbers = Regex.Matches(r.Stderr, @"(?<![\w.])\d+(\.\d+)?([eE][-+]?\d+)?(?![\w])")
            .Select(m => double.Parse(m.Value, CultureInfo.InvariantCulture)).ToArray();
        double tol = double.Parse(tolerance, CultureInfo.InvariantCulture);
        var candidates = numbers.Where(n => n > tol && n < 10).ToArray();
        Assert.True(candidates.Length > 0, "no smallest tolerance that fits in: " + r.Stderr);
        Assert.Contains(numbers, n => n >= 1e5); // the triangle estimate
    }
}
