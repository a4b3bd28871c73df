using PartForge.Geometry.Meshes;

namespace PartForge.Parts.Placement;

/// <summary>One copy of a part with its mesh moved into the machine frame (exploded or nominal).</summary>
/// <param name="Name">Contract part name.</param>
/// <param name="Instance">Copy index (<see cref="PartInstance.Index"/>).</param>
/// <param name="Part">The part model.</param>
/// <param name="Mesh">The part's mesh placed in the machine frame (still closed and outward-oriented).</param>
public sealed record PlacedPart(string Name, int Instance, PartModel Part, Mesh Mesh)
{
    /// <summary>"former-3" for copies, the bare name for single parts; unique within an assembly.</summary>
    public string ObjectName => Part.Quantity > 1 ? $"{Name}-{Instance}" : Name;
}
