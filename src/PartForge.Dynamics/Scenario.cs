namespace PartForge.Dynamics;

/// <summary>What to simulate and when to stop: a closed set of variants. Every run also stops at its time limit.</summary>
public abstract record Scenario
{
    private protected Scenario() { }

    /// <summary>Simulated time after which the run stops, s (more than 0).</summary>
    public abstract double TimeLimitS { get; }
}

/// <summary>
/// Start: from rest (or an initial push) under the drive, until the speed is steady (see
/// <see cref="SimulationOptions.SteadyRevolutions"/>), the rotor stalls, or the time limit.
/// </summary>
/// <param name="TimeLimitS">Time limit, s.</param>
public sealed record StartScenario(double TimeLimitS) : Scenario
{
    public override double TimeLimitS { get; } = TimeLimitS;

    /// <summary>Speed at the start, rpm (0: from rest).</summary>
    public double InitialRpm { get; init; }

    /// <summary>Stop as soon as the speed is steady (false: run to the time limit and judge steadiness at the end).</summary>
    public bool StopWhenSteady { get; init; } = true;
}

/// <summary>
/// Run-down: the motor on its store (typically a charged capacitor) until the rotor stops (sticks for good, or
/// falls below <see cref="StopRpm"/>), the store falls below <see cref="CutoffV"/>, or the time limit.
/// </summary>
/// <param name="TimeLimitS">Time limit, s.</param>
public sealed record RunDownScenario(double TimeLimitS) : Scenario
{
    public override double TimeLimitS { get; } = TimeLimitS;

    /// <summary>Speed at the start, rpm.</summary>
    public double InitialRpm { get; init; }

    /// <summary>The run ends when the speed falls below this, rpm (0: only when the rotor sticks).</summary>
    public double StopRpm { get; init; }

    /// <summary>The run ends when the capacitor's voltage falls below this, V (null: no cutoff).</summary>
    public double? CutoffV { get; init; }
}

/// <summary>
/// Charge (driven speed): the rotor is held at a fixed speed by a prime mover, which supplies the mechanical
/// work; the circuits charge the store through their rectifiers (driven circuits keep switching, so the same
/// scenario measures the drive's torque at a held speed). Runs until the capacitor reaches
/// <see cref="TargetV"/> or the time limit.
/// </summary>
/// <param name="DrivenRpm">The held speed, rpm (0 holds the rotor still).</param>
/// <param name="TimeLimitS">Time limit, s.</param>
public sealed record ChargeScenario(double DrivenRpm, double TimeLimitS) : Scenario
{
    public override double TimeLimitS { get; } = TimeLimitS;

    /// <summary>Stop when the capacitor's voltage reaches this, V (null: run to the time limit).</summary>
    public double? TargetV { get; init; }
}
