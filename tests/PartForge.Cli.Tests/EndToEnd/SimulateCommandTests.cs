using System.Globalization;
using System.Text.Json;
using PartForge.Design.Presets;

namespace PartForge.Cli.Tests.EndToEnd;

/// <summary><c>partforge simulate</c> through the real executable: the pinned JSON, the CSV file, exit codes.</summary>
public class SimulateCommandTests
{
    private static string Preset(WorkDir w, string name) => w.Write(name + ".yaml", PresetLibrary.Find(name)!.Text);

    [Fact]
    public void Simulate_prints_the_pinned_document_and_writes_the_series()
    {
        using var w = new WorkDir();
        string design = Preset(w, "pulse-sculpture");
        var r = PartforgeProcess.Run(w.Path, "simulate", design, "--seconds", "1", "--json", "--csv", w.File("series.csv"));
        Assert.True(r.ExitCode == 0, r.ToString());
        using var doc = JsonDocument.Parse(r.Stdout);
        var root = doc.RootElement;
        Assert.Equal("start", root.GetProperty("scenario").GetString());
        int n = root.GetProperty("t_s").GetArrayLength();
        Assert.Equal(n, root.GetProperty("rpm").GetArrayLength());
        Assert.Equal(n, root.GetProperty("storage_v").GetArrayLength());
        Assert.True(root.TryGetProperty("steady_rpm", out _) && root.TryGetProperty("run_time_s", out _));
        // Source: conservation of energy (the account's residual over its largest term).
        Assert.InRange(root.GetProperty("energy").GetProperty("balance_error").GetDouble(), 0, 0.005);
        var csv = File.ReadAllLines(w.File("series.csv"));
        Assert.Equal("t_s,rpm,storage_v,torque_nm,i0_a", csv[0]);
        Assert.Equal(n + 1, csv.Length);
        Assert.Equal(root.GetProperty("rpm")[n - 1].GetDouble(), double.Parse(csv[^1].Split(',')[1], CultureInfo.InvariantCulture), 1e-9);
    }

    [Fact]
    public void A_generator_asked_to_start_and_a_bad_option_exit_2_with_the_reason()
    {
        using var w = new WorkDir();
        string design = Preset(w, "crank-bench");
        var r = PartforgeProcess.Run(w.Path, "simulate", design);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("--scenario charge", r.Stderr);
        var bad = PartforgeProcess.Run(w.Path, "simulate", design, "--seconds", "-1");
        Assert.Equal(2, bad.ExitCode);
        var scenario = PartforgeProcess.Run(w.Path, "simulate", design, "--scenario", "spin");
        Assert.Equal(2, scenario.ExitCode);
    }
}
