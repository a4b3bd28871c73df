using PartForge.Design.Loading;

namespace PartForge.Cli.Sweep;

/// <summary>
/// The cartesian product of the axes. Variant i decodes with the last axis varying fastest, so the order
/// of variants (and of the output rows) is fixed by the command line alone.
/// </summary>
public sealed record SweepPlan(IReadOnlyList<SweepAxis> Axes)
{
    /// <summary>Most variants one sweep may have (documented in the command's help).</summary>
    public const int MaxVariants = 100_000;

    public long Count => Axes.Aggregate(1L, (n, a) => n * a.Count);

    /// <summary>Axis value indices of variant i.</summary>
    public int[] Indices(long i)
    {
        var idx = new int[Axes.Count];
        for (int k = Axes.Count - 1; k >= 0; k--)
        {
            int n = Axes[k].Count;
            idx[k] = (int)(i % n);
            i /= n;
        }
        return idx;
    }

    public IReadOnlyList<DesignOverride> Overrides(long i)
    {
        var idx = Indices(i);
        return Axes.Select((a, k) => new DesignOverride(a.Key, a.Text(idx[k]))).ToArray();
    }

    /// <summary>Builds a plan from the --vary arguments; null and the reasons on failure.</summary>
    public static SweepPlan? Parse(IReadOnlyList<string> varies, List<string> errors)
    {
        if (varies.Count == 0) { errors.Add("give at least one --vary KEY=FROM..TO:STEP"); return null; }
        var axes = new List<SweepAxis>();
        foreach (var v in varies)
        {
            var a = SweepAxis.Parse(v, out var err);
            if (a == null) { errors.Add(err!); continue; }
            if (axes.Any(x => x.Key == a.Key)) { errors.Add($"--vary {a.Key}: the key is varied twice"); continue; }
            axes.Add(a);
        }
        if (errors.Count > 0) return null;
        var plan = new SweepPlan(axes);
        if (plan.Count > MaxVariants)
        {
            errors.Add($"the sweep has {plan.Count} variants ({string.Join(" x ", axes.Select(a => a.Count))}), more than the limit of {MaxVariants}; use larger steps");
            return null;
        }
        return plan;
    }
}
