using System.Diagnostics.Contracts;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Layout;

/// <summary>
/// Where one copy of a part goes: on bin (sheet or plate) <see cref="BinIndex"/>, rotated about its
/// part-local origin by <see cref="RotationDeg"/> (counter-clockwise) and then moved by
/// <see cref="OffsetMm"/>: bin point = local point rotated + offset. The bin's origin is its lower-left corner.
/// </summary>
public sealed record LayoutPlacement(string PartId, int Copy, int BinIndex, double RotationDeg, Vec2 OffsetMm)
{
    /// <summary>Where a part-local point lands on the bin.</summary>
    [Pure]
    public Vec2 Apply(Vec2 local) => local.RotatedDeg(RotationDeg) + OffsetMm;

    /// <summary>The part's exact contour as placed (arcs stay arcs).</summary>
    [Pure]
    public Contour Place(Contour local) => local.RotatedDeg(RotationDeg).Translated(OffsetMm);

    /// <summary>The part's exact profile as placed, holes included.</summary>
    [Pure]
    public Profile Place(Profile local) =>
        new(local.Outers.Select(Place).ToArray(), local.Holes.Select(Place).ToArray());
}
