using System.Text.RegularExpressions;
using PartForge.Fuzz.Oracle;
using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.Containment;

/// <summary>
/// Nothing is ever written outside the folder given with -o: hostile design names cannot steer a file out of
/// it, a symbolic link inside it is not followed, and files that are not ours are left alone.
/// </summary>
public sealed class OutputContainmentTests
{
    private static readonly Regex OurFile = new(@"^[a-z0-9]+(-[a-z0-9]+)*\.(stl|3mf|dxf|svg|json|html|csv|png)$", RegexOptions.CultureInvariant);

    /// <summary>Hostile names, written as YAML double-quoted scalars (so NUL and escapes reach the loader).</summary>
    public static TheoryData<string> HostileNames => new()
    {
        "\"../../escape\"", "\"/tmp/pf-h8-absolute\"", "\"a/b\"", "\"a\\\\b\"", "\"..\"", "\".\"", "\"crank\\0bench\"",
        "\"" + new string('x', 5000) + "\"", "\"сrank-bench\"", "\"crank\u2215bench\"", "\"ｃｒａｎｋ\"", "\"crank\u200Bbench\"",
        "\"..\\u2215..\\u2215x\"", "\"~/x\"", "\"$HOME\"", "\"-rf\"", "\"con\"", "\"a\\nb\"", "\"%2e%2e%2fx\"", "\"\"",
    };

    [Theory]
    [MemberData(nameof(HostileNames))]
    public void A_hostile_design_name_cannot_escape_the_output_folder(string yamlName)
    {
        using var tmp = new TempFolder("name");
        string design = tmp.Sub("hostile.yaml");
        File.WriteAllText(design, Repo.WithTopKey(Repo.PresetText("crank-bench"), "name", yamlName));
        string outDir = tmp.Sub("out");
        var before = CaseOracle.Snapshot(tmp.Path);
        var r = Pf.Run("build", design, "-o", outDir);
        Assert.True(r.ExitCode is 0 or 2, Pf.Describe(r));
        var after = CaseOracle.Snapshot(tmp.Path);
        foreach (var (path, hash) in after)
        {
            if (before.TryGetValue(path, out var h) && h == hash) continue;
            Assert.True(Path.GetDirectoryName(path) == outDir, $"{path} written outside {outDir}");
            Assert.Matches(OurFile, Path.GetFileName(path));
        }
        // Nothing appeared anywhere the name could point at.
        Assert.False(File.Exists("/tmp/pf-h8-absolute-rotor.stl"));
        Assert.False(Directory.Exists("/tmp/pf-h8-absolute"));
        if (r.ExitCode == 2) Assert.Contains("hostile.yaml", r.Stderr);
    }

    [Fact]
    public void A_symbolic_link_in_the_output_folder_is_not_followed()
    {
        using var tmp = new TempFolder("link");
        string outDir = tmp.Sub("out");
        string outside = tmp.Sub("outside");
        Directory.CreateDirectory(outDir);
        Directory.CreateDirectory(outside);
        // Find the names a build writes, then plant links under those names pointing outside.
        using (var probe = new TempFolder("probe"))
        {
            var first = Pf.Run("build", Repo.PresetPath("crank-bench"), "-o", probe.Path);
            Assert.True(first.ExitCode == 0, Pf.Describe(first));
            foreach (var f in Directory.GetFiles(probe.Path).Select(Path.GetFileName))
            {
                string victim = Path.Combine(outside, f!);
                File.WriteAllText(victim, "victim " + f);
                File.CreateSymbolicLink(Path.Combine(outDir, f!), victim);
            }
        }
        var victims = CaseOracle.Snapshot(outside);
        Assert.NotEmpty(victims);
        var r = Pf.Run("build", Repo.PresetPath("crank-bench"), "-o", outDir);
        Assert.True(r.ExitCode is 0 or 2, Pf.Describe(r));
        Assert.Equal(victims, CaseOracle.Snapshot(outside));
        foreach (var f in Directory.GetFiles(outside))
            Assert.Equal("victim " + Path.GetFileName(f), File.ReadAllText(f));
        if (r.ExitCode == 2) Assert.Contains("link", r.Stderr);
    }

    [Fact]
    public void A_symbolic_link_to_a_folder_inside_the_output_folder_is_left_alone()
    {
        using var tmp = new TempFolder("dlink");
        string outDir = tmp.Sub("out");
        string outside = tmp.Sub("outside");
        Directory.CreateDirectory(outDir);
        Directory.CreateDirectory(outside);
        File.WriteAllText(Path.Combine(outside, "precious.txt"), "precious");
        Directory.CreateSymbolicLink(Path.Combine(outDir, "linked"), outside);
        var r = Pf.Run("build", Repo.PresetPath("crank-bench"), "-o", outDir);
        Assert.True(r.ExitCode == 0, Pf.Describe(r));
        Assert.Equal(["precious.txt"], Directory.GetFiles(outside).Select(Path.GetFileName).ToArray());
        Assert.Equal("precious", File.ReadAllText(Path.Combine(outside, "precious.txt")));
        Assert.NotNull(new DirectoryInfo(Path.Combine(outDir, "linked")).LinkTarget);
    }

    [Fact]
    public void Foreign_files_in_the_output_folder_are_left_alone_and_a_rebuild_replaces_only_ours()
    {
        using var tmp = new TempFolder("foreign");
        string outDir = tmp.Sub("out");
        Directory.CreateDirectory(Path.Combine(outDir, "sub"));
        File.WriteAllText(Path.Combine(outDir, "notes.txt"), "mine");
        File.WriteAllText(Path.Combine(outDir, "other-design-rotor.stl"), "not yours");
        File.WriteAllText(Path.Combine(outDir, "sub", "crank-bench-rotor.stl"), "nested, not yours");
        File.WriteAllText(Path.Combine(outDir, ".hidden"), "hidden");
        var foreign = CaseOracle.Snapshot(outDir);

        var r1 = Pf.Run("build", Repo.PresetPath("crank-bench"), "-o", outDir);
        Assert.True(r1.ExitCode == 0, Pf.Describe(r1));
        var first = CaseOracle.Snapshot(outDir);
        foreach (var (p, h) in foreign) Assert.Equal(h, first[p]);
        var ours = first.Keys.Except(foreign.Keys).ToArray();
        Assert.NotEmpty(ours);
        Assert.All(ours, p => Assert.Matches(OurFile, Path.GetFileName(p))); // the lock file goes with the build
        Assert.All(ours, p => Assert.Equal(outDir, Path.GetDirectoryName(p)));

        var r2 = Pf.Run("build", Repo.PresetPath("crank-bench"), "-o", outDir);
        Assert.True(r2.ExitCode == 0, Pf.Describe(r2));
        Assert.Equal(first, CaseOracle.Snapshot(outDir)); // foreign files kept, ours byte-identical, no temporaries left
    }

    [Fact]
    public void An_output_path_that_is_a_file_is_refused_and_left_alone()
    {
        using var tmp = new TempFolder("ofile");
        string f = tmp.Sub("not-a-folder");
        File.WriteAllText(f, "keep");
        var r = Pf.Run("build", Repo.PresetPath("crank-bench"), "-o", f);
        Assert.True(r.ExitCode == 2, Pf.Describe(r));
        Assert.Equal("keep", File.ReadAllText(f));
        Assert.Single(Directory.GetFileSystemEntries(tmp.Path));
    }
}
