namespace PartForge.Electrical.Winding;

/// <summary>One row of the winding table: which phase coil <see cref="Coil"/> belongs to and which way round it is connected.</summary>
/// <param name="Coil">Coil index k (0-based), centred at mechanical angle k x 360/coils.</param>
/// <param name="AngleDeg">The coil centre's mechanical angle, degrees.</param>
/// <param name="Phase">Phase letter: A, B or C (1-phase machines: A).</param>
/// <param name="Direction">+1: connected as wound (start to the phase start side); -1: reversed.</param>
/// <param name="PhasorDeg">The coil's EMF phasor in the star of slots, k p 360/coils mod 360, electrical degrees (before the reversal).</param>
public sealed record CoilConnection(int Coil, double AngleDeg, char Phase, int Direction, double PhasorDeg);
