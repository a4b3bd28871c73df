using PartForge.Design.Presets;

namespace PartForge.Cli.Tests.EndToEnd;

/// <summary>
/// Malformed designs through the real executable: exit 2, one clear line per problem naming file, line and
/// key, no stack trace, nothing written (the output folder is not even created).
/// </summary>
public class MalformedDesignTests
{
    private static string Crank => PresetLibrary.Find("crank-bench")!.Text;

    private static string Replace(string text, string from, string to)
    {
        Assert.Contains(from, text);
        return text.Replace(from, to);
    }

    public static TheoryData<string, string, string> Cases => new()
    {
        // name, design text, text the single error line must contain
        { "syntax", Replace(Crank, "  poles: 12\n", "  poles: [12\n"), "YAML syntax error" },
        { "wrong-type", Replace(Crank, "  poles: 12\n", "  poles: twelve\n"), "machine.poles: twelve is not a number" },
        { "negative", Replace(Crank, "  thickness: 5.2\n", "  thickness: -5.2\n"), "rotor.thickness: -5.2 is not allowed" },
        { "nan", Replace(Crank, "  outer_diameter: 110\n", "  outer_diameter: .nan\n"), "rotor.outer_diameter: .nan is not a finite number" },
        { "unknown-key", Replace(Crank, "  poles: 12\n", "  pols: 12\n"), "did you mean 'poles'?" },
        { "pockets-overlap", Replace(Crank, "  diameter: 12\n", "  diameter: 22\n"), "neighbouring pockets overlap" },
        { "pockets-rim", Replace(Crank, "  outer_diameter: 110\n", "  outer_diameter: 90\n"), "through the rotor rim" },
        { "empty", "", "the file is empty" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Check_and_build_refuse_with_exit_2_one_line_and_nothing_written(string name, string text, string expected)
    {
        using var w = new WorkDir();
        w.Write("d.yaml", text);
        foreach (var args in new[] { new[] { "check", "d.yaml" }, new[] { "build", "d.yaml", "-o", "out" }, new[] { "check", "d.yaml", "--json" } })
        {
            var r = PartforgeProcess.Run(w.Path, args);
            Assert.True(r.ExitCode == 2, name + ": " + r);
            var line = Assert.Single(r.StderrLines);
            Assert.Contains(expected, line);
            Assert.StartsWith("d.yaml", line);
            Assert.DoesNotContain("   at ", r.Stderr);
            Assert.Equal("", r.Stdout);
            Assert.Equal(["d.yaml"], w.Files());
            Assert.False(Directory.Exists(w.File("out")));
        }
    }

    [Fact]
    public void Located_errors_give_line_and_column()
    {
        using var w = new WorkDir();
        string text = Replace(Crank, "  pocket_clearance: 0.15\n", "  pocket_clearance: -0.2\n");
        int line = text.Split('\n').ToList().FindIndex(l => l.Contains("pocket_clearance")) + 1;
        w.Write("crank.yaml", text);
        var r = PartforgeProcess.Run(w.Path, "check", "crank.yaml");
        Assert.Equal(2, r.ExitCode);
        Assert.Equal($"crank.yaml:{line}:21: rotor.pocket_clearance: -0.2 is not allowed; allowed: 0 to 5 mm", Assert.Single(r.StderrLines));
    }

    [Fact]
    public void Several_errors_are_reported_one_line_each()
    {
        using var w = new WorkDir();
        string text = Replace(Replace(Replace(Crank, "  poles: 12\n", "  pols: 12\n"), "  turns: 120\n", "  turns: -4\n"), "  layout: single-rotor\n", "  layout: rotor\n");
        w.Write("d.yaml", text);
        var r = PartforgeProcess.Run(w.Path, "check", "d.yaml");
        Assert.Equal(2, r.ExitCode);
        Assert.Equal(3, r.StderrLines.Length);
        Assert.All(r.StderrLines, l => Assert.StartsWith("d.yaml:", l));
    }

    [Fact]
    public void Missing_file_directory_and_a_50_MB_file()
    {
        using var w = new WorkDir();
        var missing = PartforgeProcess.Run(w.Path, "check", "nope.yaml");
        Assert.Equal(2, missing.ExitCode);
        Assert.Equal("nope.yaml: file not found", Assert.Single(missing.StderrLines));

        Directory.CreateDirectory(w.File("dir.yaml"));
        var dir = PartforgeProcess.Run(w.Path, "build", "dir.yaml", "-o", "out");
        Assert.Equal(2, dir.ExitCode);
        Assert.Contains("directory", Assert.Single(dir.StderrLines));

        using (var fs = new FileStream(w.File("big.yaml"), FileMode.CreateNew)) fs.SetLength(50L * 1024 * 1024);
        var sw = System.Diagnostics.Stopwatch.StartNew();
        var big = PartforgeProcess.Run(w.Path, "build", "big.yaml", "-o", "out");
        sw.Stop();
        Assert.Equal(2, big.ExitCode);
        Assert.Contains("at most 1048576 bytes", Assert.Single(big.StderrLines));
        Assert.False(Directory.Exists(w.File("out")));
        Assert.True(sw.Elapsed.TotalSeconds < 10, $"took {sw.Elapsed.TotalSeconds} s");
    }

    [Fact]
    public void Bad_formats_and_parts_exit_2_with_the_allowed_list()
    {
        using var w = new WorkDir();
        w.Write("d.yaml", Crank);
        var f = PartforgeProcess.Run(w.Path, "build", "d.yaml", "--formats", "stl,obj");
        Assert.Equal(2, f.ExitCode);
        Assert.Contains("allowed: stl, 3mf, dxf, svg, json, html, csv, png", Assert.Single(f.StderrLines));
        var p = PartforgeProcess.Run(w.Path, "build", "d.yaml", "--parts", "rotor,wheel");
        Assert.Equal(2, p.ExitCode);
        Assert.Contains("'wheel'", Assert.Single(p.StderrLines));
        Assert.Equal(["d.yaml"], w.Files());
    }

    [Fact]
    public void Output_folder_that_is_a_file_is_refused()
    {
        using var w = new WorkDir();
        w.Write("d.yaml", Crank);
        w.Write("out", "not a folder");
        var r = PartforgeProcess.Run(w.Path, "build", "d.yaml", "-o", "out");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("is a file", Assert.Single(r.StderrLines));
        Assert.Equal("not a folder", File.ReadAllText(w.File("out")));
    }
}
