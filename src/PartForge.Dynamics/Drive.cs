namespace PartForge.Dynamics;

/// <summary>
/// The motor drive shared by every circuit with a <see cref="DriveConnection"/>.
/// </summary>
/// <param name="Switching">Unipolar, bipolar (H-bridge) or six-step.</param>
/// <param name="Switch">Drop and resistance of each closed switch.</param>
/// <param name="Freewheel">Diodes or none.</param>
public sealed record Drive(Switching Switching, SwitchModel Switch, Freewheel Freewheel)
{
    /// <summary>
    /// Stray capacitance across an opening switch, F, used only for the turn-off voltage estimate without a
    /// freewheel (V_peak = V_bus + i sqrt(L / C)). Default 100 pF: an order of magnitude for a small coil and its
    /// wiring (common practice, from memory).
    /// </summary>
    public double StrayCapacitanceF { get; init; } = 100e-12;
}
