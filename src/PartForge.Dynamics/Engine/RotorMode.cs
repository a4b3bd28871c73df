namespace PartForge.Dynamics.Engine;

/// <summary>The rotor's piece of the hybrid state.</summary>
internal enum RotorMode
{
    /// <summary>No Coulomb friction: the speed may pass through zero freely.</summary>
    Free,

    /// <summary>Moving (or just broken away) with friction against Mode.Dir.</summary>
    Moving,

    /// <summary>Held by static friction at standstill.</summary>
    Stuck,

    /// <summary>Speed imposed by a prime mover.</summary>
    Fixed,
}
