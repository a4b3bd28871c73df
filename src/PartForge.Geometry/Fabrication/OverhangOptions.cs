namespace PartForge.Geometry.Fabrication;

/// <summary>Settings of <see cref="OverhangAnalysis"/>, with their defaults.</summary>
public sealed record OverhangOptions
{
    /// <summary>
    /// A down-facing surface more than this many degrees from vertical needs support. Default 45 degrees
    /// (common practice for filament printing: most printers bridge or build out to about 45 degrees
    /// without support; no published standard).
    /// </summary>
    public double MaxAngleFromVerticalDeg { get; init; } = 45;

    /// <summary>A mesh triangle whose vertices are all within this of the lowest z rests on the bed; also
    /// the tolerance for "horizontal" (all vertices at one z) and for "below" an edge, mm. Default 1e-3 mm.</summary>
    public double ZToleranceMm { get; init; } = 1e-3;

    /// <summary>Overhang regions smaller than this are not reported, mm^2 (slivers left by the grid). Default 0.01 mm^2.</summary>
    public double MinAreaMm2 { get; init; } = 0.01;

    /// <summary>Accuracy of the unsupported span (the search for the farthest point stops within it), mm. Default 0.01 mm.</summary>
    public double SpanToleranceMm { get; init; } = 0.01;

    internal void Validate()
    {
        if (!(MaxAngleFromVerticalDeg >= 0 && MaxAngleFromVerticalDeg < 90)) throw new ArgumentOutOfRangeException(nameof(MaxAngleFromVerticalDeg), "the overhang limit must be in [0, 90) degrees");
        if (!(ZToleranceMm >= 0) || !double.IsFinite(ZToleranceMm)) throw new ArgumentOutOfRangeException(nameof(ZToleranceMm), "the z tolerance must be a finite value >= 0 mm");
        if (!(MinAreaMm2 >= 0) || !double.IsFinite(MinAreaMm2)) throw new ArgumentOutOfRangeException(nameof(MinAreaMm2), "the minimum area must be a finite value >= 0 mm^2");
        if (!(SpanToleranceMm > 0) || !double.IsFinite(SpanToleranceMm)) throw new ArgumentOutOfRangeException(nameof(SpanToleranceMm), "the span tolerance must be a finite value > 0 mm");
    }
}
