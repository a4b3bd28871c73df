namespace PartForge.Export.Simulation;

/// <summary>The scenarios of <c>partforge simulate</c> (<c>--scenario</c>).</summary>
public enum SimulationKind
{
    /// <summary>From rest (or a push of <c>--rpm</c>) under the drive to steady speed.</summary>
    Start,

    /// <summary>On the charged store (storage.start_voltage) until the rotor stops.</summary>
    RunDown,

    /// <summary>Driven at a held speed (<c>--rpm</c>, default rated), charging the store through the rectifier.</summary>
    Charge,
}
