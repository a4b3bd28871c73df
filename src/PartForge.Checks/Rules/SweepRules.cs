using PartForge.Checks.Clearance;
using PartForge.Checks.Inputs;
using PartForge.Design.Parts;
using PartForge.Design.Stack;
using PartForge.Geometry.Exact;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Parts;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>rotation-clearance: the rotation sweep over the assembly at its nominal positions, coil bulge included.</summary>
internal static class SweepRules
{
    public static IEnumerable<CheckResult> Run(CheckContext c)
    {
        var scene = BuildScene(c);
        var r = RotationSweep.Run(scene, c.SweepStepDeg);
        if (r.Rotating is null || r.Stationary is null) yield break;
        double limit = c.D.Gap.MinRunningGapMm;
        var (status, margin) = AtLeast(r.ClearanceMm, limit, MinBand(limit));
        string where = $"{r.Rotating.Part.Name} {r.Rotating.Feature} / {r.Stationary.Part.Name} {r.Stationary.Feature}";
        string msg = r.Interference
            ? $"{where} interfere at rotor angle {F(r.AngleDeg)} degrees: {F(-r.ClearanceMm)} mm of axial shift would separate them"
            : $"minimum clearance {F(r.ClearanceMm)} mm ({F(r.AxialMm)} axial, {F(r.PlanarMm)} in plane) between {where} at rotor angle {F(r.AngleDeg)} degrees (sweep over {F(scene.PeriodDeg)} degrees, step {F(r.StepDeg)})";
        if (status != CheckStatus.Pass)
        {
            double need = limit + MinBand(limit);
            if (r.Interference && r.AxialMm == 0 && RadialOverlap(r.Rotating, r.Stationary) is { } radial)
            {
                // Overlapping in the plane where their z-ranges overlap: the radial ranges say by how much.
                var (overlap, rotatingInside) = radial;
                msg += rotatingInside
                    ? $"; the {r.Rotating.Part.Name} reaches {F(overlap)} mm past the inner edge of the {r.Stationary.Part.Name}: make the {r.Stationary.Part.Name}'s inner radius {Up(overlap + need)} mm larger or the {r.Rotating.Part.Name}'s outer radius that much smaller"
                    : $"; the {r.Stationary.Part.Name} reaches {F(overlap)} mm inside the outer edge of the {r.Rotating.Part.Name}: make the {r.Rotating.Part.Name}'s outer radius {Up(overlap + need)} mm smaller or the {r.Stationary.Part.Name}'s inner radius that much larger";
            }
            else
            {
                double s = need - r.ClearanceMm;
                msg += r.PlanarMm > r.AxialMm && !r.Interference
                    ? $"; move them {Up(s)} mm further apart in the plane (the parts' radial sizes or coils.pitch_radius)"
                    : $"; raise gap.air_gap to at least {Up(c.D.Gap.AirGapMm + s)}";
            }
        }
        yield return new CheckResult
        {
            Id = CheckIds.RotationClearance, Part = r.Rotating.Part, Counterpart = r.Stationary.Part, Status = status, Value = r.ClearanceMm, Limit = limit, Unit = "mm", Margin = margin,
            Message = msg, Where = new CheckLocation(where, r.AngleDeg),
            Basis = "rotation sweep over one pole pitch on the layered solids: axial overlap plus exact 2D distance, sqrt(dz^2 + d2^2)",
        };
    }

    /// <summary>
    /// How far the radial ranges of two interfering prisms overlap, and whether the rotating one is the inner
    /// one (its material reaches out into the stationary one); null when the ranges do not overlap.
    /// </summary>
    private static (double Overlap, bool RotatingInside)? RadialOverlap(SweepPrism rotating, SweepPrism stationary)
    {
        var a = Exact2D.RadialRange(rotating.Shape);
        var b = Exact2D.RadialRange(stationary.Shape);
        double outward = a.Max - b.Min, inward = b.Max - a.Min;
        if (outward <= 0 || inward <= 0) return null;
        return outward <= inward ? (outward, true) : (inward, false);
    }

    /// <summary>The sweep scene: rotor layers and magnets turn; stator, formers and copper stand still.</summary>
    public static SweepScene BuildScene(CheckContext c)
    {
        var rotating = new List<SweepPrism>();
        var stationary = new List<SweepPrism>();
        var slabs = c.Stack.Slabs;
        foreach (var pv in c.Parts)
        {
            // An assembly tool (the single-rotor gap gauge) is pulled out before the rotor turns.
            if (!pv.Id.Facts.RunsInMachine) continue;
            var into = pv.Rotating ? rotating : stationary;
            if (pv.Id.Role == PartRole.Former)
                foreach (var inst in pv.Instances) AddLayers(into, pv, new[] { inst }, $"coil {inst.Index} former");
            else AddLayers(into, pv, pv.Instances, pv.Rotating ? "disc" : "ring");
        }
        foreach (var rotor in c.RotorIds)
        {
            var magnetSlab = c.Stack.Slab(SlabKind.Magnet, rotor);
            if (c.Part(rotor) is { } pv && pv.OfKind(FeatureKind.MagnetPocket).Any())
            {
                foreach (var inst in pv.Instances)
                    foreach (var pocket in pv.OfKind(FeatureKind.MagnetPocket))
                    {
                        var outline = inst.ToMachine(MagnetAt(c, pocket.AngleDeg));
                        rotating.Add(new SweepPrism(rotor, $"magnet {pocket.Index}", magnetSlab.ZMin, magnetSlab.ZMax, new Shape2D(outline)));
                    }
                continue;
            }
            if (c.Part(rotor) is null)
            {
                var disc = c.Stack.Slab(SlabKind.Rotor, rotor);
                rotating.Add(new SweepPrism(rotor, "disc", disc.ZMin, disc.ZMax, Shape2D.Annulus(c.D.Rotor.BoreMm / 2, c.D.Rotor.OuterDiameterMm / 2)));
            }
            for (int i = 0; i < c.D.Poles; i++)
            {
                double ang = i * 360.0 / c.D.Poles;
                rotating.Add(new SweepPrism(rotor, $"magnet {i}", magnetSlab.ZMin, magnetSlab.ZMax, new Shape2D(MagnetAt(c, ang))));
            }
        }

        var stators = slabs.Where(s => s.Kind == SlabKind.Stator).Select(s => s.Owner).Distinct().ToList();
        foreach (var stator in stators)
        {
            if (c.Part(stator) is null)
            {
                var ring = c.Stack.Slab(SlabKind.Stator, stator);
                stationary.Add(new SweepPrism(stator, "ring", ring.ZMin, ring.ZMax, Shape2D.Annulus(c.D.Stator.InnerDiameterMm / 2, c.D.Stator.OuterDiameterMm / 2)));
            }
            var copper = c.Stack.Slab(SlabKind.Copper, stator);
            double z0 = copper.ZMin - c.BulgePerFaceMm, z1 = copper.ZMax + c.BulgePerFaceMm;
            for (int k = 0; k < c.D.CoilsPerStator; k++)
            {
                double ang = k * 360.0 / c.D.CoilsPerStator;
                var outer = c.E.Outline.Outer.RotatedDeg(ang);
                var window = c.E.Outline.Window.RotatedDeg(ang);
                stationary.Add(new SweepPrism(stator, $"coil {k} copper", z0, z1, new Shape2D(outer, new[] { window })));
            }
        }
        return new SweepScene(rotating, stationary, 360.0 / Math.Max(1, c.D.Poles));
    }

    private static void AddLayers(List<SweepPrism> into, PartView pv, IEnumerable<PartInstance> instances, string what)
    {
        foreach (var inst in instances)
        {
            for (int li = 0; li < pv.Layers.Count; li++)
            {
                var layer = pv.Layers[li];
                double za = inst.ToMachineZ(layer.Z0Mm), zb = inst.ToMachineZ(layer.Z1Mm);
                var cuts = layer.Cuts.Select(inst.ToMachine).ToList();
                foreach (var outerLocal in layer.Outers)
                {
                    var outer = inst.ToMachine(outerLocal);
                    var ob = Box2.Of(outer);
                    var holes = cuts.Where(h => Inside(Box2.Of(h), ob)).ToArray();
                    into.Add(new SweepPrism(pv.Id, $"{what} layer {li}", Math.Min(za, zb), Math.Max(za, zb), new Shape2D(outer, holes)));
                }
            }
        }
    }

    /// <summary>The bare magnet at a pocket's angle (machine frame, unrotated rotor): magnet 0's outline turned there.</summary>
    private static Contour MagnetAt(CheckContext c, double angleDeg) => c.Magnet.Outline(0).RotatedDeg(angleDeg);

    private static bool Inside(Box2 inner, Box2 outer) =>
        inner.MinX >= outer.MinX - 1e-9 && inner.MaxX <= outer.MaxX + 1e-9 && inner.MinY >= outer.MinY - 1e-9 && inner.MaxY <= outer.MaxY + 1e-9;
}
