using PartForge.Formats.ThreeMf;
using PartForge.Parts;
using PartForge.Parts.Placement;

namespace PartForge.Export.Pipeline;

/// <summary>
/// The objects of <c>&lt;name&gt;-assembly.3mf</c>: every copy of every part, printed and cut, placed where the
/// exploded assembly (<see cref="AssemblyBuilder"/>, explode distance <c>assembly.explode</c>) puts it, one named
/// object each (<see cref="PlacedPart.ObjectName"/>: <c>former-0</c> ... for copies, the bare name for single
/// parts), in the machine's part order and copy order. For a visual check in a slicer or viewer, not for printing.
/// </summary>
/// <remarks>
/// The placement is baked into each object's mesh (machine-frame millimetres; each copy is made when the writer comes to it)
/// and every build item is untransformed.
/// Sharing one mesh among identical copies would need one object with several build items, and build items carry no
/// names in the 3MF Core Specification, so the copies could not be told apart; a viewer that ignores build
/// transforms also shows the baked machine correctly. The placements are proper motions (a copy turned over is
/// rotated half a turn about the machine x axis, determinant +1; the mirrored dual-stator rings are built mirrored),
/// so every placed mesh stays closed and outward-facing, which <see cref="ThreeMfWriter"/> checks again.
/// </remarks>
public static class AssemblyThreeMf
{
    /// <summary>The package's Title metadata for a design.</summary>
    public static string Title(string designName) => designName + " exploded assembly";

    public static IReadOnlyList<ThreeMfObject> Objects(PartSet set)
    {
        ArgumentNullException.ThrowIfNull(set);
        // Each copy's placed mesh is made when the writer reaches it and dropped after (Deferred).
        return AssemblyBuilder.Places(set, exploded: true).Select(p => ThreeMfObject.Deferred(p.ObjectName, p.PlacedMesh)).ToArray();
    }
}
