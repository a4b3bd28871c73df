using PartForge.Design.Stack;
using PartForge.Geometry;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;
using PartForge.Parts.Discs;
using PartForge.Parts.Formers;
using PartForge.Parts.Rotors;
using PartForge.Parts.Shapes;
using PartForge.Parts.Stators;
using D = PartForge.Design.Model;

namespace PartForge.Parts;

/// <summary>
/// Builds every part of a design: rotor(s), back iron, the coil former, stator ring(s) and the spacer, each
/// as exact layers, a layered solid on the precision grid and its mesh, placed in the machine by the
/// nominal <see cref="AxialStack"/>. Identical parts are one model with several instances (formers:
/// coils x stators; back iron: one per rotor).
/// </summary>
public static partial class PartsBuilder
{

    /// <summary>
    /// Builds the parts from the design and the coil geometry the electrical engine computed.
    /// Throws <see cref="PartsException"/> (one-line message) when the design cannot be made into parts.
    /// </summary>
    public static PartSet Build(D.Design design, CoilGeometry coil, Precision precision)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(coil);
        ArgumentNullException.ThrowIfNull(precision);
        var diags = new List<PartDiagnostic>();
        var stack = AxialStack.From(design);
        var specs = new List<PartSpec>();
        string part = "rotor";
        try
        {
            var rotors = RotorBuilder.Build(design, stack, diags);
            specs.AddRange(rotors);
            part = "back-iron";
            if (BackIronBuilder.Build(design, stack, rotors, diags) is { } bi) specs.Add(bi);

            part = "former";
            var footprint = FormerBuilder.Footprint(design, coil);
            var former = FormerBuilder.Build(design, coil, 1, diags);

            part = "stator";
            var stators = new List<(PartSpec Spec, StatorBuilder.Variant Variant)>();
            foreach (var v in StatorBuilder.Variants(design))
                stators.Add((StatorBuilder.Build(design, stack, coil, footprint, v, diags), v));

            var formerInstances = new List<PartInstance>();
            for (int si = 0; si < stators.Count; si++)
            {
                var (spec, v) = stators[si];
                var slab = stack.Slabs.First(x => x.Kind == SlabKind.Former && x.Owner == v.Name);
                for (int k = 0; k < design.Machine.Coils; k++)
                    formerInstances.Add(new PartInstance(si * design.Machine.Coils + k, v.Name, slab.ZMin, former.HeightMm, v.Flipped,
                        StatorBuilder.LocalCoilAngleDeg(design, k, v.Flipped), coil.PitchRadiusMm, v.ExplodeRank));
            }
            specs.Add(former with { Instances = formerInstances });
            specs.AddRange(stators.Select(s => s.Spec));

            part = "spacer";
            var seatLocal = ContourOffset.Offset(footprint, DesignGeometry.SeatClearanceMm(design));
            if (SpacerBuilder.Build(design, stack, coil, seatLocal, diags) is { } sp) specs.Add(sp);
        }
        catch (ArgumentException ex)
        {
            throw new PartsException($"{part}: the geometry cannot be made ({ex.Message})");
        }

        var models = new List<PartModel>(specs.Count);
        foreach (var s in specs)
        {
            int symmetry = s.Name.StartsWith("rotor", StringComparison.Ordinal) ? design.Machine.Poles
                : s.Name.StartsWith("stator", StringComparison.Ordinal) ? design.Machine.Coils : 1;
            models.Add(ToModel(s, precision, symmetry, design.Machine.Layout));
        }
        return new PartSet { Parts = models, Stack = stack, Diagnostics = diags, ExplodeMm = design.Assembly.Explode };
    }

    /// <summary>
    /// The layered solid of exact layers on the precision grid (one region per layer). Outers are discretised on
    /// the true arcs and cuts outside them (holes never undersize), the same way in every layer. A layer whose
    /// cuts are apart from each other and inside an outer is assembled by the kernel directly. A layer whose cuts are those of the layer below plus some
    /// more is made from the layer below by one difference with the union of the new cuts; other layers by one
    /// difference with the union of all their cuts (a union of many small polygons at once, not a chain).
    /// </summary>
    public static LayeredSolid SolidOf(IReadOnlyList<ExactLayer> layers, Precision precision, int symmetry = 1)
    {
        var cuts = new Dictionary<Contour, Region>(ReferenceEqualityComparer.Instance);
        var outers = new Dictionary<Contour, Region>(ReferenceEqualityComparer.Instance);
        Region Cut(Contour c) => cuts.TryGetValue(c, out var r) ? r : cuts[c] = Region.FromContour(c, precision, asHole: true, symmetry);
        Region Outer(Contour c) => outers.TryGetValue(c, out var r) ? r : outers[c] = Region.FromContour(c, precision, asHole: false, symmetry);
        Region Union(IEnumerable<Region> rs) => Region.UnionAll(rs, precision);

        var result = new List<Layer>(layers.Count);
        ExactLayer? prev = null;
        Region? prevRegion = null;
        foreach (var l in layers)
        {
            Region region;
            // Cuts apart from each other and inside the outer: the kernel assembles the polygon directly from the
            // discretised rings (for a ring of 64 round pockets 6 ms, against 350 ms by booleans).
            if ((PairwiseApart(l.Cuts) ? Region.FromProfile(new Profile(l.Outers, l.Cuts), precision, symmetry)
                    : Region.TryFromProfileDirect(new Profile(l.Outers, l.Cuts), precision, symmetry)) is { } direct)
            {
                result.Add(new Layer(l.Z0Mm, l.Z1Mm, direct));
                prev = l;
                prevRegion = direct;
                continue;
            }
            bool sameOuters = prev is not null && prev.Outers.Count == l.Outers.Count && prev.Outers.Zip(l.Outers).All(x => ReferenceEquals(x.First, x.Second));
            var prevCuts = prev is null ? null : new HashSet<Contour>(prev.Cuts, ReferenceEqualityComparer.Instance);
            if (sameOuters && prevCuts!.All(c => l.Cuts.Contains(c, ReferenceEqualityComparer.Instance)))
            {
                var added = l.Cuts.Where(c => !prevCuts!.Contains(c)).ToList();
                region = added.Count == 0 ? prevRegion! : prevRegion!.Difference(added.Count == 1 ? Cut(added[0]) : Union(added.Select(Cut)));
            }
            else
            {
                var shell = l.Outers.Count == 1 ? Outer(l.Outers[0]) : Union(l.Outers.Select(Outer));
                region = l.Cuts.Count == 0 ? shell : shell.Difference(l.Cuts.Count == 1 ? Cut(l.Cuts[0]) : Union(l.Cuts.Select(Cut)));
            }
            result.Add(new Layer(l.Z0Mm, l.Z1Mm, region));
            prev = l;
            prevRegion = region;
        }
        return new LayeredSolid(result);
    }

    /// <summary>
    /// Whether two cuts of the layer may overlap, judged by circles round their centres of radius half the
    /// larger side of their bounding box (exact for round cuts): a pattern of separate round pockets says no,
    /// a channel running into a seat says yes. Then the layer's region is likely made by booleans rather than
    /// assembled directly, which needs about twice the working memory. For planning work only, never for
    /// geometry.
    /// </summary>
    public static bool CutsMayOverlap(ExactLayer layer)
    {
        ArgumentNullException.ThrowIfNull(layer);
        if (layer.Cuts.Count < 2) return false;
        var c = layer.Cuts.Select(Box).Select(b => (X: (b.X0 + b.X1) / 2, Y: (b.Y0 + b.Y1) / 2, R: 0.5 * Math.Max(b.X1 - b.X0, b.Y1 - b.Y0)))
            .OrderBy(x => x.X - x.R).ToArray();
        for (int i = 0; i < c.Length; i++)
            for (int j = i + 1; j < c.Length && c[j].X - c[j].R <= c[i].X + c[i].R; j++)
            {
                double dx = c[i].X - c[j].X, dy = c[i].Y - c[j].Y, rr = c[i].R + c[j].R;
                if (dx * dx + dy * dy < rr * rr) return true;
            }
        return false;
    }

    /// <summary>True when the cuts' bounding boxes are pairwise apart (then no union is needed).</summary>
    private static bool PairwiseApart(IReadOnlyList<Contour> cuts)
    {
        if (cuts.Count < 2) return true;
        var boxes = cuts.Select(Box).OrderBy(b => b.X0).ToArray();
        for (int i = 0; i < boxes.Length; i++)
            for (int j = i + 1; j < boxes.Length && boxes[j].X0 <= boxes[i].X1; j++)
                if (boxes[j].Y0 <= boxes[i].Y1 && boxes[i].Y0 <= boxes[j].Y1) return false;
        return true;
    }

    private static (double X0, double Y0, double X1, double Y1) Box(Contour c)
    {
        const double pad = 1e-3;
        return (-ExactGeometry.Support(c, new Vec2(-1, 0)) - pad, -ExactGeometry.Support(c, new Vec2(0, -1)) - pad,
            ExactGeometry.Support(c, new Vec2(1, 0)) + pad, ExactGeometry.Support(c, new Vec2(0, 1)) + pad);
    }

    private static Mesh MeshOf(string name, SolidSource solid, Precision precision)
    {
        try
        {
            // The regions are let go as soon as the mesher has their rings (made again only for a heal).
            return Mesher.Build(() => { var v = solid.Value; solid.Release(); return v; }, precision);
        }
        catch (ArgumentException ex)
        {
            // Coordinates beyond what float32 output can hold: a design too large for the grid.
            throw new PartsException($"{name}: the part cannot be meshed ({ex.Message})");
        }
        catch (InvalidOperationException ex)
        {
            throw new InvalidOperationException($"{name}: the mesher failed ({ex.Message})", ex);
        }
    }

    private static PartModel ToModel(PartSpec s, Precision precision, int symmetry, string layout)
    {
        var solid = new SolidSource(() =>
        {
            try
            {
                return SolidOf(s.Layers, precision, symmetry);
            }
            catch (ArgumentException ex)
            {
                throw new PartsException($"{s.Name}: the solid cannot be made ({ex.Message})");
            }
        });
        var mesh = new Lazy<Mesh>(() =>
        {
            var m = MeshOf(s.Name, solid, precision);
            solid.Release(); // nothing reads the regions once the mesh exists
            return m;
        }, LazyThreadSafetyMode.ExecutionAndPublication);
        bool rotating = s.Name.StartsWith("rotor", StringComparison.Ordinal) || s.Name == "back-iron"
            || (s.Name == "spacer" && layout == "dual-rotor");
        return new PartModel
        {
            Name = s.Name,
            Process = s.Process,
            Material = s.Material,
            HeightMm = s.HeightMm,
            ExactLayers = s.Layers,
            SolidSource = solid,
            MeshSource = mesh,
            CutProfile = s.CutProfile,
            Marks = s.Marks,
            Features = s.Features,
            Instances = s.Instances,
            Rotating = rotating,
            Notes = s.Notes,
        };
    }
}
