namespace PartForge.Dynamics;

/// <summary>Numerical settings and the definitions of "steady"; every default is documented here.</summary>
public sealed record SimulationOptions
{
    /// <summary>Relative tolerance of the local error on every state (absolute tolerances are this times each
    /// state's scale, derived from the input). Default 1e-6; allowed 1e-12 to 1e-4 (looser runs can miss the
    /// 0.5 % energy balance).</summary>
    public double RelativeTolerance { get; init; } = 1e-6;

    /// <summary>Step attempts after which the run gives up (outcome StepLimit). Default 20 million.</summary>
    public long MaxSteps { get; init; } = 20_000_000;

    /// <summary>At most this many points in the time series (at least 2; the first and last always in). Default 2000.</summary>
    public int SeriesMaxPoints { get; init; } = 2000;

    /// <summary>Steady speed: the mean speed over the last N whole revolutions differs from the mean over the N
    /// before them by less than <see cref="SteadyTolerance"/>. Default N = 10.</summary>
    public int SteadyRevolutions { get; init; } = 10;

    /// <summary>Relative change that counts as steady. Default 0.001 (0.1 %).</summary>
    public double SteadyTolerance { get; init; } = 1e-3;

    /// <summary>
    /// A circuit (not a six-step star leg) whose L/R is below this fraction of the shortest flux period at the
    /// run's speed scale is solved as L = 0 (its current follows the voltage at once: the singular-perturbation
    /// limit, error of the order of L/R over the conduction time), because an explicit integrator would need
    /// steps of a few L/R. Default 1e-3; 0 never substitutes. The result lists the circuits treated so.
    /// </summary>
    public double QuasiStaticRatio { get; init; } = 1e-3;

    /// <summary>The defaults.</summary>
    public static SimulationOptions Default { get; } = new();
}
