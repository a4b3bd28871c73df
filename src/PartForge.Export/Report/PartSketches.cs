using System.Globalization;
using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Export.Drawings;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Parts;

namespace PartForge.Export.Report;

/// <summary>
/// The dimensioned top view of each part: the geometry is the part builder's exact primitives (what is
/// printed or cut); the dimension values are the design's own numbers (what the builder measures against
/// their magnets and calipers), so a mismatch between the two would show on the drawing.
/// </summary>
public static class PartSketches
{
    private static readonly FeatureKind[] CutKinds =
    [
        FeatureKind.Bore, FeatureKind.BoltHole, FeatureKind.MountHole, FeatureKind.MagnetPocket, FeatureKind.CoilSeat,
        FeatureKind.SensorPocket, FeatureKind.SensorLeadHole, FeatureKind.WireChannel, FeatureKind.Collector,
        FeatureKind.TerminalExit, FeatureKind.LeadSlot, FeatureKind.SpindleHole,
    ];

    public static PartSketch For(MachineModel d, PartModel p)
    {
        var (outline, blind, marks) = Geometry(p);
        var o = new Vec2(0, 0);
        var dias = new List<DiameterDimension>();
        var notes = new List<PatternNote>();
        var poles = new List<PoleMark>();
        var linear = new List<LinearDimension>();
        string title = p.Name;

        if (p.Role == PartRole.Rotor)
        {
            var r = d.Rotor;
            dias.Add(new("outer_diameter", o, r.OuterDiameterMm, 35, $"D{F(r.OuterDiameterMm)}"));
            if (r.BoreMm > 0) dias.Add(new("bore", o, r.BoreMm, 145, $"D{F(r.BoreMm)} bore"));
            var shape = d.Magnets.Shape;
            double pr = shape.PitchRadiusMm;
            dias.Add(new("pitch_circle", o, 2 * pr, 205, $"PCD {F(2 * pr)} magnets", DrawCircle: true));
            var pocket0 = p.FeaturesOf(FeatureKind.MagnetPocket).FirstOrDefault();
            double c = r.PocketClearanceMm;
            // The note's leader ends on pocket 0's outer edge, clear of the pole badge at its centre.
            var target = pocket0 is null ? o : Vec2.FromAngleDeg(pocket0.AngleDeg) * shape.RadialRangeMm(c).Max;
            double depth = d.ThroughPockets ? r.ThicknessMm : r.ThicknessMm - r.PocketFloorMm;
            string kind = d.ThroughPockets ? "through" : $"{F(depth)} deep";
            var sizes = shape.PocketSizes(c);
            var note = new PatternNote("pocket_count", d.Poles, sizes[0].Id, sizes[0].Mm, target, -28,
                $"{d.Poles} x {shape.PocketText(c)} pockets, {kind}");
            if (sizes.Count > 1) note = note with { Size2Id = sizes[1].Id, Size2 = sizes[1].Mm };
            notes.Add(note);
            if (r.BoltCircle is { } bc) AddBoltCircle(p, dias, notes, "bolt", bc.CircleDiameterMm, bc.Count, bc.HoleMm, FeatureKind.BoltHole, 250);
            double badge = Math.Max(1.5, Math.Min(shape.RadialLengthMm, shape.TangentialWidthMm) * 0.55);
            foreach (var f in p.FeaturesOf(FeatureKind.MagnetPocket))
                if (f.NorthUp is { } n) poles.Add(new PoleMark(f.Position, n, badge));
            title = $"{p.Name}: {d.Poles} pockets, {p.Material.Name}, {F(p.HeightMm)} thick (badges: pole facing the pocket opening)";
        }
        else if (p.Role == PartRole.BackIron)
        {
            var r = d.Rotor;
            dias.Add(new("outer_diameter", o, Extent(outline) * 1, 35, $"D{F(Extent(outline))}"));
            var bore = p.FeaturesOf(FeatureKind.Bore).FirstOrDefault();
            if (bore?.Contour.Circle is { } bc0) dias.Add(new("bore", o, 2 * bc0.Radius, 145, $"D{F(2 * bc0.Radius)} bore"));
            if (r.BoltCircle is { } bc && p.FeaturesOf(FeatureKind.BoltHole).Any())
                AddBoltCircle(p, dias, notes, "bolt", bc.CircleDiameterMm, bc.Count, bc.HoleMm, FeatureKind.BoltHole, 250);
            title = $"{p.Name}: {p.Material.Name} disc {F(p.HeightMm)} thick, one behind each rotor";
        }
        else if (p.Role == PartRole.Stator)
        {
            var s = d.Stator;
            dias.Add(new("outer_diameter", o, s.OuterDiameterMm, 35, $"D{F(s.OuterDiameterMm)}"));
            if (s.InnerDiameterMm > 0) dias.Add(new("inner_diameter", o, s.InnerDiameterMm, 145, $"D{F(s.InnerDiameterMm)}"));
            double coilPitch = d.Coils.PitchRadiusMm;
            if (coilPitch > 0) dias.Add(new("coil_pitch_circle", o, 2 * coilPitch, 205, $"PCD {F(2 * coilPitch)} coils", DrawCircle: true));
            var seat0 = p.FeaturesOf(FeatureKind.CoilSeat).FirstOrDefault();
            if (seat0 != null)
                notes.Add(new PatternNote("seat_count", d.CoilsPerStator, "seat_pitch_radius", coilPitch, seat0.Position, -28, $"{d.CoilsPerStator} coil seats"));
            if (s.Mount is { } mt) AddBoltCircle(p, dias, notes, "mount", mt.CircleDiameterMm, mt.Count, mt.HoleMm, FeatureKind.MountHole, 250);
            int sensors = p.FeaturesOf(FeatureKind.SensorPocket).Count();
            title = $"{p.Name}: ring {F(p.HeightMm)} thick, {d.CoilsPerStator} seats{(sensors > 0 ? $", {sensors} sensor pocket{(sensors > 1 ? "s" : "")}" : "")}, {p.Material.Name}";
        }
        else if (p.Role == PartRole.Former)
        {
            var flange = p.FeaturesOf(FeatureKind.Flange).FirstOrDefault()?.Contour;
            var centre = flange?.Circle?.Center ?? Centre(outline);
            if (flange?.Circle is { } fc) dias.Add(new("flange_diameter", fc.Center, 2 * fc.Radius, 35, $"D{F(2 * fc.Radius)} flange"));
            if (d.Coils.Shape == CoilShape.Round && d.Coils.CoreDiameterMm is { } core)
                dias.Add(new("core_diameter", centre, core, 145, $"D{F(core)} core"));
            var (lo, hi) = RadialExtent(outline);
            if (d.Coils.Shape != CoilShape.Round)
                linear.Add(new LinearDimension("radial_length", new Vec2(lo, centre.Y), new Vec2(hi, centre.Y), -(Extent(outline) * 0.62), hi - lo, $"{F(hi - lo)} radial"));
            title = $"{p.Name}: one per coil, {p.Quantity} in all, {F(p.HeightMm)} high, {p.Material.Name}";
        }
        else
        {
            // Spacer and any further ring: its outer and inner circles.
            dias.Add(new("outer_diameter", o, Extent(outline), 35, $"D{F(Extent(outline))}"));
            var inner = outline.Holes.Select(h => h.Circle).FirstOrDefault(c => c is { } cc && cc.Center.Length < 1e-9);
            if (inner is { } ic) dias.Add(new("inner_diameter", o, 2 * ic.Radius, 145, $"D{F(2 * ic.Radius)}"));
            title = $"{p.Name}: {F(p.HeightMm)} thick, {p.Material.Name}, quantity {p.Quantity}";
        }

        return new PartSketch
        {
            PartName = p.Name, Title = title, Outline = outline, Blind = blind, Marks = marks,
            Diameters = dias, Notes = notes, Poles = poles, Linear = linear,
        };
    }

    private static void AddBoltCircle(PartModel p, List<DiameterDimension> dias, List<PatternNote> notes, string prefix,
        double circle, int count, double hole, FeatureKind kind, double angle)
    {
        dias.Add(new($"{prefix}_circle", new Vec2(0, 0), circle, angle, $"{prefix} circle D{F(circle)}", DrawCircle: true));
        var h0 = p.FeaturesOf(kind).FirstOrDefault();
        var target = h0?.Position ?? Vec2.FromAngleDeg(0) * (circle / 2);
        notes.Add(new PatternNote($"{prefix}_count", count, $"{prefix}_hole", hole, target, angle + 60, $"{count} x D{F(hole)} holes"));
    }

    /// <summary>Top-view geometry: body (outer and through holes), blind cuts, engraved marks.</summary>
    public static (Profile Outline, IReadOnlyList<Contour> Blind, IReadOnlyList<Contour> Marks) Geometry(PartModel p)
    {
        if (p.CutProfile is { } cut) return (cut, [], p.Marks);
        // The widest layer gives the outer boundary (a former's flange, a ring's rim).
        var layer = p.ExactLayers.OrderByDescending(l => l.Outers.Sum(c => Extent(Profile.Of(c)))).First();
        var rim = p.FeaturesOf(FeatureKind.Rim).FirstOrDefault()?.Contour;
        var outers = rim != null ? new[] { rim } : layer.Outers.ToArray();
        const double eps = 1e-6;
        bool Through(PartFeature f) => f.Z0Mm <= eps && f.Z1Mm >= p.HeightMm - eps;
        var cuts = p.Features.Where(f => CutKinds.Contains(f.Kind)).ToList();
        var holes = cuts.Where(Through).Select(f => f.Contour).ToArray();
        var blind = cuts.Where(f => !Through(f)).Select(f => f.Contour).ToList();
        var marks = p.Features.Where(f => f.Kind is FeatureKind.PolarityMark or FeatureKind.WindingOutline or FeatureKind.WindingWindow)
            .Select(f => f.Contour).Concat(p.Marks).ToList();
        return (new Profile(outers, holes), blind, marks);
    }

    private static IEnumerable<Vec2> Points(Contour c)
    {
        if (c.Circle is { } ci)
        {
            for (int i = 0; i < 64; i++) yield return ci.Center + Vec2.FromAngleDeg(i * 360.0 / 64) * ci.Radius;
            yield break;
        }
        foreach (var s in c.Segments)
        {
            yield return s.Start;
            if (s is ArcSegment a)
                for (int i = 1; i < 16; i++) yield return a.Center + Vec2.FromAngleDeg(a.StartDeg + a.SweepDeg * i / 16) * a.Radius;
        }
    }

    /// <summary>Largest extent (diameter of a centred disc) of a profile's outers.</summary>
    private static double Extent(Profile p)
    {
        var pts = p.Outers.SelectMany(Points).ToList();
        if (pts.Count == 0) return 0;
        return Math.Max(pts.Max(q => q.X) - pts.Min(q => q.X), pts.Max(q => q.Y) - pts.Min(q => q.Y));
    }

    private static Vec2 Centre(Profile p)
    {
        var pts = p.Outers.SelectMany(Points).ToList();
        return pts.Count == 0 ? new Vec2(0, 0) : new Vec2((pts.Max(q => q.X) + pts.Min(q => q.X)) / 2, (pts.Max(q => q.Y) + pts.Min(q => q.Y)) / 2);
    }

    private static (double Lo, double Hi) RadialExtent(Profile p)
    {
        var pts = p.Outers.SelectMany(Points).ToList();
        return pts.Count == 0 ? (0, 0) : (pts.Min(q => q.X), pts.Max(q => q.X));
    }

    private static string F(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);
}
