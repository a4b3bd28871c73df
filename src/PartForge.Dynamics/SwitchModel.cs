namespace PartForge.Dynamics;

/// <summary>
/// A closed switch as a constant on-drop plus an on-resistance, conducting in its forward direction only (a
/// transistor; a reed switch with a series diode). Each switch in the current path adds its drop.
/// </summary>
/// <param name="OnDropV">On-state drop, V (0 or more).</param>
/// <param name="OnResistanceOhm">On-state resistance, ohm (0 or more).</param>
public sealed record SwitchModel(double OnDropV, double OnResistanceOhm = 0)
{
    /// <summary>An ideal switch: no drop, no resistance.</summary>
    public static SwitchModel Ideal { get; } = new(0);
}
