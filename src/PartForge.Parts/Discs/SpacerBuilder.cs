using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Design.Stack;
using PartForge.Geometry.Exact;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Solids;
using PartForge.Parts.Rotors;
using PartForge.Parts.Shapes;
using PartForge.Parts.Stators;

namespace PartForge.Parts.Discs;

/// <summary>
/// The spacer that sets the nominal air gap, one per layout (its role: <see cref="Layout.SpacerRole"/>), its
/// thickness taken from the AxialStack slabs:
/// <list type="bullet">
/// <item>dual-rotor, hub spacer: a ring clamped between the two rotors' inner (stator-side) faces, through the
/// stator's bore; thickness = the distance between those faces. Bore = the rotor bore; the rotor bolt circle
/// passes through it; outer diameter = bolt circle + 3 x hole (an edge distance of 1.5 hole diameters from each
/// hole centre, common practice for bolted plates, from memory), at most the stator bore less 1 mm radial
/// clearance each side (without a bolt circle: max(2 x bore, bore + 10) under the same cap). It turns with the rotors.</item>
/// <item>single-rotor, gap gauge: a fork-shaped shim (an annulus with a slot as wide as its inner circle) laid on
/// the stator ring's face around the shaft while the rotor is fixed, then pulled out sideways; thickness = the
/// distance from the ring's face to the rotor's face. Inner radius = bore / 2 + 0.5; outer radius 1 mm inside the
/// nearer of the magnet pockets and the coil seats.</item>
/// <item>dual-stator, rim spacer: a ring between the two stator rings' inner faces outside the rotor, bolted with
/// the stators' mount holes; thickness = the distance between those faces; inner radius = rotor radius + 2 mm
/// (radial running clearance, our choice), outer = the stator's outer radius.</item>
/// </list>
/// Cut from sheet by default (acrylic).
/// </summary>
internal static class SpacerBuilder
{
    public const double StatorBoreClearanceMm = 1.0;
    public const double RotorRimClearanceMm = 2.0;

    public static PartSpec? Build(MachineModel d, AxialStack stack, CoilGeometry coil, Contour seatInCoilFrame, List<PartDiagnostic> diags)
    {
        return d.Layout.SpacerRole switch
        {
            PartRole.HubSpacer => Hub(d, stack, diags),
            PartRole.GapGauge => Gauge(d, stack, coil, seatInCoilFrame, diags),
            PartRole.RimSpacer => RimRing(d, stack, coil, diags),
            _ => null,
        };
    }

    private static PartSpec? Hub(MachineModel d, AxialStack stack, List<PartDiagnostic> diags)
    {
        var id = PartId.HubSpacer;
        var front = stack.Slab(SlabKind.Rotor, d.Layout.Rotors[0]);
        var back = stack.Slab(SlabKind.Rotor, d.Layout.Rotors[1]);
        double t = front.ZMin - back.ZMax;
        double cap = d.Stator.InnerDiameterMm / 2 - StatorBoreClearanceMm;
        double bore = d.Rotor.BoreMm;
        double want = d.Rotor.BoltCircle is { } bc ? (bc.CircleDiameterMm + 3 * bc.HoleMm) / 2 : Math.Max(2 * bore, bore + 10) / 2;
        double R = Math.Min(want, cap);
        if (d.Rotor.BoltCircle is { } b2 && R < b2.CircleDiameterMm / 2 + b2.HoleMm / 2 + DesignGeometry.MinWallMm(d))
        {
            R = want;
            diags.Add(new PartDiagnostic(DiagnosticSeverity.Note, id, "spacer-too-big",
                FormattableString.Invariant($"{id.Name}: the hub spacer needs a {2 * want:0.###} mm outer diameter for the rotor bolt circle but the stator bore is {d.Stator.InnerDiameterMm:0.###} mm; raise stator.inner_diameter to at least {2 * (want + StatorBoreClearanceMm):0.###}")));
        }
        if (!(R > bore / 2 + 0.5))
        {
            diags.Add(new PartDiagnostic(DiagnosticSeverity.Note, id, "no-spacer", $"{id.Name}: the stator bore leaves no room for a hub spacer around the rotor bore; none made"));
            return null;
        }
        var o = new Vec2(0, 0);
        var rim = Contour.FullCircle(o, R);
        var holes = new List<Contour>();
        var features = new List<PartFeature> { new("rim", FeatureKind.Rim, 0, rim, 0, t, 0, R) };
        if (bore > 0)
        {
            var b = Contour.FullCircle(o, bore / 2);
            holes.Add(b);
            features.Add(new("bore", FeatureKind.Bore, 0, b, 0, t, 0, 0));
        }
        var bolts = RotorBuilder.BoltHoles(d.Rotor.BoltCircle);
        for (int j = 0; j < bolts.Count; j++)
        {
            holes.Add(bolts[j]);
            features.Add(new($"bolt-{j}", FeatureKind.BoltHole, j, bolts[j], 0, t, RotorBuilder.BoltAngle(d.Rotor.BoltCircle!, j), d.Rotor.BoltCircle!.CircleDiameterMm / 2));
        }
        return Sheet(d, id, "hub spacer between the two rotors' inner faces; it sets the air gap on both sides (turns with the rotors)",
            t, rim, holes, features, new PartInstance(0, id, back.ZMax, t, false, 0, 0, 0), diags);
    }

    private static PartSpec? Gauge(MachineModel d, AxialStack stack, CoilGeometry coil, Contour seatInCoilFrame, List<PartDiagnostic> diags)
    {
        var id = PartId.GapGauge;
        var rotor = stack.Slab(SlabKind.Rotor, d.Layout.Rotors[0]);
        var ring = stack.Slab(SlabKind.Stator, d.Layout.Stators[0]);
        double t = rotor.ZMin - ring.ZMax;
        double ri = Math.Max(d.Rotor.BoreMm / 2 + 0.5, 1.0);
        var (pIn, _) = Exact2D.RadialExtent(DesignGeometry.PocketOutline(d));
        var (seatIn, _) = Exact2D.RadialExtent(seatInCoilFrame.Translated(new Vec2(coil.PitchRadiusMm, 0)));
        double ro = Math.Min(pIn, seatIn) - 1.0;
        if (!(t > 0) || ro - ri < 2.0 || ro < d.Stator.InnerDiameterMm / 2 + 1.0)
        {
            diags.Add(new PartDiagnostic(DiagnosticSeverity.Note, id, "no-spacer",
                $"{id.Name}: no room for a gap gauge between the shaft and the magnets/coils; set the air gap with feeler gauges"));
            return null;
        }
        var rim = Fork(ri, ro);
        var features = new List<PartFeature> { new("rim", FeatureKind.Rim, 0, rim, 0, t, 0, ro) };
        return Sheet(d, id, "gap gauge: lay it on the stator ring's face around the shaft, lower the rotor onto it, fix the rotor, then slide the gauge out through its slot",
            t, rim, new List<Contour>(), features, new PartInstance(0, id, ring.ZMax, t, false, 0, 0, 0.5), diags);
    }

    /// <summary>An annulus ri..ro with a slot of width 2 ri open toward +x (the inner circle's far half closes it).</summary>
    public static Contour Fork(double ri, double ro)
    {
        var o = new Vec2(0, 0);
        double alpha = Math.Asin(ri / ro) * 180.0 / Math.PI;
        var outer = new ArcSegment(o, ro, alpha, 360 - 2 * alpha);
        double xo = Math.Sqrt(ro * ro - ri * ri);
        return Contour.FromSegments(new Segment[]
        {
            outer,
            new LineSegment(new Vec2(xo, -ri), new Vec2(0, -ri)),
            new ArcSegment(o, ri, 270, -180),
            new LineSegment(new Vec2(0, ri), new Vec2(xo, ri)),
        });
    }

    private static PartSpec? RimRing(MachineModel d, AxialStack stack, CoilGeometry coil, List<PartDiagnostic> diags)
    {
        var id = PartId.RimSpacer;
        var front = stack.Slab(SlabKind.Stator, d.Layout.Stators[0]);
        var back = stack.Slab(SlabKind.Stator, d.Layout.Stators[1]);
        double t = front.ZMin - back.ZMax;
        double ri = d.Rotor.OuterDiameterMm / 2 + RotorRimClearanceMm, ro = d.Stator.OuterDiameterMm / 2;
        if (ro - ri < 2.0)
        {
            diags.Add(new PartDiagnostic(DiagnosticSeverity.Note, id, "no-spacer",
                $"{id.Name}: the stator rings do not reach past the rotor rim; no rim spacer (set the stator spacing on the mount bolts)"));
            return null;
        }
        var o = new Vec2(0, 0);
        var rim = Contour.FullCircle(o, ro);
        var inner = Contour.FullCircle(o, ri);
        var holes = new List<Contour> { inner };
        var features = new List<PartFeature> { new("rim", FeatureKind.Rim, 0, rim, 0, t, 0, ro), new("bore", FeatureKind.Bore, 0, inner, 0, t, 0, 0) };
        if (d.Stator.Mount is { } m)
        {
            double rm = m.CircleDiameterMm / 2, wall = DesignGeometry.MinWallMm(d);
            if (rm - m.HoleMm / 2 >= ri + wall && rm + m.HoleMm / 2 <= ro - wall)
            {
                double off = StatorLayout.MountOffsetDeg(d, coil.SensorAnglesDeg);
                for (int j = 0; j < m.Count; j++)
                {
                    double a = StatorLayout.MountAngleDeg(d, off, j);
                    var h = Contour.FullCircle(Vec2.FromAngleDeg(a) * rm, m.HoleMm / 2);
                    holes.Add(h);
                    features.Add(new($"mount-{j}", FeatureKind.MountHole, j, h, 0, t, a, rm));
                }
            }
            else diags.Add(new PartDiagnostic(DiagnosticSeverity.Note, id, "spacer-no-mount-holes",
                $"{id.Name}: the stator mount holes do not lie on the rim spacer (outside the rotor); it has no bolt holes"));
        }
        return Sheet(d, id, "rim spacer between the two stator rings' inner faces, outside the rotor; bolt it with the stators' mount holes",
            t, rim, holes, features, new PartInstance(0, id, back.ZMax, t, false, 0, 0, 0), diags);
    }

    private static PartSpec Sheet(MachineModel d, PartId id, string what, double t, Contour rim, List<Contour> holes, List<PartFeature> features,
        PartInstance instance, List<PartDiagnostic> diags)
    {
        var (process, material) = ProcessChoice.Resolve(id, d.Parts.For(id.Role), true, "", diags);
        return new PartSpec
        {
            Id = id,
            Process = process,
            Material = material,
            HeightMm = t,
            Layers = new[] { new ExactLayer(0, t, new[] { rim }, holes) },
            Features = features,
            Instances = new[] { instance },
            CutProfile = process == PartProcess.Cut ? new Profile(new[] { rim }, holes) : null,
            Notes = new[] { FormattableString.Invariant($"{id.Name} ({t:0.###} mm): {what}. Cut it from {t:0.###} mm sheet, or from thinner sheet and shim to this thickness.") },
        };
    }
}
