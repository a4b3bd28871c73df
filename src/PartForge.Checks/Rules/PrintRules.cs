using PartForge.Checks.Inputs;
using PartForge.Design.Machines;
using PartForge.Design.Machines.Magnets;
using PartForge.Design.Parts;
using PartForge.Geometry.Exact;
using PartForge.Geometry.Profiles;
using PartForge.Parts;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>
/// Printability and fit, from the parts' exact features (true circles, arcs and lines): pocket-web,
/// pocket-rim-wall, pocket-bore-wall, pocket-bolt-wall, pocket-floor, seat-wall, bolt-edge-distance,
/// sensor-seat-clearance, coil-coil-clearance. Each wall is the exact distance between the two boundaries.
/// </summary>
internal static class PrintRules
{
    /// <summary>Fewest print layers under a blind pocket (common practice from memory: slicers default to 3-4 solid bottom layers).</summary>
    public const int MinFloorLayers = 4;

    public static IEnumerable<CheckResult> Run(CheckContext c)
    {
        foreach (var rotor in c.RotorIds)
        {
            if (c.Part(rotor) is not { } pv) continue;
            foreach (var r in Pockets(c, pv)) yield return r;
        }
        foreach (var pv in c.Parts)
        {
            foreach (var r in BoltEdges(c, pv)) yield return r;
            if (pv.OfKind(FeatureKind.CoilSeat).Any())
            {
                foreach (var r in Seats(c, pv)) yield return r;
            }
        }
        yield return CoilCoil(c);
    }

    private readonly record struct Pair(double Mm, PartFeature A, PartFeature B);

    private static Pair? MinPair(IEnumerable<PartFeature> a, IEnumerable<PartFeature> b, bool filled)
    {
        Pair? best = null;
        var bl = b.ToList();
        foreach (var x in a)
        {
            var bx = Box2.Of(x.Contour);
            foreach (var y in bl)
            {
                if (ReferenceEquals(x, y)) continue;
                if (best is { } cur && bx.DistanceTo(Box2.Of(y.Contour)) >= cur.Mm) continue;
                double d = filled ? Exact2D.ShapeShape(new Shape2D(x.Contour), new Shape2D(y.Contour)) : Exact2D.ContourContour(x.Contour, y.Contour);
                if (best is null || d < best.Value.Mm) best = new Pair(d, x, y);
            }
        }
        return best;
    }

    private static CheckResult Wall(string id, PartId part, Pair p, double limit, string what, string fix, string basis)
    {
        var (status, margin) = AtLeast(p.Mm, limit, MinBand(limit));
        string msg = $"{part.Name}: {what} {F(p.Mm)} mm between {p.A.Name} and {p.B.Name}, at least {F(limit)} mm needed";
        if (status != CheckStatus.Pass) msg += "; " + fix;
        return new CheckResult
        {
            Id = id, Part = part, Status = status, Value = p.Mm, Limit = limit, Unit = "mm", Margin = margin, Message = msg,
            Where = new CheckLocation($"{p.A.Name} / {p.B.Name}", p.A.AngleDeg), Basis = basis,
        };
    }

    private static double Shortfall(double value, double limit) => limit + MinBand(limit) - value;

    private static IEnumerable<CheckResult> Pockets(CheckContext c, PartView pv)
    {
        var pockets = pv.OfKind(FeatureKind.MagnetPocket).OrderBy(p => p.Index).ToList();
        if (pockets.Count == 0) yield break;
        double wall = c.PocketWall(pv.Id);
        string basis = "exact distance between the pocket and feature boundaries; wall = min_wall_lines x nozzle, 3 lines around press fits (common practice)";
        int n = pockets.Count;
        if (n > 1)
        {
            Pair? web = null;
            for (int i = 0; i < n; i++)
            {
                var a = pockets[i];
                var b = pockets[(i + 1) % n];
                double d = Exact2D.ShapeShape(new Shape2D(a.Contour), new Shape2D(b.Contour));
                if (web is null || d < web.Value.Mm) web = new Pair(d, a, b);
            }
            double s = Shortfall(web!.Value.Mm, wall);
            double pitchR = c.Magnet.PitchRadiusMm;
            double sinHalf = Math.Sin(Math.PI / n);
            string fix = c.Magnet is ArcMagnet arc
                ? $"lower magnets.span by {F(s / Math.Max(1e-9, arc.InnerRadiusMm) * 180 / Math.PI)} degrees or raise the radii"
                : $"raise magnets.pitch_radius to {Up(pitchR + s / (2 * sinHalf))} or use smaller magnets";
            yield return Wall(CheckIds.PocketWeb, pv.Id, web.Value, wall, "web", fix, basis);
        }
        if (pv.OfKind(FeatureKind.Rim).ToList() is { Count: > 0 } rims && MinPair(pockets, rims, false) is { } rim)
        {
            double s = Shortfall(rim.Mm, wall);
            yield return Wall(CheckIds.PocketRimWall, pv.Id, rim, wall, "rim wall",
                $"raise rotor.outer_diameter to {Up(c.D.Rotor.OuterDiameterMm + 2 * s)} or lower magnets.pitch_radius to {Down(c.Magnet.PitchRadiusMm - s)}", basis);
        }
        if (pv.OfKind(FeatureKind.Bore).ToList() is { Count: > 0 } bores && MinPair(pockets, bores, false) is { } bore)
        {
            double s = Shortfall(bore.Mm, wall);
            yield return Wall(CheckIds.PocketBoreWall, pv.Id, bore, wall, "bore wall",
                $"lower rotor.bore to {Down(Math.Max(0, c.D.Rotor.BoreMm - 2 * s))} or raise magnets.pitch_radius by {Up(s)}", basis);
        }
        if (pv.OfKind(FeatureKind.BoltHole).ToList() is { Count: > 0 } bolts && MinPair(pockets, bolts, true) is { } bolt)
        {
            double s = Shortfall(bolt.Mm, wall);
            string fix = c.D.Rotor.BoltCircle is { } bc
                ? $"lower rotor.bolt_circle.diameter to {Down(bc.CircleDiameterMm - 2 * s)} or rotor.bolt_circle.hole to {Down(Math.Max(0, bc.HoleMm - 2 * s))}"
                : "move the bolt holes away from the pockets";
            yield return Wall(CheckIds.PocketBoltWall, pv.Id, bolt, wall, "wall to a bolt hole", fix, basis);
        }
        if (!c.D.ThroughPockets && pv.Process == PartProcess.Print)
        {
            double floor = c.D.Rotor.PocketFloorMm;
            double limit = Math.Max(c.D.Process.MinWallLines * c.D.Process.NozzleMm, MinFloorLayers * c.D.Process.LayerMm);
            var (status, margin) = AtLeast(floor, limit, MinBand(limit));
            string msg = $"{pv.Name}: pocket floor {F(floor)} mm = {F(floor / c.D.Process.LayerMm)} layers of {F(c.D.Process.LayerMm)} mm; at least {F(limit)} mm ({MinFloorLayers} layers, {c.D.Process.MinWallLines} x {F(c.D.Process.NozzleMm)} mm)";
            if (status != CheckStatus.Pass)
            {
                double need = limit + MinBand(limit);
                msg += $"; raise rotor.pocket_floor to {Up(need)} and rotor.thickness to {Up(c.D.Rotor.ThicknessMm + need - floor)} to keep the pocket depth";
            }
            yield return new CheckResult
            {
                Id = CheckIds.PocketFloor, Part = pv.Id, Status = status, Value = floor, Limit = limit, Unit = "mm", Margin = margin, Message = msg,
                Where = new CheckLocation("pocket floors"), Basis = "min_wall_lines x nozzle and a minimum layer count (common practice)",
            };
        }
    }

    private static IEnumerable<CheckResult> BoltEdges(CheckContext c, PartView pv)
    {
        var holes = pv.Features.Where(f => f.Kind is FeatureKind.BoltHole or FeatureKind.MountHole).ToList();
        if (holes.Count == 0) yield break;
        var edges = pv.Features.Where(f => f.Kind is FeatureKind.Rim or FeatureKind.Bore).ToList();
        if (edges.Count == 0) yield break;
        if (MinPair(holes, edges, false) is not { } p) yield break;
        double dia = Box2.Of(p.A.Contour).Width;
        // A screw hole is a loaded fit: printed, at least 3 lines (docs/physics.md §8, practice: "3+ around
        // press fits"); cut from sheet, at least half the hole diameter (edge distance from the centre of one
        // diameter; common practice from memory).
        double wall = pv.Process == PartProcess.Print
            ? Math.Max(c.MinWall(pv.Id), 3 * c.D.Process.NozzleMm)
            : Math.Max(c.MinWall(pv.Id), 0.5 * dia);
        double s = Shortfall(p.Mm, wall);
        bool mount = p.A.Kind == FeatureKind.MountHole;
        bool toRim = p.B.Kind == FeatureKind.Rim;
        string fix = mount
            ? (toRim ? $"lower stator.mount.circle_diameter by {Up(2 * s)} or raise stator.outer_diameter by {Up(2 * s)}" : $"raise stator.mount.circle_diameter by {Up(2 * s)}")
            : (toRim ? $"lower rotor.bolt_circle.diameter by {Up(2 * s)}" : $"raise rotor.bolt_circle.diameter by {Up(2 * s)} or lower rotor.bore by {Up(2 * s)}");
        yield return Wall(CheckIds.BoltEdgeDistance, pv.Id, p, wall, "material beside a hole", fix,
            "exact hole-to-edge distance; printed: 3 lines (practice), cut: half the hole diameter (common practice from memory)");
    }

    private static IEnumerable<CheckResult> Seats(CheckContext c, PartView pv)
    {
        var seats = pv.OfKind(FeatureKind.CoilSeat).ToList();
        double wall = c.MinWall(pv.Id);
        // Edges (rim, bore) by boundary distance; holes as filled shapes (a seat cut into a hole is 0 apart).
        var edgePair = MinPair(seats, pv.Features.Where(f => f.Kind is FeatureKind.Rim or FeatureKind.Bore), false);
        var holePair = MinPair(seats, pv.OfKind(FeatureKind.MountHole), true);
        var nearest = edgePair is { } ep && (holePair is not { } hp0 || ep.Mm <= hp0.Mm) ? edgePair : holePair;
        if (nearest is { } p)
        {
            double s = Shortfall(p.Mm, wall);
            string fix = p.B.Kind switch
            {
                FeatureKind.Rim => $"raise stator.outer_diameter to {Up(c.D.Stator.OuterDiameterMm + 2 * s)}",
                FeatureKind.Bore => $"lower stator.inner_diameter to {Down(Math.Max(0, c.D.Stator.InnerDiameterMm - 2 * s))}",
                _ => $"move stator.mount.circle_diameter {Up(2 * s)} further from the seats",
            };
            yield return Wall(CheckIds.SeatWall, pv.Id, p, wall, "seat wall", fix, "exact seat-to-edge distance against min_wall_lines x nozzle");
        }
        var sensors = pv.OfKind(FeatureKind.SensorPocket).ToList();
        if (sensors.Count > 0 && MinPair(sensors, seats, true) is { } q)
        {
            double s = Shortfall(q.Mm, wall);
            yield return Wall(CheckIds.SensorSeatClearance, pv.Id, q, wall, "wall between a sensor pocket and a coil seat",
                $"free {Up(s)} mm more between the coils (fewer coils.turns or a larger coils.pitch_radius) or use a smaller sensor.body",
                "exact sensor-pocket-to-seat distance against min_wall_lines x nozzle");
        }
    }

    /// <summary>
    /// Flange-to-flange clearance of neighbouring formers: the exact distance between the windings of coils 0
    /// and 1 (the outline from the electrical engine) minus the two flange overhangs; a seat wall and the
    /// print clearance on both sides must fit in it.
    /// </summary>
    private static CheckResult CoilCoil(CheckContext c)
    {
        int n = c.D.CoilsPerStator;
        var o = c.E.Outline;
        double flangeGap = double.PositiveInfinity;
        if (n > 1)
        {
            var a = new Shape2D(o.Outer);
            var b = new Shape2D(o.Outer.RotatedDeg(360.0 / n));
            flangeGap = Exact2D.ShapeShape(a, b, double.PositiveInfinity, out bool overlap);
            if (overlap) flangeGap = -OverlapDepth(o.Outer, 360.0 / n);
            flangeGap -= 2 * c.D.Former.MarginMm;
        }
        var stator = c.FirstStator;
        double limit = c.MinWall(stator) + 2 * c.D.Tolerances.PrintXyMm;
        var (status, margin) = n > 1 ? AtLeast(flangeGap, limit, MinBand(limit)) : (CheckStatus.Pass, double.PositiveInfinity);
        string msg = n > 1
            ? $"{F(flangeGap)} mm between the flanges of neighbouring formers (winding build {F(o.RadialBuildMm)} mm, flange margin {F(c.D.Former.MarginMm)} mm); a {F(c.MinWall(stator))} mm seat wall and {F(c.D.Tolerances.PrintXyMm)} mm print clearance each side need {F(limit)} mm"
            : "a single coil has no neighbour";
        if (status != CheckStatus.Pass)
        {
            double s = Shortfall(flangeGap, limit);
            double build = Math.Max(1e-9, o.RadialBuildMm);
            int turns = (int)Math.Floor(c.E.Turns * Math.Max(0, build - s / 2) / build);
            double sinHalf = Math.Sin(Math.PI / n);
            msg += $"; lower coils.turns to {turns} or raise coils.pitch_radius to {Up(o.PitchRadiusMm + s / (2 * sinHalf))}"
                   + (c.D.Former.MarginMm > 0 ? $" or lower former.margin to {Down(Math.Max(0, c.D.Former.MarginMm - s / 2))}" : "");
        }
        return new CheckResult
        {
            Id = CheckIds.CoilCoilClearance, Part = PartId.Former, Status = status, Value = n > 1 ? flangeGap : 0, Limit = limit, Unit = "mm",
            Margin = n > 1 ? margin : 0, Message = msg, Where = new CheckLocation("coil 0 / coil 1", 180.0 / Math.Max(1, n)),
            Basis = "exact distance between the coil outlines (electrical engine) minus the flange margins",
        };
    }

    /// <summary>How far two copies of an outline, one turned by the pitch, overlap along the bisector direction (bisection on a shift).</summary>
    private static double OverlapDepth(Contour outline, double pitchDeg)
    {
        // Shift the second copy outward along the tangent of the bisector until they separate.
        var dir = Geometry.Primitives.Vec2.FromAngleDeg(pitchDeg / 2 + 90);
        double lo = 0, hi = Box2.Of(outline).Width + Box2.Of(outline).Height;
        var a = new Shape2D(outline);
        var b0 = outline.RotatedDeg(pitchDeg);
        for (int i = 0; i < 50; i++)
        {
            double mid = 0.5 * (lo + hi);
            var b = new Shape2D(b0.Translated(dir * mid));
            Exact2D.ShapeShape(a, b, double.PositiveInfinity, out bool ov);
            if (ov) lo = mid; else hi = mid;
        }
        return hi;
    }
}
