using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Geometry.Exact;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Solids;
using PartForge.Parts.Shapes;

namespace PartForge.Parts.Formers;

/// <summary>
/// The coil former (bobbin) for one coil. Geometry decisions:
/// <list type="bullet">
/// <item>Part-local frame: the coil's own frame moved to the origin (coil centre at (0, 0), +x radially outward
/// in the machine), z = 0 the bottom of the lower flange. Three layers: lower flange [0, f], core [f, f + h],
/// upper flange [f + h, 2f + h] with f = <c>former.flange</c> and h = <c>coils.height</c>.</item>
/// <item>Core = the coil's winding window from the electrical engine, exactly; the winding window between the
/// flanges is therefore the coil's window and height.</item>
/// <item>Flange footprint = the winding outline offset outward by <c>former.margin</c> (exact offset: lines
/// parallel, arcs concentric, convex corners rounded), then keyed: a straight flat cut across it, square to the
/// direction 135 degrees in the coil frame (toward the machine axis and +y), max(0.5, min(1.0, 0.6 x margin)) mm deep
/// at its deepest. The flat is off both axes, so the footprint has no mirror symmetry: the former goes into its
/// seat (which has the same flat) only one way round and only the right way up.</item>
/// <item>Start-lead slot: through the upper flange along +x, from the core surface to the flange edge, width
/// max(1.0, 2 x overall wire diameter). The upper flange is on the stator's grooved face, where the slot leads
/// into the wire channel.</item>
/// <item>Printed in two pieces, so that no surface overhangs (the upper flange of a one-piece former overhangs the
/// core by the winding's radial build plus the margin and needs support): <c>former-base</c>, the lower flange, the
/// core and the core carried on through the upper flange's height (printed flange down, every layer inside the one
/// below), and <c>former-cap</c>, the upper flange as a flat ring with the lead slot whose hole is the core grown by
/// the seat's slip fit (<see cref="DesignGeometry.SeatClearanceMm"/>), pushed over the core's top and glued.
/// Assembled they are the former (less the slip-fit gap round the core's top).</item>
/// <item>Spindle hole: a round through hole at the coil centre for a winding spindle, leaving a core wall of
/// max(1.2, 3 x nozzle); left out when its diameter would be under 2 mm.</item>
/// </list>
/// </summary>
internal static class FormerBuilder
{
    public const double KeyDirectionDeg = 135;

    /// <summary>The keyed flange footprint in the former's local frame (what the stator seat is grown from).</summary>
    public static Contour Footprint(MachineModel d, CoilGeometry coil)
    {
        var outline = coil.WindingOutline.Translated(new Vec2(-coil.PitchRadiusMm, 0));
        double m = d.Former.MarginMm;
        var flange = m > 0 ? ContourOffset.Offset(outline, m) : outline;
        var u = Vec2.FromAngleDeg(KeyDirectionDeg);
        double depth = Math.Max(0.5, Math.Min(1.0, 0.6 * m));
        double h = Exact2D.Support(flange, u) - depth;
        return Exact2D.ClipConvex(flange, u, h);
    }

    public static PartSpec Build(MachineModel d, CoilGeometry coil, List<PartDiagnostic> diags)
    {
        double f = d.Former.FlangeMm, h = d.Coils.HeightMm, H = 2 * f + h;
        var shift = new Vec2(-coil.PitchRadiusMm, 0);
        var window = coil.WindingWindow.Translated(shift);
        var outline = coil.WindingOutline.Translated(shift);
        var footprint = Footprint(d, coil);
        var o = new Vec2(0, 0);
        var notes = new List<string>();

        double wallSp = Math.Max(1.2, 3 * d.Process.NozzleMm);
        double rSp = ContainsOrigin(window) ? Exact2D.PointContour(o, window) - wallSp : 0;
        Contour? spindle = rSp >= 1.0 ? Contour.FullCircle(o, rSp) : null;
        if (spindle is null) notes.Add("no spindle hole: the core is too small for one");

        double xCore = Exact2D.RayExit(window, o, new Vec2(1, 0));
        if (double.IsNaN(xCore)) xCore = Exact2D.Support(window, new Vec2(1, 0));
        double xEdge = Exact2D.Support(footprint, new Vec2(1, 0));
        double slotW = Math.Max(1.0, 2 * coil.WireOverallMm);
        double x1 = xEdge + 1.0; // past the edge so the slot opens cleanly
        var slot = Contour.Rectangle(new Vec2((xCore + x1) / 2, 0), x1 - xCore, slotW, 0);

        var spin = spindle is null ? Array.Empty<Contour>() : new[] { spindle };
        var layers = new List<ExactLayer>
        {
            new(0, f, new[] { footprint }, spin),
            new(f, f + h, new[] { window }, spin),
            new(f + h, H, new[] { footprint }, spin.Append(slot).ToArray()),
        };
        // The two print pieces (see the remarks): the base, and the cap in its own frame (z = 0 at its bottom face).
        var capHole = ContourOffset.Offset(window, DesignGeometry.SeatClearanceMm(d));
        var pieces = new (string, IReadOnlyList<ExactLayer>, double)[]
        {
            ("base", new List<ExactLayer>
            {
                new(0, f, new[] { footprint }, spin),
                new(f, H, new[] { window }, spin),
            }, H),
            ("cap", new List<ExactLayer> { new(0, f, new[] { footprint }, new[] { capHole, slot }) }, f),
        };
        var features = new List<PartFeature>
        {
            new("flange-lower", FeatureKind.Flange, 0, footprint, 0, f, 0, 0),
            new("core", FeatureKind.Core, 0, window, f, f + h, 0, 0),
            new("flange-upper", FeatureKind.Flange, 1, footprint, f + h, H, 0, 0),
            new("lead-slot", FeatureKind.LeadSlot, 0, slot, f + h, H, 0, (xCore + xEdge) / 2),
            new("winding-window", FeatureKind.WindingWindow, 0, window, f, f + h, 0, 0),
            new("winding-outline", FeatureKind.WindingOutline, 0, outline, f, f + h, 0, 0),
        };
        if (spindle is not null) features.Add(new("spindle-hole", FeatureKind.SpindleHole, 0, spindle, 0, H, 0, 0));

        var (process, material) = ProcessChoice.Resolve(PartId.Former, d.Parts.For(PartRole.Former), false,
            "a former is a bobbin of three layers (flange, core, flange)", diags);
        notes.Insert(0, $"former: wind {coil.Turns} turns between the flanges, start lead out through the slot in the upper flange (the flange with the slot faces the stator's grooved side); the flat on the flanges matches the flat in the seat.");
        notes.Insert(1, "former: printed in two pieces without supports, former-base (lower flange and core, flange down) and former-cap (the upper flange, a flat ring with the lead slot); push the cap over the top of the core with its flat in line with the base's, glue it, then wind.");
        return new PartSpec
        {
            Id = PartId.Former,
            Process = process,
            Material = material,
            HeightMm = H,
            Layers = layers,
            Features = features,
            Instances = Array.Empty<PartInstance>(), // placed by PartsBuilder with the stators
            Notes = notes,
            Pieces = pieces,
        };
    }

    private static bool ContainsOrigin(Contour c)
    {
        if (c.Circle is { } circle) return circle.Center.Length < circle.Radius;
        // Winding number by the chord polygon plus arc bulges is overkill here: the window is convex and
        // surrounds its centre for every coil shape the engine makes; test the ray crossing count.
        var o = new Vec2(0, 0);
        int crossings = 0;
        foreach (var s in c.Segments)
        {
            var pts = s is ArcSegment a ? Sample(a) : new[] { s.Start, s.End };
            for (int i = 0; i + 1 < pts.Length; i++)
            {
                var (p, q) = (pts[i], pts[i + 1]);
                if ((p.Y > o.Y) != (q.Y > o.Y) && o.X < p.X + (o.Y - p.Y) * (q.X - p.X) / (q.Y - p.Y)) crossings++;
            }
        }
        return crossings % 2 == 1;
    }

    private static Vec2[] Sample(ArcSegment a)
    {
        int n = Math.Max(2, (int)Math.Ceiling(Math.Abs(a.SweepDeg) / 2));
        return Enumerable.Range(0, n + 1).Select(i => a.Center + Vec2.FromAngleDeg(a.StartDeg + a.SweepDeg * i / n) * a.Radius).ToArray();
    }
}
