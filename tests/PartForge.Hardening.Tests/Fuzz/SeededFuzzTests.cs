using PartForge.Fuzz;
using PartForge.Fuzz.Mutations;
using PartForge.Fuzz.Oracle;
using PartForge.Fuzz.Running;
using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.Fuzz;

/// <summary>
/// The bounded, seeded fuzz run of the test suite: mutated presets through <c>check --json</c> and
/// <c>build</c>, judged by <see cref="CaseOracle"/> (exit 0/1/2 only, a message naming the file, no stack
/// trace, no NaN/Infinity in the results, no hang, nothing written on failure, nothing outside -o).
/// The long run is <c>scripts/fuzz.sh</c>.
/// </summary>
public sealed class SeededFuzzTests
{
    private const int Seed = 20261201;

    [Fact]
    public void Two_hundred_mutated_designs_in_process_keep_every_promise()
    {
        using var tmp = new TempFolder("fuzz");
        var oracle = new CaseOracle(new InProcessCli(), tmp.Path, TimeSpan.FromSeconds(60)) { BuildFraction = 0.1, KeepFailures = false };
        var fallback = new CaseOracle(Repo.Executable, tmp.Path, TimeSpan.FromSeconds(60)) { BuildFraction = 0.1, KeepFailures = false };
        var summary = new FuzzSession(SeedLoader.Load(AppContext.BaseDirectory), oracle, fallback).Run(Seed, Enumerable.Range(0, 200));
        Assert.True(summary.FailedCases == 0, summary.Format());
        Assert.Equal(200, summary.Cases);
        // Exit 3 is reserved for bugs: no fuzzed input reaches it (the oracle fails such a case too; said here outright).
        Assert.Equal(0, summary.CheckExits.GetValueOrDefault("3"));
        Assert.Equal(0, summary.BuildExits.GetValueOrDefault("3"));
        // The run must exercise all three outcomes, else the mutations no longer reach the checks and the build.
        Assert.True(summary.CheckExits.GetValueOrDefault("0") >= 10, "too few mutated designs pass the check:\n" + summary.Format());
        Assert.True(summary.CheckExits.GetValueOrDefault("2") >= 70, "too few mutated designs are refused:\n" + summary.Format());
        Assert.True(summary.BuildExits.GetValueOrDefault("0") >= 1, "too few mutated designs are built:\n" + summary.Format());
    }

    [Fact]
    public void A_few_mutated_designs_through_the_real_executable_keep_every_promise()
    {
        using var tmp = new TempFolder("fuzzexe");
        var oracle = new CaseOracle(Repo.Executable, tmp.Path, TimeSpan.FromSeconds(120)) { BuildFraction = 1.0, KeepFailures = false };
        var summary = new FuzzSession(SeedLoader.Load(AppContext.BaseDirectory), oracle).Run(Seed + 1, Enumerable.Range(0, 8));
        Assert.True(summary.FailedCases == 0, summary.Format());
    }
}
