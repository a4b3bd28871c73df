using System.Diagnostics.Contracts;
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
        ArgumentNullException.ThrowIfNull(prec);
        return new MeshAssembly(prec).Build(solid);
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
