using System.Security.Cryptography;
using System.Text.Json;
using PartForge.Design.Presets;
using PartForge.Export.Pipeline;
using PartForge.Formats.Io;

namespace PartForge.Export.Tests.Pipeline;

/// <summary>
/// The build writes its files as one set: a failure at any file leaves the previous set byte for byte, the
/// manifest lists every file with its size and SHA-256 (computed here, independently, with the platform's
/// SHA-256), and leftovers of earlier interrupted builds are removed while foreign files stay.
/// </summary>
public sealed class TransactionalBuildTests : IDisposable
{
    private readonly string _dir = Path.Combine(Path.GetTempPath(), "pf-tx-build-" + Guid.NewGuid().ToString("N"));

    public void Dispose()
    {
        if (Directory.Exists(_dir)) Directory.Delete(_dir, true);
    }

    private string Design(string name, string text)
    {
        Directory.CreateDirectory(_dir);
        string path = Path.Combine(_dir, name);
        File.WriteAllText(path, text);
        return path;
    }

    private static string Crank => PresetLibrary.Find("crank-bench")!.Text;

    private static SortedDictionary<string, byte[]> Read(string dir) =>
        new(Directory.GetFiles(dir).ToDictionary(f => Path.GetFileName(f)!, File.ReadAllBytes), StringComparer.Ordinal);

    public static TheoryData<int> FailAt => new() { 0, 3, 7, 11 };

    [Theory]
    [MemberData(nameof(FailAt))]
    public void A_failure_at_any_file_leaves_the_previous_set_byte_identical_and_no_temporaries(int failAt)
    {
        string design = Design("d.yaml", Crank);
        string outDir = Path.Combine(_dir, "out");
        var first = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = outDir });
        Assert.Equal(PipelineStatus.Ok, first.Status);
        File.WriteAllText(Path.Combine(outDir, "notes.txt"), "mine");
        var before = Read(outDir);

        // The new design differs in every part (thicker rotor, other turns), so a mixed set would show.
        File.WriteAllText(design, Crank.Replace("turns: 120", "turns: 110"));
        int seen = 0;
        var ex = Assert.Throws<InvalidOperationException>(() => BuildPipeline.Build(new BuildRequest
        {
            DesignPath = design,
            OutputDir = outDir,
            BeforeStage = _ => { if (seen++ == failAt) throw new InvalidOperationException("injected"); },
        }));
        Assert.Equal("injected", ex.Message);
        Assert.Equal(before.Keys, Read(outDir).Keys);
        foreach (var (name, bytes) in Read(outDir)) Assert.True(bytes.AsSpan().SequenceEqual(before[name]), $"{name} changed");
        Assert.True(OutputSetCheck.Verify(outDir, "crank-bench").Complete);
    }

    [Fact]
    public void The_manifest_lists_every_file_with_its_size_and_sha256_and_the_design_hash()
    {
        string design = Design("d.yaml", Crank);
        string outDir = Path.Combine(_dir, "out");
        var r = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = outDir });
        Assert.Equal(PipelineStatus.Ok, r.Status);
        Assert.Equal("crank-bench-manifest.json", r.Written[^1]);
        using var doc = JsonDocument.Parse(File.ReadAllBytes(Path.Combine(outDir, "crank-bench-manifest.json")));
        var root = doc.RootElement;
        Assert.Equal("partforge-output-manifest", root.GetProperty("format").GetString());
        Assert.Equal(ToolInfo.Version, root.GetProperty("tool_version").GetString());
        Assert.Matches(@"^\d+\.\d+\.\d+", ToolInfo.Version);
        Assert.Equal(Convert.ToHexStringLower(SHA256.HashData(File.ReadAllBytes(design))), root.GetProperty("design_sha256").GetString());
        var listed = root.GetProperty("files").EnumerateArray().Select(f => f.GetProperty("name").GetString()!).ToArray();
        Assert.Equal(r.Written.Take(r.Written.Count - 1).Order(StringComparer.Ordinal), listed);
        foreach (var f in root.GetProperty("files").EnumerateArray())
        {
            byte[] bytes = File.ReadAllBytes(Path.Combine(outDir, f.GetProperty("name").GetString()!));
            Assert.Equal(bytes.LongLength, f.GetProperty("size").GetInt64());
            Assert.Equal(Convert.ToHexStringLower(SHA256.HashData(bytes)), f.GetProperty("sha256").GetString());
        }
        Assert.True(OutputSetCheck.Verify(outDir, "crank-bench", Convert.ToHexStringLower(SHA256.HashData(File.ReadAllBytes(design)))).Complete);

        // A rebuild of the same design gives a byte-identical manifest (no time stamps).
        byte[] m1 = File.ReadAllBytes(Path.Combine(outDir, "crank-bench-manifest.json"));
        Assert.Equal(PipelineStatus.Ok, BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = outDir }).Status);
        Assert.Equal(m1, File.ReadAllBytes(Path.Combine(outDir, "crank-bench-manifest.json")));

        // A file changed afterwards is found.
        File.AppendAllText(Path.Combine(outDir, "crank-bench-bom.csv"), "x");
        Assert.Equal("incomplete: crank-bench-bom.csv differs", OutputSetCheck.Verify(outDir, "crank-bench").ToString());
    }

    [Fact]
    public void Stale_temporaries_of_our_naming_are_removed_at_the_start_and_foreign_files_stay()
    {
        string design = Design("d.yaml", Crank);
        string outDir = Path.Combine(_dir, "out");
        Directory.CreateDirectory(outDir);
        string[] stale = [".partforge-0123456789abcdef-crank-bench-rotor.stl.partial", ".crank-bench.3mf.fedcba9876543210.partial"];
        string[] foreign = [".mine.partial", "partforge-0123456789abcdef-x.partial", "notes.txt"];
        foreach (var n in stale.Concat(foreign)) File.WriteAllText(Path.Combine(outDir, n), "left over");
        var r = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = outDir, Formats = "stl", Parts = "rotor" });
        Assert.Equal(PipelineStatus.Ok, r.Status);
        Assert.Equal(stale.Order(StringComparer.Ordinal), r.RemovedTemporaries);
        var names = Directory.GetFiles(outDir).Select(Path.GetFileName).ToHashSet();
        foreach (var n in stale) Assert.DoesNotContain(n, names);
        foreach (var n in foreign) Assert.Contains(n, names);
        Assert.DoesNotContain(names, n => OutputTransaction.IsTemporaryName(n!));
    }

    [Fact]
    public void Output_paths_that_can_never_hold_the_set_are_refused_before_anything_is_computed()
    {
        string design = Design("d.yaml", Crank);
        foreach (var (o, expect) in new[]
                 {
                     ("", "-o: the output folder is empty"),
                     ("   ", "-o: the output folder is empty"),
                     (Path.Combine(design, "sub"), "is a file, so no folder can be made under it"),
                     (design, "this is a file, not a folder"),
                     ("/proc/self", "inside /proc, a kernel file system"),
                     ("/sys/x", "inside /sys"),
                 })
        {
            var r = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = o });
            Assert.Equal(PipelineStatus.BadInput, r.Status);
            Assert.Contains(expect, Assert.Single(r.Problems));
            Assert.Null(r.Evaluation); // refused before the stages ran
        }
    }

    [Fact]
    public void Formats_that_write_nothing_for_the_chosen_part_name_its_process()
    {
        string design = Design("w.yaml", PresetLibrary.Find("wind-duo")!.Text);
        var r = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = Path.Combine(_dir, "o"), Formats = "dxf", Parts = "rotor-front" });
        Assert.Equal(PipelineStatus.BadInput, r.Status);
        Assert.Equal("--formats dxf: nothing to write for --parts rotor-front: rotor-front is printed, not cut (formats that write it: stl, 3mf, png); change --formats or --parts", Assert.Single(r.Problems));
        Assert.False(Directory.Exists(Path.Combine(_dir, "o"))); // the folder the build made is removed again
        var cut = BuildPipeline.Build(new BuildRequest { DesignPath = design, OutputDir = Path.Combine(_dir, "o"), Formats = "stl", Parts = "back-iron" });
        Assert.Equal(PipelineStatus.BadInput, cut.Status);
        Assert.Contains("back-iron is cut, not printed (formats that write it: dxf, svg)", Assert.Single(cut.Problems));
    }
}
