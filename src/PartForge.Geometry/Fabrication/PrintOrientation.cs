using System.Diagnostics.Contracts;
using PartForge.Geometry.Meshes;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;

namespace PartForge.Geometry.Fabrication;

/// <summary>
/// The printing orientation of a prismatic layered solid and the rigid transform from part-local to bed
/// coordinates. Rule (largest flat face down): a stack of layers has two candidate faces on the bed, the
/// bottom of its lowest layer and the top of its highest; the larger (by region area) goes down, so the
/// part is flipped when the top layer's region is strictly larger than the bottom layer's (a tie keeps the
/// part as modelled). Flipping is a half turn about the x axis (x, y, z) -> (x, -y, -z), a rotation, not a
/// mirror, so the printed part is the same part; then a shift along z so the part starts at z = 0.
/// </summary>
/// <param name="Flipped">True when the part prints upside down (top face on the bed).</param>
/// <param name="BottomAreaMm2">Area of the lowest layer's region (the bottom face), mm^2.</param>
/// <param name="TopAreaMm2">Area of the highest layer's region (the top face), mm^2.</param>
/// <param name="ZMinMm">Lowest z of the part in its own coordinates.</param>
/// <param name="ZMaxMm">Highest z of the part in its own coordinates.</param>
public sealed record PrintOrientation(bool Flipped, double BottomAreaMm2, double TopAreaMm2, double ZMinMm, double ZMaxMm)
{
    /// <summary>Chooses the orientation of a solid by the rule above; a solid with no material is an argument error.</summary>
    [Pure]
    public static PrintOrientation Choose(LayeredSolid solid)
    {
        ArgumentNullException.ThrowIfNull(solid);
        var layers = solid.Layers.Where(l => !l.Region.IsEmpty).ToList();
        if (layers.Count == 0) throw new ArgumentException("the solid has no material to print", nameof(solid));
        double bottom = layers[0].Region.Area, top = layers[^1].Region.Area;
        return new PrintOrientation(top > bottom, bottom, top, layers[0].Z0, layers[^1].Z1);
    }

    /// <summary>The sign applied to y and z by the transform (+1 as modelled, -1 when flipped).</summary>
    public double AxisSign => Flipped ? -1 : 1;

    /// <summary>The shift along z after the sign: bed z = AxisSign x z + ZShiftMm.</summary>
    public double ZShiftMm => Flipped ? ZMaxMm : -ZMinMm;

    /// <summary>
    /// Where a part-local point goes on the bed: (x, s y, s z + ZShiftMm) with s = <see cref="AxisSign"/>.
    /// As a 3MF row-vector matrix: m00 = 1, m11 = m22 = s, translation (0, 0, ZShiftMm).
    /// </summary>
    [Pure]
    public Vec3 ToBed(Vec3 local) => new(local.X, AxisSign * local.Y, AxisSign * local.Z + ZShiftMm);

    /// <summary>The solid in bed coordinates (exact on the grid: a mirror of the layer order and of each region in y).</summary>
    [Pure]
    public LayeredSolid Apply(LayeredSolid solid)
    {
        ArgumentNullException.ThrowIfNull(solid);
        var s = Flipped ? solid.MirroredZ().MapRegions(r => r.MirroredY()) : solid;
        return s.Translated(ZShiftMm);
    }

    /// <summary>A mesh of the part in bed coordinates (a rotation and a shift: triangles stay outward).</summary>
    [Pure]
    public Mesh Apply(Mesh mesh)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        return mesh.Transformed(ToBed);
    }

    /// <summary>
    /// The footprint of a solid on the bed: the union of its layers' regions (the solid's shadow along z).
    /// Pass the oriented solid (<see cref="Apply(LayeredSolid)"/>) to get the footprint for plate packing.
    /// </summary>
    [Pure]
    public static Region Footprint(LayeredSolid solid)
    {
        ArgumentNullException.ThrowIfNull(solid);
        var regions = solid.Layers.Select(l => l.Region).Where(r => !r.IsEmpty).ToList();
        if (regions.Count == 0) throw new ArgumentException("the solid has no material", nameof(solid));
        return Region.UnionAll(regions, regions[0].Precision);
    }
}
