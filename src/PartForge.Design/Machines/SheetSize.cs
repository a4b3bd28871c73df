namespace PartForge.Design.Machines;

/// <summary>One size of sheet the user has (<c>cutter.sheets</c>): width along x, height along y, and how many (null: as many as needed).</summary>
public sealed record SheetSize(double WidthMm, double HeightMm, int? Count);
