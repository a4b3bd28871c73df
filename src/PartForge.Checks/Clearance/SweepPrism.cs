using PartForge.Design.Parts;
using PartForge.Geometry.Exact;

namespace PartForge.Checks.Clearance;

/// <summary>
/// One prism of the assembly for the rotation sweep: a filled planar shape in the machine frame (at rotor
/// angle 0 for rotating bodies) extruded from Z0 to Z1 (machine z, mm).
/// </summary>
/// <param name="Part">The part the prism belongs to (a magnet belongs to its rotor, a coil's copper to its stator).</param>
/// <param name="Feature">What it is, for the report ("magnet 3", "coil 2 copper", "rotor disc layer 1").</param>
public sealed record SweepPrism(PartId Part, string Feature, double Z0, double Z1, Shape2D Shape);
