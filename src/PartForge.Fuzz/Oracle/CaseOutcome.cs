using PartForge.Fuzz.Mutations;
using PartForge.Fuzz.Running;

namespace PartForge.Fuzz.Oracle;

/// <summary>What one fuzz case did: the runs, the broken promises and softer observations.</summary>
public sealed record CaseOutcome(FuzzInput Input, CliRun Check, CliRun? Build, IReadOnlyList<Violation> Violations, IReadOnlyList<string> Notes)
{
    public bool Passed => Violations.Count == 0;

    public TimeSpan Elapsed => Check.Elapsed + (Build?.Elapsed ?? TimeSpan.Zero);
}
