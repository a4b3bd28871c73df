using PartForge.Fuzz.Mutations;
using PartForge.Fuzz.Oracle;
using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.Fuzz;

/// <summary>
/// Cases the fuzzer found, kept as plain regression tests with the same oracle, so that each stays fixed
/// even if the mutator changes. Each names the preset and the edit.
/// </summary>
public sealed class FoundCaseTests
{
    private static void AssertKeepsPromises(string preset, string text)
    {
        using var tmp = new TempFolder("found");
        var oracle = new CaseOracle(new PartForge.Fuzz.Running.InProcessCli(), tmp.Path, TimeSpan.FromSeconds(120)) { KeepFailures = false };
        var outcome = oracle.Run(new FuzzInput(0, 1, preset, ["regression"], System.Text.Encoding.UTF8.GetBytes(text)));
        Assert.True(outcome.Passed, string.Join("\n", outcome.Violations));
    }

    /// <summary>
    /// A winding so large that the former would exceed the mesher's 512 mm coordinate range: the design is
    /// bad (the checks already say the coils overlap), so it must end in exit 1 or 2 with a message, not
    /// exit 3 "internal error (PartsException)" (found with seed 20261201, case 232: AWG 5 on pulse-sculpture).
    /// </summary>
    [Theory]
    [InlineData("crank-bench", "turns: 120", "turns: 20000")]
    [InlineData("pulse-sculpture", "wire: { awg: 26 }", "wire: { awg: 5 }")]
    public void An_oversized_winding_is_a_design_problem_not_an_internal_error(string preset, string from, string to)
    {
        string text = Repo.PresetText(preset);
        Assert.Contains(from, text);
        AssertKeepsPromises(preset, text.Replace(from, to));
    }
}
