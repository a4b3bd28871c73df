namespace PartForge.Cli.Sweep;

/// <summary>One variant of a sweep: its index in the plan, the values of the varied keys and the outcome.</summary>
public sealed record SweepRow(long Index, IReadOnlyList<double> Values, SweepOutcome Outcome);
