using PartForge.Geometry.Profiles;

namespace PartForge.Geometry.Solids;

/// <summary>
/// One layer of a part in exact primitives: the material is the union of <see cref="Outers"/> minus the
/// union of <see cref="Cuts"/>, between <see cref="Z0Mm"/> and <see cref="Z1Mm"/> (part-local).
/// <see cref="ExactSolid.ToSolid"/> makes a layered solid of such layers, one region each.
/// </summary>
public sealed record ExactLayer(double Z0Mm, double Z1Mm, IReadOnlyList<Contour> Outers, IReadOnlyList<Contour> Cuts)
{
    public double ThicknessMm => Z1Mm - Z0Mm;
}
