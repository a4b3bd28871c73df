using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Design.Stack;
using PartForge.Geometry;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Solids;
using PartForge.Parts.Discs;
using PartForge.Parts.Formers;
using PartForge.Parts.Rotors;
using PartForge.Parts.Shapes;
using PartForge.Parts.Stators;

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
    /// <param name="precision">The grid and chordal tolerance of the parts' regions and meshes; default the
    /// machine's own (<c>mesh.chordal_tolerance</c>). A sweep passes a coarse one: its checks measure the exact
    /// primitives, never the polygons.</param>
    public static PartSet Build(MachineModel design, CoilGeometry coil, Precision? precision = null)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(coil);
        precision ??= design.Precision;
        var diags = new List<PartDiagnostic>();
        var stack = design.Stack;
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
            var former = FormerBuilder.Build(design, coil, diags);

            part = "stator";
            var stators = new List<(PartSpec Spec, StatorBuilder.Variant Variant)>();
            foreach (var v in StatorBuilder.Variants(design))
                stators.Add((StatorBuilder.Build(design, stack, coil, footprint, v, diags), v));

            var formerInstances = new List<PartInstance>();
            for (int si = 0; si < stators.Count; si++)
            {
                var (spec, v) = stators[si];
                var slab = stack.Slab(SlabKind.Former, v.Id);
                for (int k = 0; k < design.CoilsPerStator; k++)
                    formerInstances.Add(new PartInstance(si * design.CoilsPerStator + k, v.Id, slab.ZMin, former.HeightMm, v.Flipped,
                        StatorBuilder.LocalCoilAngleDeg(design, k, v.Flipped), coil.PitchRadiusMm, v.ExplodeRank));
            }
            specs.Add(former with { Instances = formerInstances });
            specs.AddRange(stators.Select(s => s.Spec));

            part = PartNames.Of(new PartId(design.Layout.SpacerRole));
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
            int symmetry = s.Id.Role switch
            {
                PartRole.Rotor => design.Poles,
                PartRole.Stator => design.CoilsPerStator,
                _ => 1,
            };
            models.Add(ToModel(s, precision, symmetry));
        }
        return new PartSet { Parts = models, Stack = stack, Diagnostics = diags, ExplodeMm = design.ExplodeMm };
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

    private static PartModel ToModel(PartSpec s, Precision precision, int symmetry)
    {
        var solid = new SolidSource(() =>
        {
            try
            {
                return ExactSolid.ToSolid(s.Layers, precision, symmetry);
            }
            catch (ArgumentException ex)
            {
                throw new PartsException($"{s.Id.Name}: the solid cannot be made ({ex.Message})");
            }
        });
        var mesh = new Lazy<Mesh>(() =>
        {
            var m = MeshOf(s.Id.Name, solid, precision);
            solid.Release(); // nothing reads the regions once the mesh exists
            return m;
        }, LazyThreadSafetyMode.ExecutionAndPublication);
        return new PartModel
        {
            Id = s.Id,
            Process = s.Process,
            Material = s.Material,
            HeightMm = s.HeightMm,
            ExactLayers = s.Layers,
            SolidSource = solid,
            MeshSource = mesh,
            MeshInputs = FormattableString.Invariant($"{precision.GridMm:R}/{precision.ChordalToleranceMm:R}/{symmetry}"),
            CutProfile = s.CutProfile,
            Marks = s.Marks,
            Features = s.Features,
            Instances = s.Instances,
            Notes = s.Notes,
            PrintPieces = s.Pieces.Select(pc => ToModel(new PartSpec
            {
                Id = s.Id, Process = s.Process, Material = s.Material, HeightMm = pc.HeightMm, Layers = pc.Layers,
                Features = Array.Empty<PartFeature>(), Instances = s.Instances,
            }, precision, 1) with { Piece = pc.Name }).ToArray(),
        };
    }
}
