namespace PartForge.Design.Machines;

/// <summary>How the coils of a phase, or the phases, are connected.</summary>
public enum Connection
{
    /// <summary>3 phases joined at a neutral point; line voltage = difference of two phases.</summary>
    Star,

    /// <summary>3 phases in a closed loop; line voltage = one phase.</summary>
    Delta,

    /// <summary>1 phase: every coil in series.</summary>
    Series,

    /// <summary>1 phase: every coil in parallel.</summary>
    Parallel,
}
