using System.Diagnostics;
using PartForge.Fuzz.Oracle;
using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.CrashSafety;

/// <summary>
/// A real <c>partforge build</c> child process is SIGKILLed at spread-out moments while it rewrites an output
/// folder that holds a complete previous build of a different variant. Afterwards every file under a final
/// name must be byte-identical to the previous version or to the new version (a reference build made apart),
/// or absent when it had no previous version; anything else in the folder must be a temporary, recognisable by
/// its name (a leading '.' and the ".partial" suffix), never a final name.
/// </summary>
public sealed class KilledBuildTests
{
    private readonly Xunit.Abstractions.ITestOutputHelper _log;

    public KilledBuildTests(Xunit.Abstractions.ITestOutputHelper log) => _log = log;

    [Fact]
    public void A_build_killed_at_any_moment_leaves_only_complete_files_under_final_names()
    {
        using var tmp = new TempFolder("kill");
        string newDesign = Repo.PresetPath("wind-duo");
        string oldDesign = tmp.Sub("wind-duo.yaml");
        // The previous version: same name (so the same file names), a different rotor, so every part differs.
        File.WriteAllText(oldDesign, Repo.WithKey(Repo.WithKey(Repo.PresetText("wind-duo"), "coils", "turns", "58"), "rotor", "thickness", "6.7"));

        string refNew = tmp.Sub("ref-new"), refOld = tmp.Sub("ref-old");
        var sw = Stopwatch.StartNew();
        var rn = Pf.Exe("build", newDesign, "-o", refNew);
        double buildMs = sw.Elapsed.TotalMilliseconds;
        Assert.True(rn.ExitCode == 0, Pf.Describe(rn));
        sw.Restart();
        var ro = Pf.Exe("build", oldDesign, "-o", refOld);
        buildMs = Math.Min(buildMs, sw.Elapsed.TotalMilliseconds); // the faster of two (the first pays for cold caches)
        Assert.True(ro.ExitCode == 0, Pf.Describe(ro));
        var newFiles = Read(refNew);
        var oldFiles = Read(refOld);
        Assert.Equal(newFiles.Keys.Order(), oldFiles.Keys.Order());
        Assert.Contains(newFiles.Keys, k => !newFiles[k].AsSpan().SequenceEqual(oldFiles[k]));

        // Kill moments spread over the whole run, from process start-up to the last rename.
        double[] fractions = [0.05, 0.3, 0.5, 0.6, 0.7, 0.8, 0.88, 0.95, 0.6, 0.75];
        int killedMidway = 0;
        foreach (var (fraction, run) in fractions.Select((f, i) => (f, i)))
        {
            string outDir = tmp.Sub($"out-{run}");
            CopyFolder(refOld, outDir);
            if (run % 2 == 1) foreach (var k in oldFiles.Keys.Where((_, i) => i % 3 == 0)) File.Delete(Path.Combine(outDir, k)); // some files new
            var previous = Read(outDir);
            int delay = (int)(buildMs * fraction);
            var runClock = Stopwatch.StartNew();
            using var p = Repo.Executable.Start(["build", newDesign, "-o", outDir]);
            Thread.Sleep(delay);
            bool exited = p.HasExited;
            if (!exited) { p.Kill(); killedMidway++; } // SIGKILL on Unix
            p.WaitForExit();
            // A run that finished before its kill shows the build is faster now (warm caches): later delays follow.
            // (Measured with our own clock: Process.StartTime cannot be read on Linux once the process has gone.)
            if (exited) buildMs = Math.Min(buildMs, runClock.Elapsed.TotalMilliseconds);
            var after = Read(outDir);
            int asNew = 0, asOld = 0, temps = 0;
            foreach (var (name, bytes) in after)
            {
                if (!newFiles.ContainsKey(name))
                {
                    // The folder's advisory lock file: SIGKILL leaves it (no clean-up can run); the next build
                    // takes it over and removes it when its transaction ends (asserted after the rebuild below).
                    if (name == PartForge.Formats.Io.OutputTransaction.LockFileName) { temps++; continue; }
                    Assert.True(name.StartsWith('.') && name.EndsWith(".partial", StringComparison.Ordinal),
                        $"run {run} (killed after {delay} ms): '{name}' is neither an output nor a recognisable temporary");
                    temps++;
                    continue;
                }
                bool isNew = bytes.AsSpan().SequenceEqual(newFiles[name]);
                bool isOld = previous.TryGetValue(name, out var prev) && bytes.AsSpan().SequenceEqual(prev);
                Assert.True(isNew || isOld, $"run {run} (killed after {delay} ms): {name} ({bytes.Length} bytes) is neither the previous nor the new complete file");
                if (isNew) asNew++; else asOld++;
            }
            foreach (var name in previous.Keys) Assert.True(after.ContainsKey(name), $"run {run}: {name} vanished");
            _log.WriteLine($"run {run}: kill after {delay} ms ({(exited ? "had exited" : "killed")}): {asNew} new, {asOld} previous, {temps} temporaries, {newFiles.Count - after.Count(a => newFiles.ContainsKey(a.Key))} absent");

            // A build after the crash completes and equals the reference, temporaries or not.
            var again = Pf.Exe("build", newDesign, "-o", outDir);
            Assert.True(again.ExitCode == 0, Pf.Describe(again));
            var final = Read(outDir);
            foreach (var (name, bytes) in newFiles) Assert.True(final[name].AsSpan().SequenceEqual(bytes), $"run {run}: {name} differs from the reference after a rebuild");
            // A clean rebuild leaves only its set: no temporaries and no lock file.
            Assert.True(final.Keys.All(newFiles.ContainsKey), $"run {run}: after a clean rebuild the folder also holds {string.Join(", ", final.Keys.Where(k => !newFiles.ContainsKey(k)))}");
        }
        Assert.True(killedMidway >= 4, $"only {killedMidway} runs were killed before finishing; the build ran {buildMs:F0} ms");
    }

    private static Dictionary<string, byte[]> Read(string dir) =>
        Directory.GetFiles(dir).ToDictionary(f => Path.GetFileName(f), File.ReadAllBytes, StringComparer.Ordinal);

    private static void CopyFolder(string from, string to)
    {
        Directory.CreateDirectory(to);
        foreach (var f in Directory.GetFiles(from)) File.Copy(f, Path.Combine(to, Path.GetFileName(f)));
    }
}
