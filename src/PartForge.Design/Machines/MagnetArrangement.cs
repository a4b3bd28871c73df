namespace PartForge.Design.Machines;

/// <summary>How the magnets' poles face the coils (<c>magnets.arrangement</c>).</summary>
public enum MagnetArrangement
{
    /// <summary>Neighbouring magnets show opposite poles: the field period is two magnet pitches (p = poles / 2 pole pairs).</summary>
    Alternating,

    /// <summary>Every magnet shows the same pole: the field period is one magnet pitch and the flux in a coil has a
    /// steady part (a non-zero mean) and pulses once per magnet; any magnet count.</summary>
    Same,
}
