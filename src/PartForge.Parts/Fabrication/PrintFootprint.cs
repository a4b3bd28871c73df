using PartForge.Geometry.Layout;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Solids;

namespace PartForge.Parts.Fabrication;

/// <summary>
/// A printed part as it stands on the bed, from its exact layers: which way up (largest flat face down), the
/// area of the face on the bed, its height, and its outline seen from above in bed coordinates (every
/// layer's outers; the layout engine takes their convex hull, which contains the part).
/// </summary>
/// <remarks>
/// Largest flat face down: the two candidate faces of a prismatic stack are the bottom of its lowest layer and
/// the top of its highest; the part is turned over (a half turn about x: (x, y, z) -> (x, -y, h - z), a
/// rotation, not a mirror) when the top face is strictly larger, as in
/// <see cref="PartForge.Geometry.Fabrication.PrintOrientation"/>. Face area = outers minus cuts of that
/// layer (the builders' cuts lie inside the outers and do not overlap one another).
/// </remarks>
/// <param name="Flipped">The part prints upside down (its part-local top face on the bed).</param>
/// <param name="BedFaceAreaMm2">Area of the face on the bed, mm^2.</param>
/// <param name="HeightMm">Height of the part on the bed, mm.</param>
/// <param name="Outline">Outline seen from above in bed coordinates before the layout's rotation and shift.</param>
public sealed record PrintFootprint(bool Flipped, double BedFaceAreaMm2, double HeightMm, Profile Outline)
{
    /// <summary>The footprint of a part from its exact layers (part-local z from 0 to its height).</summary>
    public static PrintFootprint Of(IReadOnlyList<ExactLayer> layers)
    {
        ArgumentNullException.ThrowIfNull(layers);
        var solid = layers.Where(l => l.Outers.Count > 0 && l.Z1Mm > l.Z0Mm).OrderBy(l => l.Z0Mm).ToList();
        if (solid.Count == 0) throw new ArgumentException("the part has no layers", nameof(layers));
        double bottom = FaceArea(solid[0]), top = FaceArea(solid[^1]);
        bool flipped = top > bottom;
        double z0 = solid[0].Z0Mm, z1 = solid.Max(l => l.Z1Mm);
        var outers = solid.SelectMany(l => l.Outers).Select(c => flipped ? c.MirroredY() : c).ToArray();
        return new PrintFootprint(flipped, flipped ? top : bottom, z1 - z0, new Profile(outers, Array.Empty<Contour>()));
    }

    /// <summary>Material area of one layer's face: its outers minus its cuts, mm^2.</summary>
    public static double FaceArea(ExactLayer layer)
    {
        ArgumentNullException.ThrowIfNull(layer);
        return layer.Outers.Sum(c => Math.Abs(ContourOffset.SignedArea(c))) - layer.Cuts.Sum(c => Math.Abs(ContourOffset.SignedArea(c)));
    }

    /// <summary>The layout item for <paramref name="quantity"/> copies.</summary>
    public LayoutItem Item(string id, int quantity) => new(id, Outline, quantity);
}
