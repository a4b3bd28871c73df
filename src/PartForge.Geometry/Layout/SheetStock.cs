namespace PartForge.Geometry.Layout;

/// <summary>One size of sheet that may be used: width along x, height along y (mm), and how many there are.</summary>
/// <param name="WidthMm">Along x.</param>
/// <param name="HeightMm">Along y.</param>
/// <param name="Count">How many sheets of this size exist; null for as many as needed.</param>
public sealed record SheetStock(double WidthMm, double HeightMm, int? Count = null);
