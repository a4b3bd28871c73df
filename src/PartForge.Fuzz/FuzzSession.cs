using System.Diagnostics;
using PartForge.Fuzz.Mutations;
using PartForge.Fuzz.Oracle;
using PartForge.Fuzz.Running;

namespace PartForge.Fuzz;

/// <summary>A seeded run of many cases through one runner; stops early only when a case hangs in-process.</summary>
public sealed class FuzzSession
{
    private readonly Mutator _mutator;
    private readonly CaseOracle _oracle;

    public FuzzSession(IReadOnlyList<SeedText> seeds, CaseOracle oracle)
    {
        _mutator = new Mutator(seeds);
        _oracle = oracle;
    }

    public FuzzInput Make(int index, int seed) => _mutator.Make(index, seed);

    public FuzzSummary Run(int seed, IEnumerable<int> indices, Action<int, CaseOutcome>? progress = null)
    {
        var summary = new FuzzSummary { Seed = seed, Runner = _oracle.Runner.Kind };
        var sw = Stopwatch.StartNew();
        foreach (int i in indices)
        {
            var outcome = _oracle.Run(_mutator.Make(i, seed));
            summary.Add(outcome);
            progress?.Invoke(i, outcome);
            if (outcome.Violations.Any(v => v.Kind == "hang") && _oracle.Runner is InProcessCli) break;
        }
        summary.Wall = sw.Elapsed;
        return summary;
    }
}
