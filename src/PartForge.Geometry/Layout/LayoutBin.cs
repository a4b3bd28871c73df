namespace PartForge.Geometry.Layout;

/// <summary>One sheet or plate that the layout uses.</summary>
/// <param name="Index">Position in <see cref="LayoutResult.Bins"/>; placements refer to it.</param>
/// <param name="StockIndex">Which of the given sheet sizes it is (0 for a printer bed).</param>
/// <param name="WidthMm">Along x.</param>
/// <param name="HeightMm">Along y.</param>
/// <param name="PartCount">Copies placed on it.</param>
/// <param name="PartAreaMm2">Exact area of the parts on it (outers minus holes).</param>
public sealed record LayoutBin(int Index, int StockIndex, double WidthMm, double HeightMm, int PartCount, double PartAreaMm2)
{
    /// <summary>Part area / bin area (0..1).</summary>
    public double Utilisation => PartAreaMm2 / (WidthMm * HeightMm);
}
