namespace PartForge.Geometry.Layout;

/// <summary>
/// A finished layout: the bins (sheets or plates) in the order they were opened, every placement (by bin,
/// then in the order placed), and the copies that could not be placed (never placed outside a bin).
/// </summary>
public sealed record LayoutResult(IReadOnlyList<LayoutBin> Bins, IReadOnlyList<LayoutPlacement> Placements, IReadOnlyList<LayoutMiss> NotPlaced)
{
    /// <summary>True when every copy of every part was placed.</summary>
    public bool AllPlaced => NotPlaced.Count == 0;
}
