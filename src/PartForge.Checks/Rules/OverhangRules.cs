using PartForge.Design.Machines;
using PartForge.Geometry.Fabrication;
using PartForge.Parts;
using PartForge.Parts.Fabrication;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>
/// print-overhang: every printed part (each print piece of a part printed in pieces) prints without supports in the
/// orientation it is laid out on the plate (<see cref="PrintFootprint"/>: larger flat face down). A prismatic part's
/// only down-facing surfaces are flat ledges, which overhang at 90 degrees from vertical; the limit is 45 degrees
/// (common practice for filament printing, no published standard), which over one printed layer of height
/// <c>process.layer</c> allows a ledge of layer x tan 45 degrees. The value is the widest unsupported ledge (the
/// kernel's exact overhang analysis on the part's layers: the largest distance from a point of a down-facing face to
/// where it rests on the layer below; a face resting on nothing counts its whole extent). Beyond the limit the part
/// needs support material: a warning, not a failure (it can still be printed, with supports).
/// </summary>
internal static class OverhangRules
{
    /// <summary>The overhang limit from vertical, degrees (common practice).</summary>
    public const double LimitDeg = 45;

    private const string Basis = "exact overhang analysis of the layers in printing orientation; limit 45 degrees from vertical (common practice for filament printing), i.e. a ledge of at most process.layer x tan 45 degrees per layer";

    public static IEnumerable<CheckResult> Run(MachineModel d, PartSet parts)
    {
        double allowed = d.Process.LayerMm * Math.Tan(LimitDeg * Math.PI / 180);
        var options = new OverhangOptions { MaxAngleFromVerticalDeg = LimitDeg };
        foreach (var part in parts.Parts.Where(p => p.Process == PartProcess.Print))
        {
            double worst = 0;
            string where = "";
            foreach (var unit in part.PrintUnits)
            {
                var fp = PrintFootprint.Of(unit.ExactLayers);
                if (EachLayerInsideTheOneBelow(unit.ExactLayers, fp.Flipped)) continue;
                var solid = unit.Solid;
                double z0 = solid.Layers.Where(l => !l.Region.IsEmpty).Min(l => l.Z0), z1 = solid.Layers.Where(l => !l.Region.IsEmpty).Max(l => l.Z1);
                var oriented = new PrintOrientation(fp.Flipped, 0, 0, z0, z1).Apply(solid);
                var report = OverhangAnalysis.OfSolid(oriented, options);
                foreach (var r in report.Regions)
                {
                    double span = r.SpanMm ?? Math.Max(r.MaxXY.X - r.MinXY.X, r.MaxXY.Y - r.MinXY.Y);
                    if (span > worst)
                    {
                        worst = span;
                        where = $"{unit.Name} at z {F(r.ZMm)} mm as printed{(r.IsIsland ? ", resting on nothing" : "")}";
                    }
                }
            }
            var (status, margin) = AtMost(worst, allowed, 0);
            worst = Math.Max(0, worst);
            if (status == CheckStatus.Fail) status = CheckStatus.Warn;
            string pieces = part.PrintPieces.Count > 0 ? $" (printed as {string.Join(" and ", part.PrintPieces.Select(p => p.Name))})" : "";
            string msg = worst <= allowed
                ? $"{part.Name}{pieces}: no overhang beyond {F(LimitDeg)} degrees; prints without supports"
                : $"{part.Name}{pieces}: a ledge {F(worst)} mm wide overhangs ({where}), beyond {F(allowed)} mm ({F(LimitDeg)} degrees over a {F(d.Process.LayerMm)} mm layer): print it with supports";
            yield return new CheckResult
            {
                Id = CheckIds.PrintOverhang, Part = part.Id, Status = status, Value = worst, Limit = allowed, Unit = "mm", Margin = margin,
                Message = msg, Basis = Basis,
            };
        }
    }

    /// <summary>
    /// The exact shortcut that spares the regions: as printed, every layer holds no more than the one under it, because
    /// its outlines are among that layer's outlines and that layer's cuts are among its cuts (A = U(O) - U(C) grows with
    /// O and shrinks with C), and the layers follow one another without a gap. Then nothing faces down off the bed.
    /// </summary>
    internal static bool EachLayerInsideTheOneBelow(IReadOnlyList<PartForge.Geometry.Solids.ExactLayer> layers, bool flipped)
    {
        var order = layers.Where(l => l.Outers.Count > 0 && l.Z1Mm > l.Z0Mm).OrderBy(l => l.Z0Mm).ToList();
        if (flipped) order.Reverse();
        static bool In(PartForge.Geometry.Profiles.Contour c, IReadOnlyList<PartForge.Geometry.Profiles.Contour> list) => list.Any(x => ReferenceEquals(x, c) || x.Equals(c));
        for (int k = 1; k < order.Count; k++)
        {
            var below = order[k - 1];
            var above = order[k];
            double touch = flipped ? below.Z0Mm - above.Z1Mm : above.Z0Mm - below.Z1Mm;
            if (Math.Abs(touch) > 1e-9) return false;
            if (!above.Outers.All(o => In(o, below.Outers)) || !below.Cuts.All(c => In(c, above.Cuts))) return false;
        }
        return true;
    }
}
