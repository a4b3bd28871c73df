namespace PartForge.Design.Machines;

/// <summary>Manufacturing and running tolerances (<c>tolerances.*</c>), mm.</summary>
public sealed record ToleranceSpec(double PrintXyMm, double PrintZMm, double RunoutMm, double AxialPlayMm);
