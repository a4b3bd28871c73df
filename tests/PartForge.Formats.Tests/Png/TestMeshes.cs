using PartForge.Formats.Png;
using PartForge.Geometry.Primitives;

namespace PartForge.Formats.Tests.Png;

/// <summary>Small closed, outward-oriented meshes built by hand for the rasteriser tests.</summary>
internal static class TestMeshes
{
    /// <summary>An axis-aligned box from min to max, 12 triangles, normals outward.</summary>
    public static RenderItem Box(Vec3 min, Vec3 max, Rgb colour)
    {
        var v = new Vec3[8];
        for (int i = 0; i < 8; i++)
            v[i] = new Vec3((i & 1) != 0 ? max.X : min.X, (i & 2) != 0 ? max.Y : min.Y, (i & 4) != 0 ? max.Z : min.Z);
        int[] t =
        [
            0, 2, 1, 1, 2, 3, // z min (down)
            4, 5, 6, 5, 7, 6, // z max (up)
            0, 1, 4, 1, 5, 4, // y min
            2, 6, 3, 3, 6, 7, // y max
            0, 4, 2, 2, 4, 6, // x min
            1, 3, 5, 3, 7, 5, // x max
        ];
        return new RenderItem(v, t, colour);
    }
}
