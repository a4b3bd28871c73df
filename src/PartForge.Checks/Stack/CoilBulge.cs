namespace PartForge.Checks.Stack;

/// <summary>
/// Estimate of how far a hand-wound coil bulges axially out of its former.
///
/// The electrical engine sizes the winding at the design's stated fill factor: build = N A_cu / (fill h).
/// A random-wound coil does not reach more than about 0.50 copper fill (docs/physics.md §2, practice:
/// hand or random-wound round enamelled wire 0.30-0.50). When the stated fill is higher, the real winding
/// needs the larger cross-section N A_cu / 0.50. The former's window is coils.height by (build +
/// former.margin): the flange overhang takes the first of the excess radially; what is left over (the
/// excess volume, per unit length of the turn: an area) spreads over the whole window width on both faces,
/// pushing the flanges outward: bulge per face = excess / (2 (build + margin)). Our own estimate, documented
/// here; it errs on the large side because it lets no wire spill over the flange rim.
/// </summary>
public static class CoilBulge
{
    /// <summary>Practical upper copper fill of a random-wound coil (docs/physics.md §2, practice).</summary>
    public const double PracticalFill = 0.50;

    /// <summary>Bulge on each face, mm (0 when the winding fits).</summary>
    public static double PerFaceMm(int turns, double bareMm, double heightMm, double buildMm, double marginMm)
    {
        if (turns <= 0 || !(bareMm > 0) || !(heightMm > 0)) return 0;
        double copper = turns * Math.PI * bareMm * bareMm / 4;
        double needed = copper / PracticalFill;
        double width = Math.Max(buildMm + marginMm, 1e-9);
        double excess = needed - heightMm * width;
        return excess > 0 ? excess / (2 * width) : 0;
    }
}
