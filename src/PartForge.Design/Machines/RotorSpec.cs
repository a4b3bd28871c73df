using PartForge.Design.Materials;

namespace PartForge.Design.Machines;

/// <summary>The rotor disc(s) as the design gives them (<c>rotor.*</c>).</summary>
/// <param name="OuterDiameterMm">Disc outer diameter.</param>
/// <param name="ThicknessMm">Disc thickness.</param>
/// <param name="BoreMm">Central bore diameter (0: none).</param>
/// <param name="PocketClearanceMm">Added to the magnet's size for its pocket.</param>
/// <param name="PocketFloorMm">Material under a blind pocket (0: through pockets).</param>
/// <param name="BoltCircle">Bolt circle, or null.</param>
/// <param name="BackIronThicknessMm">Steel back-iron disc thickness, or null for none.</param>
/// <param name="Material">The disc's material (<c>rotor.material</c>).</param>
/// <param name="PolarityDots">Engrave a dot beside every north-up pocket.</param>
/// <param name="IndexNotch">Cut a notch in the rim at pocket 0.</param>
public sealed record RotorSpec(
    double OuterDiameterMm, double ThicknessMm, double BoreMm, double PocketClearanceMm, double PocketFloorMm,
    BoltPattern? BoltCircle, double? BackIronThicknessMm, Material Material, bool PolarityDots, bool IndexNotch)
{
    public double OuterRadiusMm => OuterDiameterMm / 2;
    public double BoreRadiusMm => BoreMm / 2;
}
