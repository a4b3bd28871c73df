namespace PartForge.Geometry.Fabrication;

/// <summary>
/// The down-facing surfaces of a part in its printing orientation that need support, ordered by z, then by
/// area (largest first), then by their box's lower-left corner.
/// </summary>
public sealed record OverhangReport(IReadOnlyList<OverhangRegion> Regions)
{
    /// <summary>Sum of the regions' areas, mm^2.</summary>
    public double TotalAreaMm2 => Regions.Sum(r => r.AreaMm2);

    /// <summary>The region of largest area (the first such in order), or null when there is none.</summary>
    public OverhangRegion? Largest => Regions.Count == 0 ? null : Regions.Aggregate((a, b) => b.AreaMm2 > a.AreaMm2 ? b : a);

    /// <summary>The largest span of any region that rests on something (0 when none does).</summary>
    public double MaxSpanMm => Regions.Where(r => r.SpanMm is not null).Select(r => r.SpanMm!.Value).DefaultIfEmpty(0).Max();

    /// <summary>How many regions float with nothing under their boundary.</summary>
    public int IslandCount => Regions.Count(r => r.IsIsland);

    /// <summary>True when no surface needs support.</summary>
    public bool IsSelfSupporting => Regions.Count == 0;
}
