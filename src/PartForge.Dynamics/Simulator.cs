using PartForge.Dynamics.Engine;

namespace PartForge.Dynamics;

/// <summary>
/// The time-simulation engine. Deterministic (the same input gives the same result, bit for bit), no global
/// state, safe to call from several threads at once on different inputs. Bad input is reported in the result
/// (outcome InvalidInput), never thrown.
/// </summary>
public static class Simulator
{
    /// <summary>
    /// Runs one scenario on one machine.
    /// </summary>
    /// <param name="setup">The machine.</param>
    /// <param name="scenario">What to simulate and when to stop.</param>
    /// <param name="options">Numerical settings (null: <see cref="SimulationOptions.Default"/>).</param>
    /// <param name="progress">Receives the fraction of the scenario done, 0 to 1, non-decreasing, in steps of
    /// at least 0.01, ending with 1 (time over the time limit; for a charge to a voltage the larger of that and
    /// the voltage's progress).</param>
    /// <param name="cancellationToken">Stops the run early (outcome Cancelled, with the result so far).</param>
    public static SimulationResult Run(MachineSetup setup, Scenario scenario, SimulationOptions? options = null,
        IProgress<double>? progress = null, CancellationToken cancellationToken = default)
    {
        var o = options ?? SimulationOptions.Default;
        var problems = InputCheck.Problems(setup, scenario, o);
        if (problems.Count > 0) return new SimulationResult { Outcome = SimulationOutcome.InvalidInput, Problems = problems };
        return Engine.Run.Execute(setup, scenario, o, progress, cancellationToken);
    }
}
