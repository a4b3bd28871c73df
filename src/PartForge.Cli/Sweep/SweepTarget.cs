using System.Globalization;
using PartForge.Design.Loading;

namespace PartForge.Cli.Sweep;

/// <summary>A <c>--target KEY=VALUE</c>: rows are sorted by |metric - value| (invalid rows and rows without the metric last).</summary>
public sealed record SweepTarget(string Key, double Value)
{
    public static SweepTarget? Parse(string arg, out string? error)
    {
        error = null;
        int eq = arg.IndexOf('=');
        if (eq <= 0) { error = $"--target '{arg}': expected KEY=VALUE, e.g. electrical.phase.emf_rms_v=12"; return null; }
        string given = arg[..eq].Trim();
        string key = SweepMetrics.Resolve(given) ?? given;
        if (!SweepMetrics.All.Contains(key))
        {
            string? near = KeySuggester.Nearest(key, SweepMetrics.All) ?? KeySuggester.Nearest("electrical." + key, SweepMetrics.All);
            error = $"--target {key}: not a sweep result" + (near != null ? $"; did you mean '{near}'?" : "") +
                    $"; results: {string.Join(", ", SweepMetrics.All)}";
            return null;
        }
        if (!double.TryParse(arg[(eq + 1)..].Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out double v) || !double.IsFinite(v))
        {
            error = $"--target {key}: '{arg[(eq + 1)..]}' is not a finite number";
            return null;
        }
        return new SweepTarget(key, v);
    }

    public double Distance(SweepRow r) =>
        r.Outcome.Status != "invalid" && r.Outcome.Metrics.TryGetValue(Key, out double m) && double.IsFinite(m) ? Math.Abs(m - Value) : double.PositiveInfinity;

    /// <summary>Rows by closeness to the target, ties (and the unreachable) in plan order: a stable, deterministic sort.</summary>
    public IReadOnlyList<SweepRow> Sort(IReadOnlyList<SweepRow> rows) =>
        rows.OrderBy(Distance).ThenBy(r => r.Index).ToArray();
}
