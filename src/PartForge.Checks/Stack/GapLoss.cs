namespace PartForge.Checks.Stack;

/// <summary>One contribution that can eat into a running gap in the worst case, mm (positive = gap lost).</summary>
/// <param name="Name">What it is, e.g. "print_z rotor-front", "runout", "axial_play", "deflection", "coil bulge".</param>
/// <param name="Mm">How much of the gap it can take, mm.</param>
public readonly record struct GapLoss(string Name, double Mm);
