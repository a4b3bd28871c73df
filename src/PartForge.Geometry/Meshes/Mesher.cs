using System.Diagnostics.Contracts;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;

namespace PartForge.Geometry.Meshes;

/// <summary>
/// Turns a layered solid into a closed, 2-manifold, outward-oriented triangle mesh, by construction:
/// at every level the rings meeting there are noded against each other, and the walls and the horizontal
/// faces are built from the same noded rings (no T-junctions); rings that continue unchanged through a level
/// give one wall panel across it. Faces are triangulated without adding or dropping a vertex.
/// </summary>
public static class Mesher
{
    /// <summary>
    /// Meshes the solid. Throws <see cref="ArgumentOutOfRangeException"/> when a coordinate is so large that
    /// float32 (STL, 3MF) could no longer tell neighbouring grid points apart (|x|, |y|, |z| &lt; 1024 mm on
    /// the default 1e-4 mm grid).
    /// </summary>
    [Pure]
    public static Mesh Build(LayeredSolid solid, Precision prec)
    {
        ArgumentNullException.ThrowIfNull(solid);
        return Build(() => solid, prec);
    }

    /// <summary>
    /// Meshes the solid that <paramref name="source"/> gives, holding its regions only while their rings are
    /// taken onto the grid: a caller that lets go of the solid (a source that makes or hands it over) does not
    /// keep the regions alive beside the growing mesh. The source is asked again only if the mesh needs
    /// healing (and must give the same solid). Throws as <see cref="Build(LayeredSolid, Precision)"/>.
    /// </summary>
    public static Mesh Build(Func<LayeredSolid> source, Precision prec)
    {
        ArgumentNullException.ThrowIfNull(source);
        ArgumentNullException.ThrowIfNull(prec);
        var prepared = PrepareFrom(source, prec);
        // Conflicts of each failed attempt; the healed solid is made again from the source with all the
        // patches so far, and let go once its rings are taken (the regions are not held while meshing).
        var heals = new List<List<(int Layer, GridPoint P, GridPoint Q)>>();
        for (int attempt = 0; attempt < MaxHealPasses; attempt++)
        {
            var asm = new MeshAssembly(prec, collectConflicts: true);
            if (asm.Build(prepared) is { } mesh) return mesh;
            heals.Add(asm.Conflicts);
            prepared = null!;
            prepared = PrepareHealed(source, heals, prec);
        }
        return new MeshAssembly(prec).Build(prepared)!;
    }

    /// <summary>The solid's rings on the grid; apart, so that no slot of the caller's frame keeps the solid alive.</summary>
    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.NoInlining)]
    private static List<MeshAssembly.PreparedLayer> PrepareFrom(Func<LayeredSolid> source, Precision prec) =>
        new MeshAssembly(prec).Prepare(source() ?? throw new ArgumentException("the source gave no solid", nameof(source)));

    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.NoInlining)]
    private static List<MeshAssembly.PreparedLayer> PrepareHealed(Func<LayeredSolid> source, List<List<(int Layer, GridPoint P, GridPoint Q)>> heals, Precision prec)
    {
        var s = source();
        for (int k = 0; k < heals.Count; k++) s = Heal(s, heals[k], prec, k);
        return new MeshAssembly(prec).Prepare(s);
    }

    /// <summary>Heal passes before the mesher gives up (each pass doubles the patch width).</summary>
    public const int MaxHealPasses = 6;

    /// <summary>
    /// Where a layer and the one below it, once noded on the grid, bound one edge from opposite sides (the two
    /// solids would touch along a line: an edge of four faces), the layer above gets a thin patch over that edge,
    /// 4 grid steps wide on the first pass and twice as wide on each further one. The solids then overlap
    /// there instead of touching. Such edges come from boundaries that pass within half a grid step of each
    /// other; the patch adds at most (edge length + width) x width of area (about 1e-7 mm^2 a patch on the
    /// default grid).
    /// </summary>
    private static LayeredSolid Heal(LayeredSolid solid, List<(int Layer, GridPoint P, GridPoint Q)> conflicts, Precision prec, int attempt)
    {
        double g = prec.GridMm, w = 4 * g * (1 << attempt);
        var layers = solid.Layers.ToArray();
        foreach (var grp in conflicts.GroupBy(c => c.Layer).OrderBy(x => x.Key))
        {
            var patches = grp.Select(c =>
            {
                var p = new Vec2(c.P.X * g, c.P.Y * g);
                var q = new Vec2(c.Q.X * g, c.Q.Y * g);
                var d = q - p;
                double len = Math.Sqrt(d.X * d.X + d.Y * d.Y);
                double ang = Math.Atan2(d.Y, d.X) * 180 / Math.PI;
                return Region.FromContour(Contour.Rectangle((p + q) * 0.5, len + w, w, ang), prec);
            }).ToList();
            layers[grp.Key] = layers[grp.Key] with { Region = layers[grp.Key].Region.Union(Region.UnionAll(patches, prec)) };
        }
        return new LayeredSolid(layers);
    }

    /// <summary>Largest |coordinate| (mm) whose float32 neighbours are closer than the grid step.</summary>
    [Pure]
    public static double Float32SafeLimitMm(Precision prec)
    {
        // float32 spacing at 2^k is 2^(k-23); distinct grid points stay distinct while spacing < grid.
        double lim = Math.Pow(2, Math.Floor(Math.Log2(prec.GridMm)) + 23);
        return lim;
    }
}
