namespace PartForge.Cli.Sweep;

/// <summary>
/// What evaluating one variant gave: its status (pass, warn, fail, or invalid when the design did not load),
/// the reason when it is not a pass, and the named numeric results (see <see cref="SweepMetrics"/>), kept compact
/// (<see cref="MetricValues"/>).
/// </summary>
public sealed record SweepOutcome(string Status, string Reason, IReadOnlyDictionary<string, double> Metrics)
{
    public IReadOnlyDictionary<string, double> Metrics { get; init; } = MetricValues.Of(Metrics);

    public static SweepOutcome Invalid(string reason) => new("invalid", reason, MetricValues.None);
}
