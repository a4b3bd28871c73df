namespace PartForge.Design.Machines;

/// <summary>The timing sensor that switches the coils.</summary>
public enum SensorKind
{
    /// <summary>No sensor (a generator, or an externally driven machine).</summary>
    None,

    /// <summary>A Hall-effect switch or latch.</summary>
    Hall,

    /// <summary>A reed switch: closes for either pole above a field threshold.</summary>
    Reed,
}
