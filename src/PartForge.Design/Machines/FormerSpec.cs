namespace PartForge.Design.Machines;

/// <summary>The coil former (<c>former.*</c>): flange thickness each side of the winding, and its overhang beyond it.</summary>
public sealed record FormerSpec(double FlangeMm, double MarginMm);
