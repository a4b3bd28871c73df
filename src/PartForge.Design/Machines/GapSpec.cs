namespace PartForge.Design.Machines;

/// <summary>The air gap (<c>gap.*</c>): the nominal running clearance each side, and the worst-case limit below which a check fails.</summary>
public sealed record GapSpec(double AirGapMm, double MinRunningGapMm);
