using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Parts;

/// <summary>
/// A named feature of a part with its exact primitive, in part-local coordinates (z from 0 at the part's
/// bottom face). The z-range says where the feature's material is removed (pockets, holes, grooves) or
/// present (flanges, core). A through feature spans the part's whole height.
/// </summary>
/// <param name="Name">Unique within the part, e.g. "pocket-3", "seat-0", "bolt-1".</param>
/// <param name="Kind">What it is.</param>
/// <param name="Index">Index in its pattern (pocket i, coil k, hole j); 0 for singletons.</param>
/// <param name="Contour">Exact boundary (lines and true arcs).</param>
/// <param name="Z0Mm">Bottom of the feature's z-range, part-local.</param>
/// <param name="Z1Mm">Top of the feature's z-range, part-local.</param>
/// <param name="AngleDeg">Angular position of the feature's reference point about the part axis (mechanical degrees, part-local).</param>
/// <param name="RadiusMm">Radial position of the feature's reference point (centre of a pocket, hole or seat).</param>
public sealed record PartFeature(string Name, FeatureKind Kind, int Index, Contour Contour, double Z0Mm, double Z1Mm,
    double AngleDeg, double RadiusMm)
{
    /// <summary>For magnet pockets: true when the magnet goes in with its north pole toward the part's top face.</summary>
    public bool? NorthUp { get; init; }

    /// <summary>Reference point of the feature in part-local xy.</summary>
    public Vec2 Position => Vec2.FromAngleDeg(AngleDeg) * RadiusMm;
}
