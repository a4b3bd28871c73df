namespace PartForge.Dynamics;

/// <summary>
/// A run sampled on a uniform time grid (the grid coarsens by halving as the run goes on, so a run of any length
/// keeps between half and all of <see cref="SimulationOptions.SeriesMaxPoints"/> points), plus the final state.
/// A trace for plotting: with long runs the grid is much coarser than one current pulse.
/// </summary>
public sealed class TimeSeries
{
    internal TimeSeries(double[] t, double[] angle, double[] rpm, double[] storeV, double[] torque, double[][] currents)
    {
        TimeS = t;
        AngleRad = angle;
        Rpm = rpm;
        StoreV = storeV;
        TorqueNm = torque;
        CurrentsA = currents;
    }

    /// <summary>Sample times, s, increasing, starting at 0 and ending at the run's end.</summary>
    public IReadOnlyList<double> TimeS { get; }

    /// <summary>Rotor angle, mechanical radians, not wrapped.</summary>
    public IReadOnlyList<double> AngleRad { get; }

    /// <summary>Rotor speed, rpm.</summary>
    public IReadOnlyList<double> Rpm { get; }

    /// <summary>The store's internal voltage (capacitor voltage; the battery's open-circuit or the supply voltage), V.</summary>
    public IReadOnlyList<double> StoreV { get; }

    /// <summary>Electromagnetic torque on the rotor, N m.</summary>
    public IReadOnlyList<double> TorqueNm { get; }

    /// <summary>Current of each circuit (motor convention), A: CurrentsA[circuit][sample].</summary>
    public IReadOnlyList<IReadOnlyList<double>> CurrentsA { get; }

    /// <summary>Number of samples.</summary>
    public int Count => TimeS.Count;
}
