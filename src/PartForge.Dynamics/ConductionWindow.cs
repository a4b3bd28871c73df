namespace PartForge.Dynamics;

/// <summary>
/// An angle interval [OnDeg, OffDeg) of the mechanical rotor angle, in degrees within one revolution, during
/// which a driven circuit's switches are closed. OffDeg below OnDeg wraps through 360. Sign +1 closes the
/// unipolar switch, the H-bridge for +V, or a six-step leg's high side; -1 the H-bridge for -V or the leg's low
/// side (unipolar windows are always +1).
/// </summary>
/// <param name="OnDeg">Angle at which the switch closes, degrees, in [0, 360).</param>
/// <param name="OffDeg">Angle at which it opens, degrees, in [0, 360), not equal to OnDeg.</param>
/// <param name="Sign">+1 or -1.</param>
public readonly record struct ConductionWindow(double OnDeg, double OffDeg, int Sign = 1)
{
    /// <summary>Width of the window in degrees (through 360 when it wraps).</summary>
    public double WidthDeg => OffDeg >= OnDeg ? OffDeg - OnDeg : OffDeg + 360 - OnDeg;
}
