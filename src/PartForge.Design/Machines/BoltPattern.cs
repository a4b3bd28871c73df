namespace PartForge.Design.Machines;

/// <summary>Holes on a circle: hole j centred at j x 360 / count on the circle (a rotor's bolt circle, a stator's mount holes).</summary>
/// <param name="CircleDiameterMm">Diameter of the circle through the hole centres.</param>
/// <param name="Count">Number of holes.</param>
/// <param name="HoleMm">Hole diameter.</param>
public sealed record BoltPattern(double CircleDiameterMm, int Count, double HoleMm)
{
    public double CircleRadiusMm => CircleDiameterMm / 2;
}
