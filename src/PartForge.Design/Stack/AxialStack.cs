using PartForge.Design.Machines;
using PartForge.Design.Parts;

namespace PartForge.Design.Stack;

/// <summary>
/// Nominal axial positions of every face, derived from the design alone (no tolerances; the checker adds
/// those). Computed once, by the machine model (<see cref="MachineModel.Stack"/>), and read by the electrical
/// engine (magnetic gap), the part builders (spacers, assembly) and the checker (stack-up), so that they can
/// never disagree.
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

    /// <summary>The stack of a machine of this layout and these sections.</summary>
    public static AxialStack Of(Layout layout, RotorSpec rotor, double magnetThicknessMm, CoilSet coils, FormerSpec former, StatorSpec stator, GapSpec gapSpec)
    {
        double formerH = coils.HeightMm + 2 * former.FlangeMm;
        double s = Math.Max(stator.ThicknessMm, formerH);
        double t = rotor.ThicknessMm;
        double depth = rotor.PocketFloorMm > 0 ? t - rotor.PocketFloorMm : t;
        double tm = magnetThicknessMm;
        double gap = gapSpec.AirGapMm;
        double copperHalf = coils.HeightMm / 2;
        var slabs = new List<AxialSlab>();

        if (layout.RotorBetweenStators)
        {
            double proud = (tm - t) / 2;                 // each face
            double rotFace = t / 2;                       // rotor faces at +-t/2
            double magFace = t / 2 + proud;               // magnet faces at +-(t/2 + proud)
            double nearest = Math.Max(rotFace, magFace);
            double statInner = nearest + gap;             // stationary face towards the rotor
            double statMid = statInner + s / 2;
            var rotorId = layout.Rotors[0];
            slabs.Add(new AxialSlab(SlabKind.Rotor, rotorId, -t / 2, t / 2));
            slabs.Add(new AxialSlab(SlabKind.Magnet, rotorId, -tm / 2, tm / 2));
            foreach (var (sign, id) in new[] { (1.0, layout.Stators[0]), (-1.0, layout.Stators[1]) })
            {
                slabs.Add(Slab(SlabKind.Stator, id, sign * (statMid - stator.ThicknessMm / 2), sign * (statMid + stator.ThicknessMm / 2)));
                slabs.Add(Slab(SlabKind.Former, id, sign * (statMid - formerH / 2), sign * (statMid + formerH / 2)));
                slabs.Add(Slab(SlabKind.Copper, id, sign * (statMid - copperHalf), sign * (statMid + copperHalf)));
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
            var statorId = layout.Stators[0];
            slabs.Add(new AxialSlab(SlabKind.Stator, statorId, -stator.ThicknessMm / 2, stator.ThicknessMm / 2));
            slabs.Add(new AxialSlab(SlabKind.Former, statorId, -formerH / 2, formerH / 2));
            slabs.Add(new AxialSlab(SlabKind.Copper, statorId, -copperHalf, copperHalf));
            var rotors = layout.Rotors.Select((id, i) => (Sign: i == 0 ? 1.0 : -1.0, Id: id));
            foreach (var (sign, id) in rotors)
            {
                slabs.Add(Slab(SlabKind.Rotor, id, sign * rotFace, sign * (rotFace + t)));
                slabs.Add(Slab(SlabKind.Magnet, id, sign * magFace, sign * magBack));
                if (rotor.BackIronThicknessMm is { } bi)
                    slabs.Add(Slab(SlabKind.BackIron, id, sign * (rotFace + t), sign * (rotFace + t + bi)));
            }
            return Build(s, formerH, depth, proud, magFace - copperHalf, slabs);
        }
    }

    /// <summary>The slab of this kind that belongs to the part (throws when there is none).</summary>
    public AxialSlab Slab(SlabKind kind, PartId owner) => Slabs.First(x => x.Kind == kind && x.Owner == owner);

    /// <summary>The slabs of one kind, in z order.</summary>
    public IEnumerable<AxialSlab> OfKind(SlabKind kind) => Slabs.Where(x => x.Kind == kind);

    private static AxialSlab Slab(SlabKind kind, PartId owner, double a, double b) =>
        new(kind, owner, Math.Min(a, b), Math.Max(a, b));

    private static AxialStack Build(double s, double formerH, double depth, double proud, double magGap, List<AxialSlab> slabs) => new()
    {
        StationaryThicknessMm = s,
        FormerHeightMm = formerH,
        PocketDepthMm = depth,
        MagnetProudMm = proud,
        MagneticGapMm = magGap,
        Slabs = slabs.OrderBy(x => x.ZMin).ThenBy(x => x.Kind).ThenBy(x => x.Owner.Name, StringComparer.Ordinal).ToArray(),
    };
}

/// <summary>What an axial slab of the assembly is.</summary>
public enum SlabKind { Rotor, Magnet, BackIron, Stator, Former, Copper }

/// <summary>One axial slab: a kind of body belonging to a part (or the rotor/stator it sits in), from ZMin to ZMax.</summary>
public readonly record struct AxialSlab(SlabKind Kind, PartId Owner, double ZMin, double ZMax)
{
    public double Thickness => ZMax - ZMin;
}
