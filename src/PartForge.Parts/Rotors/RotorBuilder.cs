using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Design.Stack;
using PartForge.Geometry.Exact;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Solids;
using PartForge.Parts.Shapes;

namespace PartForge.Parts.Rotors;

/// <summary>
/// The rotor disc(s). Geometry decisions:
/// <list type="bullet">
/// <item>Part-local frame: z = 0 is the back face (away from the stator), z = thickness the stator-side face.
/// Blind pockets (<c>rotor.pocket_floor</c> &gt; 0) open on the stator-side face, from z = floor to the top;
/// through pockets go from 0 to the top. In <c>dual-stator</c> the single rotor always has through pockets
/// (both faces face a stator).</item>
/// <item>Pocket i is centred at i x 360 / poles (pocket 0 on +x), outline from <see cref="DesignGeometry.PocketOutline"/>.</item>
/// <item>Polarity dots: a round dot, diameter max(1.5, 3 x nozzle), engraved 2 layers deep (at most a quarter of
/// the thickness, at most half the pocket depth) into the top face beside every pocket that takes a magnet
/// north pole up (toward the top face). The dot sits on the pocket's centre line, one minimum wall
/// (min_wall_lines x nozzle) inside the pocket's inner edge; if it does not fit there (bore, bolt holes,
/// neighbouring pockets), outside the outer edge; else it is left out with a note. Dots are their own layer,
/// so the part stays a stack of prisms; a cut rotor gets them as engraving marks.</item>
/// <item>Index notch: a semicircular bite in the rim on the +x axis (at pocket 0), radius 1 mm or less so that a
/// minimum wall remains between it and pocket 0; left out (with a note) when less than 0.3 mm would remain.</item>
/// <item>Magnets alternate: even pockets north-up on <c>rotor</c> and <c>rotor-front</c>. The back disc of a
/// dual-rotor machine has the same pockets (the mirror of the front's pattern, which is symmetric) and its dots at
/// the odd pockets: assembled with both index notches on the same side, every front magnet presents the opposite
/// pole to the back magnet facing it, so they attract across the stator (the field runs straight through the coils).</item>
/// <item>Same-pole magnets (<c>magnets.arrangement: same</c>): every pocket is marked like pocket 0, so the front (or
/// only) rotor has a dot at every pocket and the back rotor none (all its magnets south pole up, facing the front's
/// north poles across the stator).</item>
/// <item>Bolt hole j at j x 360 / count on the bolt circle; bore centred.</item>
/// </list>
/// </summary>
internal static class RotorBuilder
{
    public const double MinNotchRadiusMm = 0.3;
    public const double MaxNotchRadiusMm = 1.0;

    public static IReadOnlyList<PartSpec> Build(MachineModel d, AxialStack stack, List<PartDiagnostic> diags)
    {
        var jacks = Jacking.For(d, diags);
        return d.Layout.Rotors.Select(id => BuildOne(d, stack, id, evenNorthUp: id.Side != PartSide.Back, jacks?.Rotor == id ? jacks : null, diags)).ToArray();
    }

    /// <summary>The rim contour (outer circle, with the index notch bite on +x when notchRadius &gt; 0).</summary>
    public static Contour Rim(double r, double notchRadius)
    {
        var o = new Vec2(0, 0);
        if (!(notchRadius > 0)) return Contour.FullCircle(o, r);
        double alpha = 2 * Math.Asin(notchRadius / (2 * r)) * 180.0 / Math.PI;
        return Contour.FromSegments(new Segment[]
        {
            new ArcSegment(o, r, alpha, 360 - 2 * alpha),
            new ArcSegment(new Vec2(r, 0), notchRadius, 270 - alpha / 2, -(180 - alpha)),
        });
    }

    private static PartSpec BuildOne(MachineModel d, AxialStack stack, PartId id, bool evenNorthUp, JackingPlan? jacks, List<PartDiagnostic> diags)
    {
        var rd = d.Rotor;
        string name = id.Name;
        double R = rd.OuterDiameterMm / 2, t = rd.ThicknessMm;
        bool through = d.ThroughPockets;
        double pocketZ0 = through ? 0 : rd.PocketFloorMm;
        if (!through && !(pocketZ0 < t)) throw new PartsException("rotor.pocket_floor must be less than rotor.thickness");
        double wall = DesignGeometry.MinWallMm(d);
        int poles = d.Poles;
        var notes = new List<string>();

        string whyNot = through ? "" : "its magnet pockets are blind (rotor.pocket_floor > 0)";
        var (process, material) = ProcessChoice.Resolve(id, d.Parts.For(PartRole.Rotor), through, whyNot, diags);
        var pocket0 = DesignGeometry.RelievedPocketOutline(d, process);
        if (!DesignGeometry.PocketReliefFits(d, process))
        {
            notes.Add($"{name}: no corner reliefs in the magnet pockets: a side of the pocket is too short for them; a magnet of the nominal size may not seat in the corners");
            diags.Add(new PartDiagnostic(DiagnosticSeverity.Note, id, "no-corner-relief", $"{name}: the magnet pockets are too small for corner reliefs; left out"));
        }
        else if (pocket0.Circle is null && pocket0.Segments.Count > DesignGeometry.PocketOutline(d).Segments.Count)
            notes.Add(process == PartProcess.Print
                ? $"{name}: each magnet pocket corner has a relief circle (radius from printer.nozzle {d.Printer.NozzleMm.ToString("0.###", System.Globalization.CultureInfo.InvariantCulture)} mm) so a magnet of the nominal size seats in the corners"
                : $"{name}: each magnet pocket corner has a dog-bone notch (radius kerf/2 + 0.02 mm, kerf {d.Cutter.KerfMm.ToString("0.###", System.Globalization.CultureInfo.InvariantCulture)} mm) so a magnet of the nominal size seats in the corners");
        var (pIn, pOut) = Exact2D.RadialExtent(pocket0);
        var pockets = Enumerable.Range(0, poles).Select(i => pocket0.RotatedDeg(DesignGeometry.PoleAngleDeg(d, i))).ToArray();

        // Index notch on the rim at pocket 0.
        double notch = Math.Min(MaxNotchRadiusMm, R - pOut - wall);
        if (!rd.IndexNotch)
        {
            notch = 0;
            notes.Add("no rim index notch (rotor.index: none): pocket 0 is the one on the part's +x axis; mark it before taking the part off the print bed");
        }
        else if (notch < MinNotchRadiusMm)
        {
            notch = 0;
            notes.Add("no rim index notch: the web between pocket 0 and the rim is too thin for one; pocket 0 is the one on the part's +x axis");
            diags.Add(new PartDiagnostic(DiagnosticSeverity.Note, id, "no-index-notch", $"{name}: the rim is too close to the pockets for an index notch; left out"));
        }
        var rim = Rim(R, notch);

        Contour? bore = rd.BoreMm > 0 ? Contour.FullCircle(new Vec2(0, 0), rd.BoreMm / 2) : null;
        var bolts = BoltHoles(rd.BoltCircle);

        // Polarity dots.
        double dotD = Math.Max(1.5, 3 * d.Process.NozzleMm);
        double dotDepth = Math.Min(2 * d.Process.LayerMm, Math.Min(t / 4, (t - pocketZ0) / 2));
        var jackHoles = jacks is null ? [] : Enumerable.Range(0, jacks.AnglesDeg.Count).Select(jacks.Hole).ToArray();
        var traps = jacks is null ? [] : Enumerable.Range(0, jacks.AnglesDeg.Count).Select(jacks.Trap).ToArray();
        // Dots keep clear of each trap's circumscribed circle as of a bolt hole.
        var keepClear = jacks is null ? bolts : bolts.Concat(Enumerable.Range(0, traps.Length)
            .Select(j => Contour.FullCircle(Vec2.FromAngleDeg(jacks.AnglesDeg[j]) * jacks.CircleRadiusMm, jacks.TrapCircumradiusMm))).ToArray();
        var dotRadius = !rd.PolarityDots ? null : PlaceDots(d, R, notch, pocket0, pockets, bore, keepClear, dotD / 2, wall, pIn, pOut);
        var features = new List<PartFeature>
        {
            new("rim", FeatureKind.Rim, 0, rim, 0, t, 0, R),
        };
        if (bore is not null) features.Add(new("bore", FeatureKind.Bore, 0, bore, 0, t, 0, 0));
        for (int j = 0; j < bolts.Count; j++)
            features.Add(new($"bolt-{j}", FeatureKind.BoltHole, j, bolts[j], 0, t, BoltAngle(rd.BoltCircle!, j), rd.BoltCircle!.CircleDiameterMm / 2));
        for (int j = 0; j < jackHoles.Length; j++)
        {
            features.Add(new($"jack-{j}", FeatureKind.JackHole, j, jackHoles[j], 0, t, jacks!.AnglesDeg[j], jacks.CircleRadiusMm));
            features.Add(new($"nut-trap-{j}", FeatureKind.NutTrap, j, traps[j], t - jacks.TrapDepthMm, t, jacks.AnglesDeg[j], jacks.CircleRadiusMm));
        }
        if (jacks is not null)
            notes.Add(FormattableString.Invariant($"{name}: press a {jacks.Thread.Size} hex nut into each of the {traps.Length} nut traps on the stator-side face; the jacking screws go in from the back and bear on the hub spacer"));
        if (notch > 0) features.Add(new("index-notch", FeatureKind.IndexNotch, 0, Contour.FullCircle(new Vec2(R, 0), notch), 0, t, 0, R));

        double pitch = d.Magnets.Shape.PitchRadiusMm;
        bool same = d.Magnets.Arrangement == MagnetArrangement.Same;
        string countHint = same ? "every magnet the same way up as pocket 0's" : "count north-up magnets from pocket 0 (even pockets on the front rotor)";
        var dots = new List<Contour>();
        for (int i = 0; i < poles; i++)
        {
            double a = DesignGeometry.PoleAngleDeg(d, i);
            // Same-pole magnets: every pocket as pocket 0 (all north-up on the front rotor, all south-up on the back).
            bool northUp = (same || i % 2 == 0) == evenNorthUp;
            features.Add(new($"pocket-{i}", FeatureKind.MagnetPocket, i, pockets[i], pocketZ0, t, a, pitch) { NorthUp = northUp });
            if (northUp && dotRadius is { } rDot)
            {
                var dot = Contour.FullCircle(Vec2.FromAngleDeg(a) * rDot, dotD / 2);
                dots.Add(dot);
                features.Add(new($"mark-{i}", FeatureKind.PolarityMark, i, dot, t - dotDepth, t, a, rDot));
            }
        }
        if (dotRadius is null && !rd.PolarityDots)
            notes.Add("no polarity dots (rotor.marks: none): mark each magnet's north pole yourself, and " + countHint);
        else if (dotRadius is null)
        {
            notes.Add("no polarity dots: there is no room beside the pockets; " + countHint);
            diags.Add(new PartDiagnostic(DiagnosticSeverity.Note, id, "no-polarity-marks", $"{name}: no room beside the pockets for polarity dots; left out"));
        }

        if (same)
            notes.Add(evenNorthUp
                ? "same-pole magnets (magnets.arrangement: same): every magnet north pole up (toward the top face), a dot beside every pocket"
                : "same-pole magnets (magnets.arrangement: same): every magnet south pole up (toward the top face), so this disc has no dots; each magnet attracts the front-rotor magnet facing it");

        var st = new PrismaticStack(t).Outer(rim);
        if (bore is not null) st.Through(bore);
        foreach (var b in bolts) st.Through(b);
        foreach (var h in jackHoles) st.Through(h);
        foreach (var p in pockets) st.Cut(p, pocketZ0, t);
        if (jacks is not null) foreach (var trap in traps) st.Cut(trap, t - jacks.TrapDepthMm, t);
        IReadOnlyList<Contour> marks = Array.Empty<Contour>();
        Profile? cutProfile = null;
        if (process == PartProcess.Cut)
        {
            marks = dots;
            var holes = new List<Contour>();
            if (bore is not null) holes.Add(bore);
            holes.AddRange(bolts);
            holes.AddRange(pockets);
            cutProfile = new Profile(new[] { rim }, holes);
        }
        else foreach (var dot in dots) st.Cut(dot, t - dotDepth, t);

        notes.Insert(0, id.Side switch
        {
            PartSide.Back => "rotor-back: magnets go in with the NORTH pole facing out of the pocket (toward the stator) in the dotted pockets (the odd ones, counting from the rim notch), south pole out in the others. Assembled with the two rim notches in line, each back magnet faces a front magnet of the opposite pole, so they attract across the stator.",
            PartSide.Front => "rotor-front: magnets go in with the NORTH pole facing out of the pocket (toward the stator) in the dotted pockets (the even ones, pocket 0 at the rim notch), south pole out in the others.",
            _ => through
                ? "rotor: magnets go in with the NORTH pole toward the dotted face in the dotted pockets (the even ones, pocket 0 at the rim notch), south pole toward it in the others."
                : "rotor: magnets go in with the NORTH pole facing out of the pocket (toward the stator) in the dotted pockets (the even ones, pocket 0 at the rim notch), south pole out in the others.",
        });
        notes.Add("Find a magnet's north pole with a marked reference magnet or a compass before pressing it in; magnets snap together hard, keep fingers clear.");

        return new PartSpec
        {
            Id = id,
            Process = process,
            Material = material,
            HeightMm = t,
            Layers = st.Build(),
            Features = features,
            Instances = new[] { Instance(stack, id, t) },
            CutProfile = cutProfile,
            Marks = marks,
            Notes = notes,
        };
    }

    /// <summary>
    /// Where the dots go: the radius of their centres, or null when there is no room. Inside the pocket's inner
    /// edge first, else outside its outer edge.
    /// </summary>
    private static double? PlaceDots(MachineModel d, double R, double notch, Contour pocket0, Contour[] pockets, Contour? bore,
        IReadOnlyList<Contour> bolts, double rDot, double wall, double pIn, double pOut)
    {
        foreach (double r in new[] { pIn - wall - rDot, pOut + wall + rDot })
        {
            if (r - rDot < (bore is null ? 0 : d.Rotor.BoreMm / 2) + wall - 1e-9) continue;
            if (r + rDot > R - wall + 1e-9) continue;
            bool ok = true;
            for (int i = 0; i < pockets.Length && ok; i++)
            {
                var c = Vec2.FromAngleDeg(DesignGeometry.PoleAngleDeg(d, i)) * r;
                foreach (var b in bolts) if (Exact2D.PointContour(c, b) < rDot + wall - 1e-9 || Inside(b, c)) ok = false;
                foreach (var p in new[] { pockets[i], pockets[(i + 1) % pockets.Length], pockets[(i + pockets.Length - 1) % pockets.Length] })
                    if (Exact2D.PointContour(c, p) < rDot + wall - 1e-9) ok = false;
                if (notch > 0 && (c - new Vec2(R, 0)).Length < notch + rDot + wall - 1e-9) ok = false;
            }
            if (ok) return r;
        }
        return null;
    }

    private static bool Inside(Contour circle, Vec2 p) => circle.Circle is { } c && (p - c.Center).Length < c.Radius;

    public static double BoltAngle(BoltPattern bc, int j) => j * 360.0 / bc.Count;

    public static IReadOnlyList<Contour> BoltHoles(BoltPattern? bc)
    {
        if (bc is null) return Array.Empty<Contour>();
        return Enumerable.Range(0, bc.Count)
            .Select(j => Contour.FullCircle(Vec2.FromAngleDeg(BoltAngle(bc, j)) * (bc.CircleDiameterMm / 2), bc.HoleMm / 2)).ToArray();
    }

    private static PartInstance Instance(AxialStack stack, PartId id, double t)
    {
        var slab = stack.Slab(SlabKind.Rotor, id);
        // The stator-side face is the part's top: a rotor with stators only on its -z side (it sits on the +z side
        // of the stationary pack) faces -z (flipped). A rotor between two stators is centred and not flipped.
        bool statorAbove = stack.OfKind(SlabKind.Stator).Any(s => s.ZMin >= slab.ZMax);
        bool statorBelow = stack.OfKind(SlabKind.Stator).Any(s => s.ZMax <= slab.ZMin);
        bool flipped = statorBelow && !statorAbove;
        double rank = Math.Sign(slab.ZMin + slab.ZMax);
        return new PartInstance(0, id, slab.ZMin, t, flipped, 0, 0, rank);
    }
}
