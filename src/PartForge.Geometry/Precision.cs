namespace PartForge.Geometry;

/// <summary>
/// The one precision object passed into kernel operations; never a global setting.
/// </summary>
/// <param name="GridMm">Snap grid: every coordinate of a region is rounded to a multiple of this once,
/// when the region is made. 1e-4 mm keeps distinct grid points distinct in float32 up to +-1000 mm.</param>
/// <param name="ChordalToleranceMm">Maximum distance between a true arc and its facets.</param>
public sealed record Precision(double GridMm, double ChordalToleranceMm)
{
    public const double DefaultGridMm = 1e-4;

    public static Precision FromChordalTolerance(double chordalToleranceMm) => new(DefaultGridMm, chordalToleranceMm);

    /// <summary>NetTopologySuite precision scale (1 / grid).</summary>
    public double Scale => 1.0 / GridMm;

    public double Snap(double v) => Math.Round(v / GridMm) * GridMm;
}
