namespace PartForge.Checks;

/// <summary>All check results of one design, in a fixed order (the order the runner produced them).</summary>
public sealed record CheckReport(IReadOnlyList<CheckResult> Checks)
{
    /// <summary>The fasteners that hold the stack together, read from the placed parts (empty when no parts were made).</summary>
    public IReadOnlyList<Hardware.FastenerJoint> Joints { get; init; } = [];

    /// <summary>The ordered assembly steps with the pull at each (empty when no parts were made).</summary>
    public IReadOnlyList<Hardware.AssemblyStep> Assembly { get; init; } = [];

    /// <summary>The last rotor's jacking screws, or null when it has none.</summary>
    public Hardware.JackingSet? Jacks { get; init; }

    public int FailCount => Checks.Count(c => c.Status == CheckStatus.Fail);
    public int WarnCount => Checks.Count(c => c.Status == CheckStatus.Warn);

    /// <summary>True when any check failed: the build gate writes nothing then.</summary>
    public bool HasFailures => Checks.Any(c => c.Status == CheckStatus.Fail);

    /// <summary>The worst status of all checks (pass for an empty report).</summary>
    public CheckStatus Status => Checks.Count == 0 ? CheckStatus.Pass : Checks.Max(c => c.Status);

    /// <summary>Summary status as the results document spells it.</summary>
    public string StatusText => Status switch { CheckStatus.Pass => "pass", CheckStatus.Warn => "warn", _ => "fail" };

    /// <summary>Results with the given id (several parts may carry the same check).</summary>
    public IEnumerable<CheckResult> WithId(string id) => Checks.Where(c => c.Id == id);
}
