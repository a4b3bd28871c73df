namespace PartForge.Dynamics;

/// <summary>The outcome of one run: summary figures, the energy account, the sampled trace and the solver's counts.</summary>
public sealed record SimulationResult
{
    /// <summary>Why the run ended.</summary>
    public SimulationOutcome Outcome { get; init; }

    /// <summary>Input problems (InvalidInput) or the reason of a numerical failure; empty otherwise.</summary>
    public IReadOnlyList<string> Problems { get; init; } = [];

    /// <summary>Simulated time at the end, s.</summary>
    public double EndTimeS { get; init; }

    /// <summary>Speed at the end, rpm.</summary>
    public double FinalRpm { get; init; }

    /// <summary>The store's internal voltage at the end, V.</summary>
    public double FinalStoreV { get; init; }

    /// <summary>Mean speed over the last N whole revolutions once steady (see SimulationOptions), rpm; null if never steady.</summary>
    public double? SteadyRpm { get; init; }

    /// <summary>Time at which the revolution-mean speed first reached 90 % of the steady speed, s (null if not steady).</summary>
    public double? SpinUp90S { get; init; }

    /// <summary>Time at which the revolution-mean speed first reached 99 % of the steady speed, s (null if not steady).</summary>
    public double? SpinUp99S { get; init; }

    /// <summary>Mean speed over the last N whole revolutions of the run, rpm (null with fewer than N).</summary>
    public double? CycleMeanRpm { get; init; }

    /// <summary>Mean electromagnetic torque over the last N whole revolutions of the run, N m (null with fewer than N).</summary>
    public double? CycleMeanTorqueNm { get; init; }

    /// <summary>Run-down: time at which the rotor stopped, s (run time on one charge; null if it did not stop).</summary>
    public double? RunTimeS { get; init; }

    /// <summary>Charge: time at which the capacitor reached the target voltage, s (null if not reached).</summary>
    public double? TimeToVoltageS { get; init; }

    /// <summary>Net charge drawn from the store, C (negative: charge put in).</summary>
    public double StoreChargeDrawnC { get; init; }

    /// <summary>Largest turn-off voltage estimate across an opening switch without freewheel, V (null if none).</summary>
    public double? PeakTurnOffKickV { get; init; }

    /// <summary>The energy account and its balance error.</summary>
    public EnergyAccount Energy { get; init; } = new();

    /// <summary>The sampled trace (empty for invalid input).</summary>
    public TimeSeries Series { get; init; } = new([], [], [], [], [], []);

    /// <summary>Circuits with L > 0 that were solved as L = 0 (see <see cref="SimulationOptions.QuasiStaticRatio"/>).</summary>
    public IReadOnlyList<int> QuasiStaticCircuits { get; init; } = [];

    /// <summary>Accepted integration steps.</summary>
    public long AcceptedSteps { get; init; }

    /// <summary>Rejected integration steps.</summary>
    public long RejectedSteps { get; init; }

    /// <summary>Located events (switching edges, diode turn-on/off, rotor stop/breakaway, revolution marks).</summary>
    public long Events { get; init; }
}
