using System.Diagnostics;
using PartForge.Design.Presets;
using PartForge.Formats.Io;

namespace PartForge.Cli.Tests.EndToEnd;

/// <summary>
/// The build's output set through the executable: output paths that cannot work exit 2 with a message naming
/// -o; a full or read-only device (a small tmpfs, root only) exits 2 and leaves the previous set byte for byte;
/// SIGINT / SIGTERM exit 130 / 143 with one line and leave either the previous set or the complete new one.
/// </summary>
public class OutputSetCommandTests
{
    private static string Crank => PresetLibrary.Find("crank-bench")!.Text;

    private static SortedDictionary<string, byte[]> Read(string dir) =>
        new(Directory.GetFiles(dir).ToDictionary(f => Path.GetFileName(f)!, File.ReadAllBytes), StringComparer.Ordinal);

    [Theory]
    [InlineData("", "-o: the output folder is empty")]
    [InlineData("d.yaml/sub", "is a file, so no folder can be made under it")]
    [InlineData("/proc/self", "inside /proc")]
    public void Output_paths_that_cannot_work_exit_2_naming_the_option(string o, string expect)
    {
        using var w = new WorkDir();
        w.Write("d.yaml", Crank);
        var r = PartforgeProcess.Run(w.Path, "build", "d.yaml", "-o", o);
        Assert.True(r.ExitCode == 2, r.ToString());
        Assert.Contains(expect, Assert.Single(r.StderrLines));
        Assert.DoesNotContain("internal error", r.Stderr);
    }

    [Fact]
    public void A_printed_part_asked_for_as_a_cut_sheet_is_a_usage_problem_not_a_failed_check()
    {
        using var w = new WorkDir();
        w.Write("d.yaml", PresetLibrary.Find("wind-duo")!.Text);
        var r = PartforgeProcess.Run(w.Path, "build", "d.yaml", "--parts", "rotor-front", "--formats", "dxf", "-o", "out");
        Assert.True(r.ExitCode == 2, r.ToString());
        Assert.Contains("rotor-front is printed, not cut", Assert.Single(r.StderrLines));
        Assert.DoesNotContain("check failed", r.Stderr);
        Assert.False(Directory.Exists(w.File("out")));
    }

    [TmpfsFact]
    public void A_full_disk_exits_2_and_leaves_the_previous_set_byte_for_byte()
    {
        using var w = new WorkDir();
        using var dev = Tmpfs.Mount(w.File("dev"), 1024, readOnly: false);
        w.Write("d.yaml", Crank);
        string o = Path.Combine(dev.Path, "out");
        var first = PartforgeProcess.Run(w.Path, "build", "d.yaml", "-o", o, "--formats", "stl", "--parts", "rotor");
        Assert.True(first.ExitCode == 0, first.ToString());
        var before = Read(o);
        // The whole set (3MF packages, report, previews) needs more than the megabyte left.
        w.Write("d.yaml", Crank.Replace("turns: 120", "turns: 110"));
        var r = PartforgeProcess.Run(w.Path, "build", "d.yaml", "-o", o);
        Assert.True(r.ExitCode == 2, r.ToString());
        Assert.Contains("no space left on the device holding " + o + "; free space or choose another -o", r.Stderr);
        Assert.Equal(before.Keys, Read(o).Keys);
        foreach (var (name, bytes) in Read(o)) Assert.True(bytes.AsSpan().SequenceEqual(before[name]), name + " changed");
        Assert.True(OutputSetCheck.Verify(o, "crank-bench").Complete);
    }

    [TmpfsFact]
    public void A_read_only_file_system_exits_2_before_anything_is_computed()
    {
        using var w = new WorkDir();
        using var dev = Tmpfs.Mount(w.File("dev"), 64, readOnly: true);
        w.Write("d.yaml", Crank);
        var r = PartforgeProcess.Run(w.Path, "build", "d.yaml", "-o", Path.Combine(dev.Path, "out"));
        Assert.True(r.ExitCode == 2, r.ToString());
        Assert.Contains("read-only file system; choose another -o", Assert.Single(r.StderrLines));
    }

    public static TheoryData<string, int, string> Signals => new() { { "INT", 130, "SIGINT" }, { "TERM", 143, "SIGTERM" } };

    /// <summary>Source of the codes: POSIX shells' 128 + signal number (SIGINT 2, SIGTERM 15 on Linux).</summary>
    [Theory]
    [MemberData(nameof(Signals))]
    public void A_signal_during_a_rebuild_exits_128_plus_n_with_one_line_and_no_mixed_set(string signal, int code, string name)
    {
        if (!OperatingSystem.IsLinux()) return;
        using var w = new WorkDir();
        w.Write("d.yaml", Crank);
        var clock = Stopwatch.StartNew();
        var first = PartforgeProcess.Run(w.Path, "build", "d.yaml", "-o", "out", "--quiet");
        double buildMs = clock.Elapsed.TotalMilliseconds;
        Assert.True(first.ExitCode == 0, first.ToString());
        var before = Read(w.File("out"));
        w.Write("d.yaml", Crank.Replace("turns: 120", "turns: 110"));
        int signalled = 0, spoke = 0;
        // Signals spread over the time a whole build took here (the native executable builds in a fraction of the
        // framework-dependent one's time), so some land while the set is being written.
        foreach (int delayMs in new[] { 0.2, 0.35, 0.5, 0.65, 0.8 }.Select(f => Math.Max(5, (int)(f * buildMs))))
        {
            var psi = new ProcessStartInfo(PartforgeProcess.ExePath ?? "dotnet") { WorkingDirectory = w.Path, RedirectStandardError = true, RedirectStandardOutput = true, UseShellExecute = false };
            if (PartforgeProcess.ExePath == null) psi.ArgumentList.Add(PartforgeProcess.DllPath);
            foreach (var a in new[] { "build", "d.yaml", "-o", "out", "--quiet" }) psi.ArgumentList.Add(a);
            using var p = Process.Start(psi)!;
            var err = p.StandardError.ReadToEndAsync();
            Thread.Sleep(delayMs);
            if (!p.HasExited) using (Process.Start("kill", ["-" + signal, p.Id.ToString(System.Globalization.CultureInfo.InvariantCulture)])!) { }
            Assert.True(p.WaitForExit(60_000));
            string stderr = err.Result;
            var after = Read(w.File("out"));
            Assert.DoesNotContain(after.Keys, n => OutputTransaction.IsTemporaryName(n));
            if (p.ExitCode == 0) { Assert.True(OutputSetCheck.Verify(w.File("out"), "crank-bench").Complete); continue; }
            signalled++;
            Assert.True(p.ExitCode == code, $"exit {p.ExitCode} after {delayMs} ms: {stderr}");
            bool previous = after.Keys.SequenceEqual(before.Keys) && after.All(kv => kv.Value.AsSpan().SequenceEqual(before[kv.Key]));
            if (stderr.Length == 0)
            {
                // The signal came while the runtime was still starting, before the command installed its handler
                // (the runtime's default action gives the same exit code, silently): nothing had begun.
                Assert.True(previous, $"a silent {name} after {delayMs} ms changed the previous set");
                continue;
            }
            Assert.StartsWith($"partforge: interrupted ({name}); ", Assert.Single(stderr.Split('\n', StringSplitOptions.RemoveEmptyEntries)));
            spoke++;
            // Either the previous set, untouched, or the new one complete (the signal came after the commit).
            Assert.True(previous || OutputSetCheck.Verify(w.File("out"), "crank-bench").Complete, $"after {delayMs} ms: neither the previous set nor a complete new one");
            if (!previous) before = after;
        }
        Assert.True(signalled >= 1, "every build finished before its signal");
        Assert.True(spoke >= 1, "no signal reached the command's handler (each came during the runtime's start)");
    }
}

/// <summary>A fact that needs to mount a tmpfs (root): skipped, with the reason, where mounting is not allowed.</summary>
public sealed class TmpfsFactAttribute : FactAttribute
{
    public TmpfsFactAttribute()
    {
        if (Tmpfs.Unavailable is { } why) Skip = why;
    }
}

/// <summary>A small tmpfs mounted for one test (<c>mount -t tmpfs -o size=Nk tmpfs DIR</c>), unmounted on dispose.</summary>
public sealed class Tmpfs : IDisposable
{
    private Tmpfs(string path) => Path = path;

    public string Path { get; }

    public static string? Unavailable => Probe.Value;

    private static readonly Lazy<string?> Probe = new(() =>
    {
        if (!OperatingSystem.IsLinux()) return "tmpfs mounts are a Linux test";
        string dir = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "pf-probe-" + Guid.NewGuid().ToString("N"));
        try
        {
            using var d = Mount(dir, 16, readOnly: false);
            return null;
        }
        catch (InvalidOperationException ex)
        {
            return "mounting a tmpfs is not allowed here (" + ex.Message + "); run the tests as root to include it";
        }
    });

    public static Tmpfs Mount(string dir, int kib, bool readOnly)
    {
        Directory.CreateDirectory(dir);
        var (code, err) = Run("mount", "-t", "tmpfs", "-o", $"size={kib}k{(readOnly ? ",ro" : "")}", "tmpfs", dir);
        if (code != 0)
        {
            Directory.Delete(dir);
            throw new InvalidOperationException($"mount exited {code}: {err.Trim()}");
        }
        return new Tmpfs(dir);
    }

    public void Dispose()
    {
        Run("umount", Path);
        try { Directory.Delete(Path); } catch (IOException) { }
    }

    private static (int, string) Run(string file, params string[] args)
    {
        var psi = new ProcessStartInfo(file) { RedirectStandardError = true, RedirectStandardOutput = true, UseShellExecute = false };
        foreach (var a in args) psi.ArgumentList.Add(a);
        try
        {
            using var p = Process.Start(psi)!;
            string err = p.StandardError.ReadToEnd();
            p.StandardOutput.ReadToEnd();
            p.WaitForExit();
            return (p.ExitCode, err);
        }
        catch (System.ComponentModel.Win32Exception ex)
        {
            return (-1, ex.Message);
        }
    }
}
