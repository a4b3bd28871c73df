using System.Diagnostics;
using PartForge.Fuzz.Mutations;
using PartForge.Fuzz.Oracle;
using PartForge.Fuzz.Running;

namespace PartForge.Fuzz;

/// <summary>A seeded run of many cases through one runner; after an in-process hang it goes on with the fallback (or stops).</summary>
public sealed class FuzzSession
{
    private readonly Mutator _mutator;
    private readonly CaseOracle _oracle;
    private readonly CaseOracle? _fallback;

    /// <param name="fallback">Where the remaining cases go after an in-process case hangs (the hung thread
    /// cannot be stopped, so the process cannot run more in-process cases); null = stop there.</param>
    public FuzzSession(IReadOnlyList<SeedText> seeds, CaseOracle oracle, CaseOracle? fallback = null)
    {
        _mutator = new Mutator(seeds);
        _oracle = oracle;
        _fallback = fallback;
    }

    public FuzzInput Make(int index, int seed) => _mutator.Make(index, seed);

    public FuzzSummary Run(int seed, IEnumerable<int> indices, Action<int, CaseOutcome>? progress = null)
    {
        var summary = new FuzzSummary { Seed = seed, Runner = _oracle.Runner.Kind };
        var sw = Stopwatch.StartNew();
        var oracle = _oracle;
        foreach (int i in indices)
        {
            var outcome = oracle.Run(_mutator.Make(i, seed));
            summary.Add(outcome);
            progress?.Invoke(i, outcome);
            if (outcome.Violations.Any(v => v.Kind == "hang") && oracle.Runner is InProcessCli)
            {
                if (_fallback == null) break;
                oracle = _fallback;
                summary.Runner += $", then {_fallback.Runner.Kind} from case {i + 1} (case {i} hung in-process)";
            }
        }
        summary.Wall = sw.Elapsed;
        return summary;
    }
}
