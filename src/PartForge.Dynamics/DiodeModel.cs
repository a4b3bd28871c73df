namespace PartForge.Dynamics;

/// <summary>
/// A diode as a constant forward drop plus a series resistance, conducting one way only; it turns on when its
/// forward voltage would exceed the drop and off when its current falls to zero (no reverse recovery).
/// </summary>
/// <param name="ForwardDropV">Forward drop, V (0 or more).</param>
/// <param name="ResistanceOhm">Series (slope) resistance, ohm (0 or more).</param>
public sealed record DiodeModel(double ForwardDropV, double ResistanceOhm = 0)
{
    /// <summary>A silicon rectifier diode, 0.7 V (common practice, a typical datasheet figure from memory).</summary>
    public static DiodeModel Silicon { get; } = new(0.7);

    /// <summary>A Schottky diode, 0.4 V (common practice: 0.3-0.45 V at moderate current, from memory).</summary>
    public static DiodeModel Schottky { get; } = new(0.4);

    /// <summary>An ideal diode: no drop, no resistance (for tests and limits).</summary>
    public static DiodeModel Ideal { get; } = new(0);
}
