using System.Text;
using PartForge.Fuzz.Mutations;
using PartForge.Fuzz.Oracle;
using PartForge.Fuzz.Running;
using PartForge.Hardening.Tests.Support;

namespace PartForge.Hardening.Tests.Fuzz;

/// <summary>The oracle itself must catch each broken promise (a fake command line plays the culprit).</summary>
public sealed class OracleSelfTests
{
    private sealed class FakeCli(Func<IReadOnlyList<string>, CliRun> f) : ICliRunner
    {
        public string Kind => "fake";
        public CliRun Run(IReadOnlyList<string> args, TimeSpan timeout) => f(args);
    }

    private static readonly FuzzInput Input = new(0, 3, "crank-bench", ["test"], Encoding.UTF8.GetBytes("partforge: 1\n"));
    private const string GoodJson = "{\"format\":\"partforge-results/1\",\"summary\":{\"status\":\"pass\",\"fail\":0,\"warn\":0}}";

    private static IReadOnlyList<string> Kinds(Func<IReadOnlyList<string>, CliRun> f)
    {
        using var tmp = new TempFolder("oracle");
        var o = new CaseOracle(new FakeCli(f), tmp.Path, TimeSpan.FromSeconds(5)) { KeepFailures = false };
        return o.Run(Input).Violations.Select(v => v.Kind).Distinct().ToArray();
    }

    private static CliRun R(int? code, string stdout = "", string stderr = "") => new(code, stdout, stderr, TimeSpan.FromMilliseconds(1));

    [Fact]
    public void A_clean_bad_input_case_passes()
    {
        Assert.Empty(Kinds(a => R(2, "", "crank-bench-fuzz.yaml:1:1: name: is missing")));
    }

    [Fact]
    public void Exit_3_is_caught() => Assert.Contains("exit-3", Kinds(a => R(3, "", "partforge: internal error (NullReferenceException): x")));

    [Fact]
    public void A_stack_trace_is_caught() =>
        Assert.Contains("stack-trace", Kinds(a => R(2, "", "crank-bench-fuzz.yaml: bad\n   at PartForge.Design.Loading.NodeMapper.Map(YNode n) in /x/NodeMapper.cs:line 5")));

    [Fact]
    public void A_hang_is_caught() => Assert.Contains("hang", Kinds(a => R(null)));

    [Fact]
    public void A_message_without_the_file_name_is_caught() => Assert.Contains("message-without-file", Kinds(a => R(2, "", "something is wrong")));

    [Fact]
    public void No_message_is_caught() => Assert.Contains("no-message", Kinds(a => R(2)));

    [Fact]
    public void Nan_in_the_results_is_caught()
    {
        Assert.Contains("nan-in-json", Kinds(a => a[0] == "check" ? R(0, "{\"format\":\"partforge-results/1\",\"x\":NaN}") : R(2, "", "crank-bench-fuzz.yaml: x")));
        Assert.Contains("nan-in-json", Kinds(a => a[0] == "check"
            ? R(0, "{\"format\":\"partforge-results/1\",\"summary\":{\"status\":\"pass\"},\"checks\":[{\"message\":\"margin NaN mm\"}]}")
            : R(2, "", "crank-bench-fuzz.yaml: x")));
    }

    [Fact]
    public void Writing_on_failure_and_outside_the_folder_are_caught()
    {
        var kinds = Kinds(a =>
        {
            if (a[0] == "check") return R(1, GoodJson.Replace("pass", "fail"), "crank-bench-fuzz.yaml: check failed");
            string outDir = a[3];
            Directory.CreateDirectory(outDir);
            File.WriteAllText(Path.Combine(outDir, "x-rotor.stl"), "partial");
            File.WriteAllText(Path.Combine(Path.GetDirectoryName(outDir)!, "escaped.stl"), "escaped");
            return R(1, "", "crank-bench-fuzz.yaml: check failed");
        });
        Assert.Contains("wrote-on-failure", kinds);
        Assert.Contains("wrote-outside", kinds);
    }

    [Fact]
    public void A_status_that_contradicts_the_exit_code_is_caught() =>
        Assert.Contains("status-mismatch", Kinds(a => a[0] == "check" ? R(1, GoodJson) : R(1, "", "crank-bench-fuzz.yaml: fail")));

    [Fact]
    public void A_temporary_file_left_after_success_is_caught()
    {
        var kinds = Kinds(a =>
        {
            if (a[0] == "check") return R(0, GoodJson);
            Directory.CreateDirectory(a[3]);
            File.WriteAllText(Path.Combine(a[3], "x-rotor.stl"), "solid x\nendsolid x\n");
            File.WriteAllText(Path.Combine(a[3], ".x-rotor.stl.1234.partial"), "half");
            return R(0);
        });
        Assert.Contains("temp-left", kinds);
    }
}
