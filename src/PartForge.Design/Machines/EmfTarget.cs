namespace PartForge.Design.Machines;

/// <summary>The phase EMF the turns are solved for: <paramref name="RmsV"/> at <paramref name="Rpm"/>.</summary>
public sealed record EmfTarget(double RmsV, double Rpm);
