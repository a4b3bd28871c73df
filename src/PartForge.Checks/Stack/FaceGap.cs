using PartForge.Design.Parts;

namespace PartForge.Checks.Stack;

/// <summary>
/// The running gap between one rotating face and the stationary face opposite it: nominal from the axial
/// stack, and worst case after every loss.
/// </summary>
/// <param name="RotorPart">The rotor part on this side (rotor, rotor-front, rotor-back).</param>
/// <param name="StatorPart">The stationary part opposite it (stator, stator-front, stator-back).</param>
/// <param name="Side">+1 when the rotor is on the +z side of the stationary pack, -1 when on the -z side.</param>
/// <param name="NominalMm">Nominal gap from the stack: the stationary face to the nearest rotating surface.</param>
/// <param name="Losses">Worst-case losses, each at its full value (they add up: a linear worst case).</param>
/// <param name="NearestRotatingSurface">"magnet face" when the magnets stand proud, else "rotor face".</param>
public sealed record FaceGap(PartId RotorPart, PartId StatorPart, int Side, double NominalMm, IReadOnlyList<GapLoss> Losses, string NearestRotatingSurface)
{
    public double TotalLossMm => Losses.Sum(l => l.Mm);
    public double WorstMm => NominalMm - TotalLossMm;
    public double LossOf(string namePrefix) => Losses.Where(l => l.Name.StartsWith(namePrefix, StringComparison.Ordinal)).Sum(l => l.Mm);
}
