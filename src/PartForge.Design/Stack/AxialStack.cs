using PartForge.Design.Model;

namespace PartForge.Design.Stack;

/// <summary>
/// Nominal axial positions of every face, derived from the design alone (no tolerances; the checker adds
/// those). One rule used by the electrical engine (magnetic gap), the part builders (spacers, assembly) and
/// the checker (stack-up), so that they can never disagree.
///
/// Coordinates: z along the shaft, millimetres. z = 0 is the mid-plane of the stationary pack for
/// single-rotor and dual-rotor layouts, and the mid-plane of the rotor for dual-stator.
///
/// Rules:
/// - The stationary pack is the stator ring with the coil formers seated in it, centred on its mid-plane.
///   Its thickness is the larger of `stator.thickness` and the former height `coils.height + 2 former.flange`.
///   The copper is centred in it.
/// - Pocket depth = `rotor.thickness - rotor.pocket_floor` (through pockets: the whole thickness). Magnets sit
///   on the pocket floor (through pockets: flush with the back face, which rests on the back iron if any),
///   so a magnet thicker than the pocket stands proud of the rotor's stator-side face by the difference.
///   In dual-stator the rotor's pockets go through and the magnet is centred, standing proud on both faces
///   by half the difference.
/// - The nominal running gap `gap.air_gap` is measured from the stationary face to the nearest rotating
///   surface (the magnet face if it stands proud, else the rotor face).
/// - The back iron lies against the rotor's back face (the side away from the stator).
/// </summary>
public sealed record AxialStack
{
    /// <summary>Thickness of the stationary pack (stator ring and seated formers), mm.</summary>
    public required double StationaryThicknessMm { get; init; }

    /// <summary>Height of a former: winding height plus a flange on each side, mm.</summary>
    public required double FormerHeightMm { get; init; }

    /// <summary>Depth of a magnet pocket, mm.</summary>
    public required double PocketDepthMm { get; init; }

    /// <summary>How far a magnet stands proud of the rotor's stator-side face (negative: recessed), mm.</summary>
    public required double MagnetProudMm { get; init; }

    /// <summary>Axial distance from a magnet's stator-side face to the nearest copper of the coil facing it, mm.</summary>
    public required double MagneticGapMm { get; init; }

    /// <summary>Every axial slab of the nominal assembly, ordered by ZMin.</summary>
    public required IReadOnlyList<AxialSlab> Slabs { get; init; }

    public static AxialStack From(Model.Design d)
    {
        double formerH = d.Coils.Height + 2 * d.Former.Flange;
        double s = Math.Max(d.Stator.Thickness, formerH);
        double t = d.Rotor.Thickness;
        double depth = d.Rotor.PocketFloor > 0 ? t - d.Rotor.PocketFloor : t;
        double tm = d.Magnets.Thickness;
        double gap = d.Gap.AirGap;
        double copperHalf = d.Coils.Height / 2;
        var slabs = new List<AxialSlab>();
        string layout = d.Machine.Layout;

        if (layout == "dual-stator")
        {
            double proud = (tm - t) / 2;                 // each face
            double rotFace = t / 2;                       // rotor faces at +-t/2
            double magFace = t / 2 + proud;               // magnet faces at +-(t/2 + proud)
            double nearest = Math.Max(rotFace, magFace);
            double statInner = nearest + gap;             // stationary face towards the rotor
            double statMid = statInner + s / 2;
            slabs.Add(new AxialSlab(SlabKind.Rotor, "rotor", -t / 2, t / 2));
            slabs.Add(new AxialSlab(SlabKind.Magnet, "rotor", -tm / 2, tm / 2));
            foreach (var (sign, name) in new[] { (1.0, "stator-front"), (-1.0, "stator-back") })
            {
                slabs.Add(Slab(SlabKind.Stator, name, sign * (statMid - d.Stator.Thickness / 2), sign * (statMid + d.Stator.Thickness / 2)));
                slabs.Add(Slab(SlabKind.Former, name, sign * (statMid - formerH / 2), sign * (statMid + formerH / 2)));
                slabs.Add(Slab(SlabKind.Copper, name, sign * (statMid - copperHalf), sign * (statMid + copperHalf)));
            }
            return Build(s, formerH, depth, proud, (statMid - copperHalf) - magFace, slabs);
        }

        {
            double proud = tm - depth;
            double half = s / 2;
            double nearest = half + gap;                  // nearest rotating surface
            double rotFace = nearest + Math.Max(0, proud); // rotor's stator-side face (set back by a proud magnet)
            double magFace = rotFace - proud;             // magnet's stator-side face (nearer the stator when proud, set back when recessed)
            double magBack = magFace + tm;
            slabs.Add(new AxialSlab(SlabKind.Stator, "stator", -d.Stator.Thickness / 2, d.Stator.Thickness / 2));
            slabs.Add(new AxialSlab(SlabKind.Former, "stator", -formerH / 2, formerH / 2));
            slabs.Add(new AxialSlab(SlabKind.Copper, "stator", -copperHalf, copperHalf));
            var rotors = layout == "dual-rotor"
                ? new[] { (1.0, "rotor-front"), (-1.0, "rotor-back") }
                : new[] { (1.0, "rotor") };
            foreach (var (sign, name) in rotors)
            {
                slabs.Add(Slab(SlabKind.Rotor, name, sign * rotFace, sign * (rotFace + t)));
                slabs.Add(Slab(SlabKind.Magnet, name, sign * magFace, sign * magBack));
                if (d.Rotor.BackIron is { } bi)
                    slabs.Add(Slab(SlabKind.BackIron, name, sign * (rotFace + t), sign * (rotFace + t + bi.Thickness)));
            }
            return Build(s, formerH, depth, proud, magFace - copperHalf, slabs);
        }
    }

    private static AxialSlab Slab(SlabKind kind, string owner, double a, double b) =>
        new(kind, owner, Math.Min(a, b), Math.Max(a, b));

    private static AxialStack Build(double s, double formerH, double depth, double proud, double magGap, List<AxialSlab> slabs) => new()
    {
        StationaryThicknessMm = s,
        FormerHeightMm = formerH,
        PocketDepthMm = depth,
        MagnetProudMm = proud,
        MagneticGapMm = magGap,
        Slabs = slabs.OrderBy(x => x.ZMin).ThenBy(x => x.Kind).ThenBy(x => x.Owner, StringComparer.Ordinal).ToArray(),
    };
}

/// <summary>What an axial slab of the assembly is.</summary>
public enum SlabKind { Rotor, Magnet, BackIron, Stator, Former, Copper }

/// <summary>One axial slab: a kind of body belonging to a named part (or the rotor/stator it sits in), from ZMin to ZMax.</summary>
public readonly record struct AxialSlab(SlabKind Kind, string Owner, double ZMin, double ZMax)
{
    public double Thickness => ZMax - ZMin;
}
