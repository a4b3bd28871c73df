using PartForge.Geometry.Profiles;

namespace PartForge.Parts;

/// <summary>
/// One layer of a part in exact primitives: the material is the union of <see cref="Outers"/> minus the
/// union of <see cref="Cuts"/>, between <see cref="Z0Mm"/> and <see cref="Z1Mm"/> (part-local).
/// The part's <see cref="PartModel.Solid"/> is made from these layers, one region each.
/// </summary>
public sealed record ExactLayer(double Z0Mm, double Z1Mm, IReadOnlyList<Contour> Outers, IReadOnlyList<Contour> Cuts)
{
    public double ThicknessMm => Z1Mm - Z0Mm;
}
