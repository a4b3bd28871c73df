using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Design.Stack;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Solids;
using PartForge.Parts.Rotors;
using PartForge.Parts.Shapes;

namespace PartForge.Parts.Discs;

/// <summary>
/// The steel back-iron disc behind each rotor that has one (<c>rotor.back_iron</c>; not in dual-stator, where
/// both rotor faces face a stator). Decisions: a flat disc with the rotor's bore and bolt circle; outer radius =
/// the magnets' outer radius plus max(1 mm, half the magnet thickness), so the steel covers the magnets'
/// whole radial extent and a little of their fringe, but never beyond the rotor's rim. Cut from sheet by
/// default (steel); identical for both rotors of a dual-rotor machine, so written once with quantity 2.
/// </summary>
internal static class BackIronBuilder
{
    public static double OuterRadiusMm(MachineModel d)
    {
        var (_, rMax) = DesignGeometry.MagnetRadialExtentMm(d);
        return Math.Min(d.Rotor.OuterDiameterMm / 2, rMax + Math.Max(1.0, d.Magnets.Shape.ThicknessMm / 2));
    }

    public static PartSpec? Build(MachineModel d, AxialStack stack, IReadOnlyList<PartSpec> rotors, List<PartDiagnostic> diags)
    {
        if (d.Rotor.BackIronThicknessMm is not { } t || !d.Layout.AllowsBackIron) return null;
        double R = OuterRadiusMm(d);
        var o = new Vec2(0, 0);
        var rim = Contour.FullCircle(o, R);
        var holes = new List<Contour>();
        var features = new List<PartFeature> { new("rim", FeatureKind.Rim, 0, rim, 0, t, 0, R) };
        if (d.Rotor.BoreMm > 0)
        {
            var bore = Contour.FullCircle(o, d.Rotor.BoreMm / 2);
            holes.Add(bore);
            features.Add(new("bore", FeatureKind.Bore, 0, bore, 0, t, 0, 0));
        }
        var bolts = RotorBuilder.BoltHoles(d.Rotor.BoltCircle);
        for (int j = 0; j < bolts.Count; j++)
        {
            holes.Add(bolts[j]);
            features.Add(new($"bolt-{j}", FeatureKind.BoltHole, j, bolts[j], 0, t, RotorBuilder.BoltAngle(d.Rotor.BoltCircle!, j), d.Rotor.BoltCircle!.CircleDiameterMm / 2));
        }
        // The jacking screws of the last rotor pass through its back iron (both copies are the same part).
        if (Jacking.For(d, null) is { } jacks)
            for (int j = 0; j < jacks.AnglesDeg.Count; j++)
            {
                var h = jacks.Hole(j);
                holes.Add(h);
                features.Add(new($"jack-{j}", FeatureKind.JackHole, j, h, 0, t, jacks.AnglesDeg[j], jacks.CircleRadiusMm));
            }
        var (process, material) = ProcessChoice.Resolve(PartId.BackIron, d.Parts.For(PartRole.BackIron), true, "", diags);
        var instances = new List<PartInstance>();
        foreach (var r in rotors)
        {
            var slab = stack.Slab(SlabKind.BackIron, r.Id);
            var ri = r.Instances[0];
            instances.Add(new PartInstance(instances.Count, r.Id, slab.ZMin, t, ri.Flipped, 0, 0, 2 * Math.Sign(ri.ExplodeRank)));
        }
        return new PartSpec
        {
            Id = PartId.BackIron,
            Process = process,
            Material = material,
            HeightMm = t,
            Layers = new[] { new ExactLayer(0, t, new[] { rim }, holes) },
            Features = features,
            Instances = instances,
            CutProfile = process == PartProcess.Cut ? new Profile(new[] { rim }, holes) : null,
            Notes = new[] { "back-iron: lay it against the rotor's back face (the face without pockets), bolt holes in line; magnets pull hard toward it." },
        };
    }
}
