namespace PartForge.Design.Machines;

/// <summary>The coils (<c>coils.*</c>), with the pitch radius resolved (default: the magnets' pitch radius).</summary>
/// <param name="Shape">Round or keystone.</param>
/// <param name="Wire">The bare wire.</param>
/// <param name="EnamelGrade">IEC 60317 enamel grade, 1 to 3.</param>
/// <param name="Turns">Turns per coil, or null when solved for <paramref name="Target"/>.</param>
/// <param name="Target">The EMF the turns are solved for, or null when the turns are given.</param>
/// <param name="FillFactor">Copper area over winding window area.</param>
/// <param name="HeightMm">Axial height of the winding.</param>
/// <param name="PitchRadiusMm">Radius of the coil centres.</param>
/// <param name="CoreDiameterMm">Round coils: the diameter of the hole in the coil.</param>
/// <param name="CoreWidthMm">Keystone coils: the inner window's width at the pitch radius.</param>
/// <param name="MaxTemperatureC">Highest steady winding temperature the user accepts (the coil-temperature check's limit, bounded by the
/// former's and stator's softening points).</param>
public sealed record CoilSet(
    CoilShape Shape, WireSize Wire, int EnamelGrade, int? Turns, EmfTarget? Target, double FillFactor, double HeightMm,
    double PitchRadiusMm, double? CoreDiameterMm, double? CoreWidthMm, double MaxTemperatureC)
{
    /// <summary>The core size of this shape: round, its diameter; keystone, its window width; null when not given.</summary>
    public double? CoreMm => Shape == CoilShape.Round ? CoreDiameterMm : CoreWidthMm;
}
