using System.Text.Json;
using PartForge.Cli.Tests.EndToEnd;

namespace PartForge.Cli.Tests.Sweep;

public class SweepCommandTests
{
    private static string Preset(WorkDir w) => w.Write("d.yaml", SweepRunnerTests.Preset("crank-bench"));

    [Theory]
    [InlineData("coils.turn=100..120:10", "did you mean 'turns'")]
    [InlineData("coils.turns=130..120:10", "larger than TO")]
    [InlineData("coils.turns=100..120:0", "STEP must be positive")]
    [InlineData("gap.air_gap=0.1..2000:0.001", "limit")]
    public void Bad_keys_and_ranges_exit_2_with_one_clear_line(string vary, string expected)
    {
        using var w = new WorkDir();
        var r = PartforgeProcess.Run(w.Path, "sweep", Preset(w), "--vary", vary);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains(expected, r.Stderr);
        Assert.Single(r.StderrLines);
        Assert.Empty(r.Stdout);
    }

    [Fact]
    public void An_unknown_target_exits_2()
    {
        using var w = new WorkDir();
        var r = PartforgeProcess.Run(w.Path, "sweep", Preset(w), "--vary", "coils.turns=100..120:10", "--target", "phase_emf=3");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("not a sweep result", r.Stderr);
    }

    [Fact]
    public void Sweeps_print_a_table_write_a_csv_and_sort_by_target()
    {
        using var w = new WorkDir();
        string d = Preset(w);
        var r = PartforgeProcess.Run(w.Path, TimeSpan.FromSeconds(300), "sweep", d, "--vary", "coils.turns=100..140:20", "--vary", "gap.air_gap=0.5..1:0.5",
            "--csv", "s.csv", "--target", "phase.emf_rms_v=3");
        Assert.True(r.ExitCode == 0, r.ToString());
        var lines = r.Stdout.TrimEnd('\n').Split('\n');
        Assert.Equal(7, lines.Length); // header + 6 variants
        Assert.Contains("phase V rms", lines[0]);
        Assert.Contains("sweep: 6/6 variants", r.Stderr); // plain progress lines when stderr is not a terminal
        var csv = File.ReadAllText(w.File("s.csv")).Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(7, csv.Length);
        // The CSV is written as the variants finish, in plan order; the table is sorted by closeness of the phase
        // EMF to 3 V: distances (read from the CSV by variant number) never decrease down the table.
        Assert.Equal(["1", "2", "3", "4", "5", "6"], csv.Skip(1).Select(l => l.Split(',')[0]));
        int col = Array.IndexOf(csv[0].Split(','), "electrical.phase.emf_rms_v");
        var byVariant = csv.Skip(1).ToDictionary(l => int.Parse(l.Split(',')[0]),
            l => Math.Abs(double.Parse(l.Split(',')[col], System.Globalization.CultureInfo.InvariantCulture) - 3));
        var d3 = lines.Skip(1).Select(l => byVariant[int.Parse(l.TrimStart().Split(' ')[0])]).ToList();
        for (int i = 1; i < d3.Count; i++) Assert.True(d3[i] >= d3[i - 1]);
        // More turns give more EMF (Faraday: e = N dPhi/dt; the larger winding links a little less flux per turn, so not exactly in proportion).
        var json = PartforgeProcess.Run(w.Path, TimeSpan.FromSeconds(300), "sweep", d, "--vary", "coils.turns=100..140:20", "--json", "--quiet");
        Assert.Equal(0, json.ExitCode);
        using var doc = JsonDocument.Parse(json.Stdout);
        var emf = doc.RootElement.GetProperty("variants").EnumerateArray().Select(v => v.GetProperty("results").GetProperty("electrical.phase.emf_rms_v").GetDouble()).ToList();
        Assert.Equal(3, emf.Count);
        Assert.True(emf[0] < emf[1] && emf[1] < emf[2]);
    }
}
