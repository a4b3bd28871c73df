namespace PartForge.Checks.Clearance;

/// <summary>
/// One prism of the assembly for the rotation sweep: a filled planar shape in the machine frame (at rotor
/// angle 0 for rotating bodies) extruded from Z0 to Z1 (machine z, mm).
/// </summary>
/// <param name="Part">Contract part name the prism belongs to (rotor-front, stator, former, ...), or "magnets".</param>
/// <param name="Feature">What it is, for the report ("magnet 3", "coil 2 copper", "rotor disc layer 1").</param>
public sealed record SweepPrism(string Part, string Feature, double Z0, double Z1, Shape2D Shape);
