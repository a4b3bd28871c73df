using System.Diagnostics.Contracts;
using PartForge.Geometry.Regions;

namespace PartForge.Geometry.Solids;

/// <summary>
/// An immutable prismatic solid: a stack of layers, z ascending, each touching the next or leaving a gap
/// (a gap makes a separate shell). Layers never overlap in z. Every part of the project is one of these.
/// </summary>
public sealed class LayeredSolid
{
    public LayeredSolid(IEnumerable<Layer> layers)
    {
        ArgumentNullException.ThrowIfNull(layers);
        var list = layers.ToList();
        for (int i = 0; i < list.Count; i++)
        {
            var l = list[i] ?? throw new ArgumentException("null layer", nameof(layers));
            if (l.Region is null) throw new ArgumentException($"layer {i} has no region", nameof(layers));
            if (!double.IsFinite(l.Z0) || !double.IsFinite(l.Z1)) throw new ArgumentException($"layer {i}: z must be finite", nameof(layers));
            if (!(l.Z1 > l.Z0)) throw new ArgumentException($"layer {i}: z1 {l.Z1} must exceed z0 {l.Z0}", nameof(layers));
            if (i > 0 && l.Z0 < list[i - 1].Z1) throw new ArgumentException($"layer {i} starts at z {l.Z0}, below the top {list[i - 1].Z1} of the layer before (layers must ascend without overlap)", nameof(layers));
        }
        Layers = list;
    }

    /// <summary>The layers, z ascending.</summary>
    public IReadOnlyList<Layer> Layers { get; }

    /// <summary>A single extruded region.</summary>
    [Pure]
    public static LayeredSolid Extrude(Region region, double z0, double z1) => new(new[] { new Layer(z0, z1, region) });

    /// <summary>Sum over layers of region area x height (mm^3): the exact volume of the discretised solid.</summary>
    public double AnalyticVolume => Layers.Sum(l => l.Volume);

    /// <summary>Int (x^2 + y^2) dV about the z axis, mm^5: each layer's polar second moment times its height (times a
    /// density, the moment of inertia about the axis).</summary>
    public double AnalyticPolarMomentMm5 => Layers.Sum(l => l.Region.PolarMomentMm4 * l.HeightMm);

    public bool IsEmpty => Layers.All(l => l.Region.IsEmpty);

    /// <summary>Lowest and highest z of any non-empty layer, or (0, 0) when empty.</summary>
    public (double Z0, double Z1) ZRange
    {
        get
        {
            var ne = Layers.Where(l => !l.Region.IsEmpty).ToList();
            return ne.Count == 0 ? (0, 0) : (ne[0].Z0, ne[^1].Z1);
        }
    }

    /// <summary>Moved along z.</summary>
    [Pure]
    public LayeredSolid Translated(double dz) => new(Layers.Select(l => l with { Z0 = l.Z0 + dz, Z1 = l.Z1 + dz }));

    /// <summary>Mirrored in the plane z = 0 (z -> -z); the layer order is reversed so z still ascends.</summary>
    [Pure]
    public LayeredSolid MirroredZ() => new(Layers.Reverse().Select(l => new Layer(-l.Z1, -l.Z0, l.Region)));

    /// <summary>Every layer's region transformed (e.g. rotated or mirrored in y), z unchanged.</summary>
    [Pure]
    public LayeredSolid MapRegions(Func<Region, Region> map) => new(Layers.Select(l => l with { Region = map(l.Region) }));

    /// <summary>The stacked layers of both solids; throws if they overlap in z.</summary>
    [Pure]
    public LayeredSolid Stacked(LayeredSolid above) => new(Layers.Concat(above.Layers));
}
