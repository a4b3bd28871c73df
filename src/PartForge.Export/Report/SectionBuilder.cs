using System.Globalization;
using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Design.Stack;
using PartForge.Export.Drawings;
using PartForge.Geometry.Primitives;

namespace PartForge.Export.Report;

/// <summary>
/// The bodies and dimensions of the axial half-section through a magnet and a coil, from the nominal axial
/// stack (the same rule the part builders and the checker use) and the radial sizes of the design.
/// </summary>
public static class SectionBuilder
{
    public static (IReadOnlyList<SectionBody> Bodies, IReadOnlyList<LinearDimension> Dimensions) Build(
        MachineModel d, AxialStack stack, CoilSection coil, IReadOnlyDictionary<PartId, double> runningGapByPart,
        (double RMin, double RMax)? backIron = null)
    {
        var (magIn, magOut) = MagnetRadialExtent(d);
        double rotIn = d.Rotor.BoreMm / 2, rotOut = d.Rotor.OuterDiameterMm / 2;
        double statIn = d.Stator.InnerDiameterMm / 2, statOut = d.Stator.OuterDiameterMm / 2;
        var bodies = new List<SectionBody>();
        foreach (var s in stack.Slabs)
        {
            switch (s.Kind)
            {
                case SlabKind.Rotor:
                {
                    // The rotor disc is cut where the pocket is (the magnet is drawn in it); a blind pocket
                    // keeps a floor on the side away from the stator.
                    bodies.Add(new SectionBody(SlabKind.Rotor, s.Owner.Name, rotIn, Math.Max(rotIn, magIn), s.ZMin, s.ZMax, s.Owner.Name));
                    bodies.Add(new SectionBody(SlabKind.Rotor, s.Owner.Name, Math.Min(rotOut, magOut), rotOut, s.ZMin, s.ZMax, s.Owner.Name));
                    double floor = s.Thickness - stack.PocketDepthMm;
                    if (floor > 1e-9 && !d.ThroughPockets)
                    {
                        bool backIsUp = Math.Abs(s.ZMax) > Math.Abs(s.ZMin);
                        double fz0 = backIsUp ? s.ZMax - floor : s.ZMin;
                        bodies.Add(new SectionBody(SlabKind.Rotor, s.Owner.Name, magIn, magOut, fz0, fz0 + floor, s.Owner.Name + " pocket floor"));
                    }
                    break;
                }
                case SlabKind.Magnet:
                    bodies.Add(new SectionBody(SlabKind.Magnet, s.Owner.Name, magIn, magOut, s.ZMin, s.ZMax, "magnet"));
                    break;
                case SlabKind.BackIron:
                    bodies.Add(new SectionBody(SlabKind.BackIron, s.Owner.Name, backIron?.RMin ?? rotIn, backIron?.RMax ?? rotOut, s.ZMin, s.ZMax, "back iron"));
                    break;
                case SlabKind.Stator:
                    bodies.Add(new SectionBody(SlabKind.Stator, s.Owner.Name, statIn, Math.Max(statIn, coil.FormerRMin), s.ZMin, s.ZMax, s.Owner.Name));
                    bodies.Add(new SectionBody(SlabKind.Stator, s.Owner.Name, Math.Min(statOut, coil.FormerRMax), statOut, s.ZMin, s.ZMax, s.Owner.Name));
                    break;
                case SlabKind.Former:
                    double flange = d.Former.FlangeMm;
                    bodies.Add(new SectionBody(SlabKind.Former, s.Owner.Name, coil.FormerRMin, coil.FormerRMax, s.ZMin, s.ZMin + flange, "former flange"));
                    bodies.Add(new SectionBody(SlabKind.Former, s.Owner.Name, coil.FormerRMin, coil.FormerRMax, s.ZMax - flange, s.ZMax, "former flange"));
                    bodies.Add(new SectionBody(SlabKind.Former, s.Owner.Name, coil.WindowRMin, coil.WindowRMax, s.ZMin + flange, s.ZMax - flange, "former core"));
                    break;
                case SlabKind.Copper:
                    bodies.Add(new SectionBody(SlabKind.Copper, s.Owner.Name, coil.CopperRMin, coil.WindowRMin, s.ZMin, s.ZMax, "winding"));
                    bodies.Add(new SectionBody(SlabKind.Copper, s.Owner.Name, coil.WindowRMax, coil.CopperRMax, s.ZMin, s.ZMax, "winding"));
                    break;
            }
        }

        var dims = new List<LinearDimension>();
        double right = Math.Max(rotOut, statOut);
        double step = Math.Max(3, right * 0.08);
        // Stack-up: the thickness of every slab, on two lanes to the right of the section (slabs on one lane
        // never overlap in z, so their dimensions do not collide).
        foreach (var s in stack.Slabs.Where(s => s.Kind is SlabKind.Stator or SlabKind.Rotor or SlabKind.Magnet or SlabKind.BackIron or SlabKind.Former))
        {
            string id = s.Kind switch
            {
                SlabKind.Stator => "stator_thickness", SlabKind.Rotor => "rotor_thickness", SlabKind.Magnet => "magnet_thickness",
                SlabKind.BackIron => "back_iron_thickness", _ => "former_height",
            };
            double x = s.Kind switch
            {
                SlabKind.Magnet => magOut, SlabKind.Former => coil.FormerRMax, SlabKind.Stator => statOut, _ => rotOut,
            };
            int laneNo = s.Kind is SlabKind.Magnet or SlabKind.Former ? 2 : 1;
            // Offset is measured to the left of From -> To; From is the top, so a positive offset goes right.
            double off = (right - x) + step * laneNo;
            dims.Add(new LinearDimension(id + ":" + s.Owner.Name, new Vec2(x, s.ZMax), new Vec2(x, s.ZMin), off, s.Thickness,
                $"{id.Replace('_', ' ')}, {s.Owner.Name}: {F(s.Thickness)}"));
        }

        // Running gaps: from each stationary face to the nearest rotating surface, drawn at the magnet's mid
        // radius. The drawn length is the nominal gap; data-value is the checker's worst case when it has one.
        double rGap = (magIn + magOut) / 2;
        foreach (var (owner, statFace, rotFace) in GapFaces(stack))
        {
            double nominal = Math.Abs(rotFace - statFace);
            bool has = runningGapByPart.TryGetValue(owner, out double worst);
            string text = has ? $"running gap, {owner.Name}: {F(nominal)} nominal, {F(worst)} worst case" : $"running gap, {owner.Name}: {F(nominal)} nominal";
            var from = new Vec2(rGap, Math.Min(statFace, rotFace));
            var to = new Vec2(rGap, Math.Max(statFace, rotFace));
            dims.Add(new LinearDimension("running_gap:" + owner.Name, from, to, 0, has ? worst : nominal, text, "gap"));
        }
        return (bodies, dims);
    }

    /// <summary>(rotating owner, stationary face z, nearest rotating surface z) for each running gap.</summary>
    public static IEnumerable<(PartId Owner, double StationaryZ, double RotatingZ)> GapFaces(AxialStack stack)
    {
        var stationary = stack.Slabs.Where(s => s.Kind is SlabKind.Stator or SlabKind.Former).ToList();
        var rotating = stack.Slabs.Where(s => s.Kind is SlabKind.Rotor or SlabKind.Magnet).GroupBy(s => s.Owner);
        foreach (var g in rotating.OrderBy(g => g.Key.Name, StringComparer.Ordinal))
        {
            double rMin = g.Min(s => s.ZMin), rMax = g.Max(s => s.ZMax);
            // Nearest stationary face above or below this rotating body.
            var above = stationary.Where(s => s.ZMin >= rMax - 1e-9).Select(s => s.ZMin).DefaultIfEmpty(double.NaN).Min();
            var below = stationary.Where(s => s.ZMax <= rMin + 1e-9).Select(s => s.ZMax).DefaultIfEmpty(double.NaN).Max();
            if (double.IsFinite(above)) yield return (g.Key, above, rMax);
            if (double.IsFinite(below)) yield return (g.Key, below, rMin);
        }
    }

    /// <summary>Radial extent of a magnet (and its pocket without clearance), mm from the axis.</summary>
    public static (double RMin, double RMax) MagnetRadialExtent(MachineModel d)
    {
        var m = d.Magnets.Shape;
        return (m.PitchRadiusMm - m.RadialLengthMm / 2, m.PitchRadiusMm + m.RadialLengthMm / 2);
    }

    internal static string F(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);
}
