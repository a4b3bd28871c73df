using System.Diagnostics;
using System.Globalization;
using PartForge.Checks;
using PartForge.Design.Loading;
using PartForge.Electrical;
using PartForge.Export.Pipeline;
using PartForge.Geometry;
using PartForge.Parts;

namespace PartForge.Bench;

/// <summary>
/// Cost of the checks against coil count (9..144 coils at the 9-coil / 12-pole ratio) and against the
/// rotation sweep's coarsest step (2 to 0.125 degrees on the 48-coil / 64-pole design), process CPU time, best of 2, and the
/// fitted exponents. The sweep never steps coarser than the smallest feature's angular size, so coarse
/// requested steps can give the same time. Run with <c>--runs 1</c>.
/// </summary>
public sealed class ScalingCheckCase : IBenchCase
{
    public static readonly int[] CoilCounts = [9, 18, 36, 72, 144];
    public static readonly double[] Steps = [2, 1, 0.5, 0.25, 0.125];
    private int _calls;

    public string Name => "scaling-check";
    public string Description => "check time vs coil count 9..144 and rotation-sweep step 2..0.125 degrees, exponents (use --runs 1)";
    public void Setup() { }

    public IReadOnlyDictionary<string, double> Run()
    {
        if (_calls++ == 0)
        {
            // The harness's warm-up call: JIT every stage on the smallest design only (the full sweep takes minutes).
            Measure(ScalingDesigns.Yaml(12, 9, 0.01), CheckOptions.Default);
            return new Dictionary<string, double> { ["warm_up"] = 1 };
        }
        const bool print = true;
        var inv = CultureInfo.InvariantCulture;
        var lines = new List<string>
        {
            "| sweep | value | checks CPU ms | checks run | CPU ms per coil |",
            "|---|---|---|---|---|",
        };
        Console.WriteLine(lines[0]);
        Console.WriteLine(lines[1]);
        var byCoils = new List<(double, double)>();
        var bySteps = new List<(double, double)>();
        foreach (int c in CoilCounts)
        {
            var (ms, count) = Measure(ScalingDesigns.Yaml(c * 4 / 3, c, 0.01), CheckOptions.Default);
            byCoils.Add((c, ms));
            lines.Add(string.Create(inv, $"| coils | {c} | {ms:F1} | {count} | {ms / c:F2} |"));
            Console.WriteLine(lines[^1]);
            Console.Out.Flush();
        }
        foreach (double s in Steps)
        {
            var (ms, count) = Measure(ScalingDesigns.Yaml(64, 48, 0.01), new CheckOptions { SweepStepDeg = s });
            bySteps.Add((1 / s, ms));
            lines.Add(string.Create(inv, $"| sweep step deg (48 coils) | {s} | {ms:F1} | {count} | {ms / 48:F2} |"));
            Console.WriteLine(lines[^1]);
            Console.Out.Flush();
        }
        var figures = new Dictionary<string, double>
        {
            ["exp_checks_vs_coils"] = Math.Round(ScalingFit.Exponent(byCoils), 3),
            ["exp_checks_vs_1/step"] = Math.Round(ScalingFit.Exponent(bySteps), 3),
        };
        if (print)
        {
            Console.WriteLine(string.Join(", ", figures.Select(kv => $"{kv.Key} {kv.Value.ToString("G4", inv)}")));
        }
        return figures;
    }

    private static (double Ms, int Checks) Measure(string yaml, CheckOptions options)
    {
        var d = DesignLoader.LoadText(yaml, "scaling.yaml").Machine ?? throw new InvalidOperationException("scaling design does not load: " + string.Join("; ", DesignLoader.LoadText(yaml, "scaling.yaml").Errors));
        var el = ElectricalEngine.Evaluate(d);
        var parts = PartsBuilder.Build(d, el);
        double best = double.MaxValue;
        int count = 0;
        for (int k = 0; k < 2; k++)
        {
            double c0 = System.Diagnostics.Process.GetCurrentProcess().TotalProcessorTime.TotalMilliseconds;
            var report = CheckRunner.Run(d, el, parts, options);
            best = Math.Min(best, System.Diagnostics.Process.GetCurrentProcess().TotalProcessorTime.TotalMilliseconds - c0);
            count = report.Checks.Count;
        }
        return (best, count);
    }
}
