using PartForge.Geometry.Primitives;

namespace PartForge.Geometry.Fabrication;

/// <summary>
/// Corner relief for printed parts: a small circle centred on each corner of a cut-out that the extruded
/// wall would round over. Model (common practice, no published standard): a printed inside corner comes
/// out filled with a round of about half the extrusion line width, rho = <see cref="LineWidthMm"/> / 2 +
/// <see cref="ClearanceMm"/>; to keep the nominal corner clear the relieved outline must let a disc of
/// radius rho touch the corner point. A circle about the corner does that when its radius is at least
/// 2 rho cos(alpha / 2) (alpha the corner's angle inside the cut: the far point of that disc on each edge);
/// it is never made smaller than rho, so that the relief is at least a line width across and a slicer
/// prints it: R = rho max(1, 2 cos(alpha / 2)), 1.41 rho at a right angle.
/// </summary>
/// <param name="LineWidthMm">The extrusion line width (about the nozzle diameter; e.g. 0.4-0.45 mm for a 0.4 mm nozzle, common practice).</param>
public sealed record CornerCircleRelief(double LineWidthMm) : CornerReliefRule
{
    /// <summary>Added to the half line width, mm. Default 0.</summary>
    public double ClearanceMm { get; init; }

    internal override double ReachRadiusMm => LineWidthMm / 2 + ClearanceMm;

    internal override (Vec2 Center, double Radius, Vec2 Via) Notch(Vec2 v, Vec2 b, double alphaRad)
    {
        double rho = ReachRadiusMm;
        double r = rho * Math.Max(1, 2 * Math.Cos(alphaRad / 2));
        return (v, r, v - b * r);
    }

    internal override void Validate()
    {
        if (!(LineWidthMm > 0) || !double.IsFinite(LineWidthMm)) throw new ArgumentOutOfRangeException(nameof(LineWidthMm), "the line width must be a finite value > 0 mm");
        if (!(ClearanceMm >= 0) || !double.IsFinite(ClearanceMm)) throw new ArgumentOutOfRangeException(nameof(ClearanceMm), "the clearance must be a finite value >= 0 mm");
    }
}
