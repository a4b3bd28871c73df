using PartForge.Geometry.Primitives;

namespace PartForge.Geometry.Fabrication;

/// <summary>
/// Dog-bone relief for cut parts: at each corner the tool cannot reach, a circular notch of radius
/// R = <see cref="ToolRadiusMm"/> + <see cref="ClearanceMm"/> whose centre lies on the corner's bisector,
/// R from the corner, inside the cut, so that the circle passes through the corner point. A tool of radius
/// r centred on the bisector r from the corner then fits inside the notch and touches the corner: the
/// nominal outline is cut in full. At a right angle the notch is a half circle whose ends lie sqrt(2) R
/// along each edge from the corner.
/// </summary>
/// <param name="ToolRadiusMm">The cutter's radius, or for a laser or waterjet the kerf half-width.</param>
public sealed record DogBoneRelief(double ToolRadiusMm) : CornerReliefRule
{
    /// <summary>
    /// Added to the tool radius for the notch, mm. Default 0.02 mm: a notch of exactly the tool radius
    /// leaves the tool no play and shrinks to a point under kerf compensation (an inward offset by the tool
    /// radius), which an exact offset must refuse; 0.02 mm keeps it an arc (common practice to leave a
    /// little play; the value is ours).
    /// </summary>
    public double ClearanceMm { get; init; } = 0.02;

    internal override double ReachRadiusMm => ToolRadiusMm;

    internal override (Vec2 Center, double Radius, Vec2 Via) Notch(Vec2 v, Vec2 b, double alphaRad)
    {
        double r = ToolRadiusMm + ClearanceMm;
        return (v + b * r, r, v);
    }

    internal override void Validate()
    {
        if (!(ToolRadiusMm > 0) || !double.IsFinite(ToolRadiusMm)) throw new ArgumentOutOfRangeException(nameof(ToolRadiusMm), "the tool radius must be a finite value > 0 mm");
        if (!(ClearanceMm >= 0) || !double.IsFinite(ClearanceMm)) throw new ArgumentOutOfRangeException(nameof(ClearanceMm), "the clearance must be a finite value >= 0 mm");
    }
}
