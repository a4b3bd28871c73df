using PartForge.Cli.Sweep;
using PartForge.Design.Loading;

namespace PartForge.Bench;

/// <summary>
/// `partforge sweep` without the console: 1,000 variants of the largest bundled preset (wind-duo, 16 poles,
/// 12 coils, dual rotor) as coils.turns x gap.air_gap x magnets.thickness (10 x 10 x 10), each loaded through
/// the loader's overrides, evaluated (electrical engine, parts, every check) in parallel on all cores.
/// Target: under 30 s on a 2-core machine. Run it with `--runs 1` (every run is a full sweep).
/// </summary>
public sealed class SweepBench : IBenchCase
{
    private DesignSource? _source;
    private SweepPlan? _plan;

    public string Name => "sweep-1000";

    public string Description => "1,000-variant sweep of wind-duo: turns x air gap x magnet thickness, all cores (target < 30 s; use --runs 1)";

    public static string PresetPath(string name)
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir != null && !File.Exists(Path.Combine(dir.FullName, "PartForge.sln"))) dir = dir.Parent;
        if (dir == null) throw new InvalidOperationException("run the bench from inside the repository (presets/ not found)");
        return Path.Combine(dir.FullName, "presets", name + ".yaml");
    }

    public void Setup()
    {
        _source = DesignLoader.ParseFile(PresetPath("wind-duo"));
        var errors = new List<string>();
        _plan = SweepPlan.Parse(["coils.turns=50..68:2", "gap.air_gap=1..1.9:0.1", "magnets.thickness=4..6.25:0.25"], errors)
            ?? throw new InvalidOperationException(string.Join("; ", errors));
    }

    public IReadOnlyDictionary<string, double> Run()
    {
        var cpu0 = System.Diagnostics.Process.GetCurrentProcess().TotalProcessorTime;
        var rows = SweepRunner.Run(_source!, _plan!, new PipelineEvaluator());
        var cpu = System.Diagnostics.Process.GetCurrentProcess().TotalProcessorTime - cpu0;
        return new Dictionary<string, double>
        {
            ["variants"] = rows.Length,
            ["pass"] = rows.Count(r => r.Outcome.Status == "pass"),
            ["warn"] = rows.Count(r => r.Outcome.Status == "warn"),
            ["fail"] = rows.Count(r => r.Outcome.Status == "fail"),
            ["invalid"] = rows.Count(r => r.Outcome.Status == "invalid"),
            ["cores"] = Environment.ProcessorCount,
            // CPU seconds of all threads: on a loaded machine, wall time over cores is no better than this over cores.
            ["cpu_s"] = Math.Round(cpu.TotalSeconds, 2),
        };
    }
}
