namespace PartForge.Dynamics;

/// <summary>Why a run ended.</summary>
public enum SimulationOutcome
{
    /// <summary>The input was rejected; see <see cref="SimulationResult.Problems"/>. Nothing was simulated.</summary>
    InvalidInput,

    /// <summary>The time limit was reached.</summary>
    TimeLimit,

    /// <summary>Start: the speed became steady.</summary>
    SteadySpeed,

    /// <summary>Start: the rotor stuck at standstill and the drive's torque settled below the friction.</summary>
    Stalled,

    /// <summary>Run-down: the rotor stopped (stuck for good, or fell below the stop speed).</summary>
    RotorStopped,

    /// <summary>Run-down: the capacitor fell below the cutoff voltage.</summary>
    StoreExhausted,

    /// <summary>Charge: the capacitor reached the target voltage.</summary>
    VoltageReached,

    /// <summary>The step budget ran out before any other end.</summary>
    StepLimit,

    /// <summary>The caller cancelled the run.</summary>
    Cancelled,

    /// <summary>The integration failed (step size underflow or events that do not advance); see Problems.</summary>
    NumericalFailure,
}
