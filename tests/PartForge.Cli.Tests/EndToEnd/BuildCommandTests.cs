using System.Text.Json;
using PartForge.Design.Presets;

namespace PartForge.Cli.Tests.EndToEnd;

/// <summary>check and build on real designs through the executable: exit codes, the gate, --force, filters, containment, determinism.</summary>
public class BuildCommandTests
{
    private static string Crank => PresetLibrary.Find("crank-bench")!.Text;

    /// <summary>The crank preset with a running gap too small for its tolerances: worst case 0.4 - 0.35 = 0.05 mm below 0.3 mm.</summary>
    private static string Failing => Crank.Replace("  air_gap: 1.0\n", "  air_gap: 0.4\n");

    [Fact]
    public void Build_timings_go_to_stderr_stage_by_stage()
    {
        using var w = new WorkDir();
        w.Write("d.yaml", Crank);
        var r = PartforgeProcess.Run(w.Path, "build", "d.yaml", "-o", "out", "--formats", "stl", "--parts", "rotor", "--timings");
        Assert.True(r.ExitCode == 0, r.ToString());
        Assert.Matches(@"^timings: load [0-9.]+ ms, budget [0-9.]+ ms, electrical [0-9.]+ ms, parts [0-9.]+ ms, checks [0-9.]+ ms, mesh [0-9.]+ ms, previews [0-9.]+ ms, write [0-9.]+ ms; process [0-9]+ ms so far", r.Stderr.Trim());
        Assert.DoesNotContain("timings", r.Stdout);
        Assert.Equal(["crank-bench-manifest.json", "crank-bench-rotor.stl"], Directory.GetFiles(w.File("out")).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray());
    }

    [Fact]
    public void Build_writes_every_output_once_deterministically_and_leaves_foreign_files_alone()
    {
        using var w = new WorkDir();
        w.Write("d.yaml", Crank);
        Directory.CreateDirectory(w.File("out"));
        w.Write("out/notes.txt", "mine");
        var r1 = PartforgeProcess.Run(w.Path, "build", "d.yaml", "-o", "out", "--quiet");
        Assert.True(r1.ExitCode == 0, r1.ToString());
        Assert.Equal("", r1.Stdout);
        var r2 = PartforgeProcess.Run(w.Path, "build", "d.yaml", "-o", "out2", "--quiet");
        Assert.Equal(0, r2.ExitCode);

        var files = Directory.GetFiles(w.File("out")).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray();
        Assert.Equal("mine", File.ReadAllText(w.File("out/notes.txt")));
        Assert.DoesNotContain(files, f => f!.EndsWith(".partial"));
        foreach (var f in files.Where(f => f != "notes.txt"))
            Assert.True(File.ReadAllBytes(w.File("out/" + f)).AsSpan().SequenceEqual(File.ReadAllBytes(w.File("out2/" + f))), f + " differs between builds");

        using var doc = JsonDocument.Parse(File.ReadAllText(w.File("out/crank-bench-results.json")));
        var root = doc.RootElement;
        Assert.Equal("partforge-results/1", root.GetProperty("format").GetString());
        Assert.Equal("pass", root.GetProperty("summary").GetProperty("status").GetString());
        var listed = new SortedSet<string>(StringComparer.Ordinal) { "crank-bench-results.json", "crank-bench-report.html", "crank-bench-bom.csv", "crank-bench-assembly.png", "crank-bench-manifest.json", "notes.txt" };
        foreach (var p in root.GetProperty("parts").EnumerateArray())
        {
            Assert.True(p.GetProperty("volume_mm3").GetDouble() > 0);
            Assert.True(p.GetProperty("quantity").GetInt32() >= 1);
            foreach (var f in p.GetProperty("files").EnumerateArray()) listed.Add(f.GetString()!);
        }
        Assert.Equal(listed.ToArray(), files);
        Assert.Contains("crank-bench-rotor.stl", files);
        Assert.Contains("crank-bench.3mf", files);
    }

    [Fact]
    public void A_failed_check_writes_nothing_and_force_writes_marked_failed()
    {
        using var w = new WorkDir();
        w.Write("bad.yaml", Failing);
        var check = PartforgeProcess.Run(w.Path, "check", "bad.yaml");
        Assert.True(check.ExitCode == 1, check.ToString());
        Assert.Contains(check.StderrLines, l => l.Contains("running-gap"));
        Assert.Contains("crank-bench: fail", check.Stdout);

        var build = PartforgeProcess.Run(w.Path, "build", "bad.yaml", "-o", "out");
        Assert.Equal(1, build.ExitCode);
        Assert.Contains(build.StderrLines, l => l.Contains("nothing was written"));
        Assert.False(Directory.Exists(w.File("out")));
        Assert.Equal(["bad.yaml"], w.Files());

        var forced = PartforgeProcess.Run(w.Path, "build", "bad.yaml", "-o", "out", "--force", "--formats", "json,stl");
        Assert.Equal(1, forced.ExitCode);
        using var doc = JsonDocument.Parse(File.ReadAllText(w.File("out/crank-bench-results.json")));
        var summary = doc.RootElement.GetProperty("summary");
        Assert.Equal("fail", summary.GetProperty("status").GetString());
        Assert.True(summary.GetProperty("forced").GetBoolean());
        Assert.True(File.Exists(w.File("out/crank-bench-rotor.stl")));
        Assert.False(File.Exists(w.File("out/crank-bench-report.html")));
    }

    [Fact]
    public void Check_json_prints_the_results_document_and_exit_codes_follow_the_checks()
    {
        using var w = new WorkDir();
        w.Write("d.yaml", Crank);
        var ok = PartforgeProcess.Run(w.Path, "check", "d.yaml", "--json");
        Assert.Equal(0, ok.ExitCode);
        using var doc = JsonDocument.Parse(ok.Stdout);
        var e = doc.RootElement.GetProperty("electrical");
        Assert.Equal(6, e.GetProperty("pole_pairs").GetInt32());                 // 12 poles
        Assert.Equal(40.0, e.GetProperty("electrical_hz").GetDouble(), 9);       // f = p n / 60 = 6 x 400 / 60
        Assert.Equal(120, e.GetProperty("coil").GetProperty("turns").GetInt32());
        Assert.Equal(["crank-bench", "d.yaml"], new[] { doc.RootElement.GetProperty("design").GetString()!, "d.yaml" });
        Assert.Equal(["d.yaml"], w.Files());                                      // check writes nothing
        Assert.DoesNotContain("NaN", ok.Stdout);

        w.Write("bad.yaml", Failing);
        var bad = PartforgeProcess.Run(w.Path, "check", "bad.yaml", "--json");
        Assert.Equal(1, bad.ExitCode);
        using var bdoc = JsonDocument.Parse(bad.Stdout);
        Assert.Equal("fail", bdoc.RootElement.GetProperty("summary").GetProperty("status").GetString());
    }

    [Fact]
    public void Filters_write_only_the_chosen_formats_and_parts_and_links_are_not_followed()
    {
        using var w = new WorkDir();
        w.Write("d.yaml", Crank);
        var r = PartforgeProcess.Run(w.Path, "build", "d.yaml", "-o", "sel", "--formats", "stl", "--parts", "rotor");
        Assert.Equal(0, r.ExitCode);
        Assert.Equal(["crank-bench-manifest.json", "crank-bench-rotor.stl"], Directory.GetFiles(w.File("sel")).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray());
        var noPart = PartforgeProcess.Run(w.Path, "build", "d.yaml", "-o", "sel", "--parts", "rotor-front");
        Assert.Equal(2, noPart.ExitCode);
        Assert.Contains("no part 'rotor-front'", Assert.Single(noPart.StderrLines));

        // A symbolic link at an output name, pointing outside the folder: refused, the target untouched.
        string outside = w.File("outside.stl");
        File.WriteAllText(outside, "precious");
        Directory.CreateDirectory(w.File("linked"));
        File.CreateSymbolicLink(w.File("linked/crank-bench-rotor.stl"), outside);
        var link = PartforgeProcess.Run(w.Path, "build", "d.yaml", "-o", "linked", "--formats", "stl");
        Assert.Equal(2, link.ExitCode);
        Assert.Contains("symbolic link", Assert.Single(link.StderrLines));
        Assert.Equal("precious", File.ReadAllText(outside));
        // Only the link (and the folder's lock file, taken when the build began) are there.
        Assert.Equal(["crank-bench-rotor.stl"], Directory.GetFileSystemEntries(w.File("linked")).Select(Path.GetFileName).ToArray());
    }
}
