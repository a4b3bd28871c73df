using PartForge.Design.Machines;
using PartForge.Design.Stack;

namespace PartForge.Electrical.Field;

/// <summary>
/// The magnets of the machine as field sources, in the rotor frame at rotor angle 0: magnet k of every rotor
/// is centred at k x 360/poles degrees and magnetised along +z for even k, -z for odd k (alternating), or along
/// +z for every k (same-pole arrangement). In a dual-rotor
/// machine the back rotor's magnet k therefore shows the opposite pole to the front rotor's magnet k across
/// the stator, so their fields in the copper add.
///
/// Back iron (`rotor.back_iron`, or a steel rotor disc with blind pockets: see <see cref="IronPlane"/>) is modelled
/// by the image method — an APPROXIMATION: iron of infinite permeability and infinite extent in its plane. Each
/// magnet is mirrored in the iron face with the same magnetisation, weakened by the face's image strength when the
/// steel saturates (<see cref="BackIronFlux"/>). In a dual-rotor machine with iron on both rotors only first-order images are used
/// (each magnet mirrored once in each iron face), not the infinite series of images of images.
/// Dual-stator machines carry no back iron (the rotor is between the stators); a back iron there is ignored.
///
/// Axial positions come from <see cref="AxialStack"/> (magnet slabs, back-iron slabs, copper slab), so the
/// field and the geometry can never disagree.
/// </summary>
public sealed class RotorField
{
    /// <summary>Every source (magnets and images).</summary>
    public IReadOnlyList<MagnetSource> Sources { get; }

    /// <summary>
    /// When the machine is mirror-symmetric about z = 0 (dual-rotor), the sources on the z &gt; 0 side: the
    /// field of the whole machine at (x, y, z) is then Half(x, y, z) + Half(x, y, -z).
    /// Null when there is no such symmetry.
    /// </summary>
    public IReadOnlyList<MagnetSource>? HalfSources { get; }

    /// <summary>Axial range of the copper the flux is integrated over (the front stator's in dual-stator), mm.</summary>
    public double CopperZMinMm { get; }
    public double CopperZMaxMm { get; }

    /// <summary>True when back-iron images are part of the sources.</summary>
    public bool HasBackIron { get; }

    public int Poles { get; }

    /// <summary>Periods of the field in one revolution: poles / 2 with alternating magnets, poles with same-pole magnets.</summary>
    public int FieldPeriods { get; }

    /// <summary>True when the field has half-wave symmetry (alternating magnets: only odd harmonics); false for
    /// same-pole magnets, whose field has a steady part and every harmonic of the magnet pitch.</summary>
    public bool HalfWaveSymmetric { get; }

    /// <summary>Default distance factor beyond which magnets are replaced by dipoles (see MagnetSource).</summary>
    public const double DefaultFarFactor = 2.5;

    private RotorField(IReadOnlyList<MagnetSource> sources, IReadOnlyList<MagnetSource>? half, double c0, double c1, bool iron, int poles, bool same)
    {
        FieldPeriods = same ? poles : poles / 2;
        HalfWaveSymmetric = !same;
        Sources = sources;
        HalfSources = half;
        CopperZMinMm = c0;
        CopperZMaxMm = c1;
        HasBackIron = iron;
        Poles = poles;
    }

    /// <summary>Bz of all sources, tesla, at (x, y, z) in the rotor frame, mm.</summary>
    public double Bz(double x, double y, double z)
    {
        double s = 0;
        var src = Sources;
        for (int i = 0; i < src.Count; i++) s += src[i].Bz(x, y, z);
        return s;
    }

    /// <summary>The magnet slabs of the machine, in z order.</summary>
    public static IReadOnlyList<AxialSlab> MagnetSlabs(MachineModel machine) => machine.Stack.OfKind(SlabKind.Magnet).ToList();

    /// <summary>
    /// Builds the sources of a machine (its magnets, rings and steel faces from the machine model and its stack).
    /// <paramref name="ironFlux"/> gives each steel face's image strength (saturation); null: ideal iron.
    /// <paramref name="brTesla"/>: the magnets' remanence (default: the design's Br at 20 C).
    /// </summary>
    public static RotorField From(MachineModel machine, double farFactor = DefaultFarFactor, IReadOnlyList<BackIronFluxResult>? ironFlux = null,
        double? brTesla = null)
    {
        int poles = machine.Poles;
        var g = machine.Magnets.Shape;
        double br = brTesla ?? machine.Magnets.BrTesla;
        var stack = machine.Stack;
        var magnets = MagnetSlabs(machine);
        var copper = stack.OfKind(SlabKind.Copper).OrderByDescending(s => s.ZMax).First();
        var planes = ironFlux?.Select(f => (f.Plane, f.ImageStrength)).ToList()
                     ?? IronPlane.Of(machine).Select(p => (p, 1.0)).ToList();
        bool iron = planes.Count > 0;

        List<MagnetSource> Ring(double z0, double z1) =>
            Enumerable.Range(0, poles).Select(k => new MagnetSource(g, k * 360.0 / poles, z0, z1, machine.Magnets.SignOf(k) * br, farFactor)).ToList();

        var rings = magnets.Select(m => (m, ring: Ring(m.ZMin, m.ZMax))).ToList();
        var all = new List<MagnetSource>();
        foreach (var r in rings) all.AddRange(r.ring);
        var images = new List<(double zPlane, MagnetSource img)>();
        foreach (var (plane, strength) in planes)
        {
            if (strength <= 0) continue;
            foreach (var r in rings)
                foreach (var m in r.ring) images.Add((plane.FaceZMm, m.ImageIn(plane.FaceZMm, farFactor, strength)));
        }
        all.AddRange(images.Select(i => i.img));

        IReadOnlyList<MagnetSource>? half = null;
        bool symmetric = planes.Count != 1 && (planes.Count == 0 || Math.Abs(planes[0].Plane.FaceZMm + planes[^1].Plane.FaceZMm) < 1e-9 && planes[0].Item2 == planes[^1].Item2);
        if (machine.Layout.StatorBetweenRotors && Math.Abs(copper.ZMin + copper.ZMax) < 1e-9 && symmetric)
        {
            var h = new List<MagnetSource>();
            foreach (var r in rings) if (r.m.ZMin > 0) h.AddRange(r.ring);
            foreach (var i in images) if (i.zPlane > 0) h.Add(i.img);
            half = h;
        }
        return new RotorField(all, half, copper.ZMin, copper.ZMax, iron, poles, machine.Magnets.Arrangement == MagnetArrangement.Same);
    }
}
