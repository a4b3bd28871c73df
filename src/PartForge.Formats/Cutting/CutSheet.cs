using PartForge.Geometry.Profiles;

namespace PartForge.Formats.Cutting;

/// <summary>
/// What a cutter needs for one flat part: the exact through-cut profile (outer boundaries and holes, as
/// designed, not yet compensated), contours to mark or engrave (never compensated), and the kerf.
/// </summary>
/// <param name="PartName">Shown in the file (comment, title); any text.</param>
/// <param name="Cuts">Through cuts as designed: outers and holes.</param>
/// <param name="Marks">Closed contours on the marking layer, written as given.</param>
/// <param name="KerfMm">Width of material the cutter removes; outlines grow and holes shrink by half of it.
/// 0 writes the design contours unchanged.</param>
public sealed record CutSheet(string PartName, Profile Cuts, IReadOnlyList<Contour> Marks, double KerfMm)
{
    /// <summary>The whole sheet when the cuts are a nest of parts on it; null for one part drawn on its own.</summary>
    public SheetFrame? Frame { get; init; }

    /// <summary>A sheet with no marks.</summary>
    public static CutSheet Of(string partName, Profile cuts, double kerfMm) => new(partName, cuts, Array.Empty<Contour>(), kerfMm);
}
