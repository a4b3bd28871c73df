using System.Runtime.CompilerServices;
using PartForge.Design.Loading;

namespace PartForge.Cli.Sweep;

/// <summary>
/// Runs every variant of a plan in parallel on all cores. Each variant writes only its own slot of the
/// result array, so the rows come back in plan order whatever the thread timing; the evaluation of one
/// variant is itself single-threaded and deterministic.
/// </summary>
public static class SweepRunner
{
    /// <param name="done">Incremented once per finished variant (read it from another thread for progress).</param>
    public static SweepRow[] Run(DesignSource source, SweepPlan plan, ISweepEvaluator evaluator, StrongBox<long>? done = null,
        int maxThreads = 0)
    {
        long n = plan.Count;
        var rows = new SweepRow[n];
        var opts = new ParallelOptions { MaxDegreeOfParallelism = maxThreads > 0 ? maxThreads : Environment.ProcessorCount };
        Parallel.For(0L, n, opts, i =>
        {
            rows[i] = RunOne(source, plan, evaluator, i);
            if (done != null) Interlocked.Increment(ref done.Value);
        });
        return rows;
    }

    public static SweepRow RunOne(DesignSource source, SweepPlan plan, ISweepEvaluator evaluator, long i)
    {
        var idx = plan.Indices(i);
        var values = plan.Axes.Select((a, k) => a.Value(idx[k])).ToArray();
        var loaded = source.Load(plan.Overrides(i));
        if (!loaded.Success)
        {
            var e = loaded.Errors.FirstOrDefault();
            string reason = e == null ? "the design did not load" : Describe(e);
            if (loaded.Errors.Count > 1) reason += $" (+{loaded.Errors.Count - 1} more)";
            return new SweepRow(i, values, SweepOutcome.Invalid(reason));
        }
        return new SweepRow(i, values, evaluator.Evaluate(loaded.Machine!));
    }

    private static string Describe(DesignError e)
    {
        string s = e.KeyPath.Length > 0 ? e.KeyPath + ": " : "";
        s += (e.Value != null ? e.Value + " " : "") + e.Message;
        if (e.Allowed != null) s += "; allowed: " + e.Allowed;
        return s;
    }
}
