using PartForge.Cli.Tests.EndToEnd;

namespace PartForge.Cli.Tests.Sweep;

/// <summary>
/// Findings: <c>sweep --csv /nonexistent/x.csv</c> computed every variant and then failed; a sweep of an invalid
/// base design printed every row "invalid" and exited 0; a 100,000-row sweep held every row and wrote the CSV only
/// at the end. Now the axes, the base design and the CSV path are checked before any variant runs (exit 2), and
/// the CSV is written as the rows finish.
/// </summary>
public class SweepUpFrontTests
{
    private static string Crank => SweepRunnerTests.Preset("crank-bench");

    [Fact]
    public void A_csv_in_a_folder_that_does_not_exist_is_refused_before_any_variant_runs()
    {
        using var w = new WorkDir();
        string d = w.Write("d.yaml", Crank);
        var r = PartforgeProcess.Run(w.Path, "sweep", d, "--vary", "machine.rated_rpm=100..300:100", "--csv", w.File("no-such-folder/x.csv"));
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("no-such-folder", r.Stderr);
        Assert.DoesNotContain("variants", r.Stderr); // no progress line: nothing was computed
        Assert.Empty(r.Stdout);
    }

    [Fact]
    public void An_invalid_base_design_exits_2_with_its_errors_and_no_rows()
    {
        using var w = new WorkDir();
        string d = w.Write("d.yaml", Crank.Replace("  poles: 12", "  poles: 11").Replace("layout: single-rotor", "layout: single-rotr"));
        var r = PartforgeProcess.Run(w.Path, "sweep", d, "--vary", "machine.rated_rpm=100..300:100");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("machine.poles", r.Stderr);
        Assert.Contains("machine.layout", r.Stderr);
        Assert.Contains("base design", r.Stderr);
        Assert.Empty(r.Stdout);
    }

    [Fact]
    public void A_base_design_whose_only_error_is_on_a_varied_key_is_swept()
    {
        // Odd poles in the file, but the sweep sets the poles: every variant is valid.
        using var w = new WorkDir();
        string d = w.Write("d.yaml", Crank.Replace("  poles: 12", "  poles: 11"));
        var r = PartforgeProcess.Run(w.Path, "sweep", d, "--vary", "machine.poles=10..14:2", "--quiet");
        Assert.True(r.ExitCode == 0, r.ToString());
        Assert.Equal(4, r.Stdout.TrimEnd('\n').Split('\n').Length);
    }

    [Fact]
    public void A_sweep_in_which_no_variant_loads_exits_2()
    {
        using var w = new WorkDir();
        string d = w.Write("d.yaml", Crank);
        // A bore of 100 mm or more swallows crank-bench's 110 mm rotor's pockets (invented preset).
        var r = PartforgeProcess.Run(w.Path, "sweep", d, "--vary", "rotor.bore=100..120:10", "--quiet");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("no variant is a valid design", r.Stderr);
    }

    [Fact]
    public void An_axis_outside_the_keys_range_is_refused()
    {
        using var w = new WorkDir();
        string d = w.Write("d.yaml", Crank);
        var r = PartforgeProcess.Run(w.Path, "sweep", d, "--vary", "machine.poles=2..300:2");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("goes outside what machine.poles allows", r.Stderr);
        Assert.Single(r.StderrLines);
    }

    [Fact]
    public void The_csv_is_written_in_plan_order_and_leaves_no_temporary_file()
    {
        using var w = new WorkDir();
        string d = w.Write("d.yaml", Crank);
        var r = PartforgeProcess.Run(w.Path, "sweep", d, "--vary", "machine.rated_rpm=100..400:10", "--csv", "s.csv", "--quiet");
        Assert.True(r.ExitCode == 0, r.ToString());
        var lines = File.ReadAllText(w.File("s.csv")).Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(32, lines.Length);
        Assert.Equal(Enumerable.Range(1, 31).Select(i => i.ToString(System.Globalization.CultureInfo.InvariantCulture)), lines.Skip(1).Select(l => l.Split(',')[0]));
        Assert.Equal(["d.yaml", "s.csv"], Directory.GetFiles(w.Path).Select(Path.GetFileName).Order(StringComparer.Ordinal));
    }
}
