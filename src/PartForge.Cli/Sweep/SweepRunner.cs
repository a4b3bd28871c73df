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
    /// <summary>Variants evaluated together before their rows are handed on in plan order.</summary>
    public const int BlockSize = 1024;

    /// <param name="done">Incremented once per finished variant (read it from another thread for progress).</param>
    /// <param name="inOrder">Called with every row in plan order as soon as it and all rows before it are done
    /// (the CSV is written this way, while the sweep runs), on the calling thread.</param>
    /// <param name="cancel">Stops the sweep between blocks (an interrupt).</param>
    /// <returns>Every row, in plan order.</returns>
    public static SweepRow[] Run(DesignSource source, SweepPlan plan, ISweepEvaluator evaluator, StrongBox<long>? done = null,
        int maxThreads = 0, Action<SweepRow>? inOrder = null, CancellationToken cancel = default)
    {
        var rows = new SweepRow[plan.Count];
        Stream(source, plan, evaluator, r =>
        {
            rows[r.Index] = r;
            inOrder?.Invoke(r);
        }, done, maxThreads, cancel);
        return rows;
    }

    /// <summary>
    /// Runs every variant and hands each row on in plan order, keeping only one block of rows: memory stays flat
    /// in the number of variants (what the caller keeps is its own).
    /// </summary>
    public static void Stream(DesignSource source, SweepPlan plan, ISweepEvaluator evaluator, Action<SweepRow> inOrder,
        StrongBox<long>? done = null, int maxThreads = 0, CancellationToken cancel = default)
    {
        long n = plan.Count;
        var block = new SweepRow[Math.Min(n, BlockSize)];
        var opts = new ParallelOptions { MaxDegreeOfParallelism = maxThreads > 0 ? maxThreads : Environment.ProcessorCount };
        // Within a block each variant writes only its own slot, so the rows are in plan order whatever the
        // thread timing; blocks hand their rows on before the next block starts.
        for (long start = 0; start < n; start += BlockSize)
        {
            cancel.ThrowIfCancellationRequested();
            long end = Math.Min(n, start + BlockSize);
            Parallel.For(start, end, opts, i =>
            {
                block[i - start] = RunOne(source, plan, evaluator, i);
                if (done != null) Interlocked.Increment(ref done.Value);
            });
            for (long i = start; i < end; i++)
            {
                inOrder(block[i - start]);
                block[i - start] = null!;
            }
        }
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
