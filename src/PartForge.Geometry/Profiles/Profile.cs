namespace PartForge.Geometry.Profiles;

/// <summary>
/// An exact 2D profile: outer boundaries and the holes cut out of them, as true lines and arcs.
/// Holes are contours entirely inside one of the outers. Orientation is not significant here;
/// the discretiser orients outers counter-clockwise and holes clockwise.
/// </summary>
public sealed record Profile(IReadOnlyList<Contour> Outers, IReadOnlyList<Contour> Holes)
{
    public static Profile Of(Contour outer, params Contour[] holes) => new(new[] { outer }, holes);

    public Profile RotatedDeg(double deg) =>
        new(Outers.Select(c => c.RotatedDeg(deg)).ToArray(), Holes.Select(c => c.RotatedDeg(deg)).ToArray());

    public Profile MirroredY() =>
        new(Outers.Select(c => c.MirroredY()).ToArray(), Holes.Select(c => c.MirroredY()).ToArray());
}
