namespace PartForge.Geometry.Meshes;

/// <summary>A point of the precision grid in integer grid units (exact arithmetic for orientation tests).</summary>
internal readonly record struct GridPoint(long X, long Y)
{
    /// <summary>Packed key for hashing; valid while |X|, |Y| &lt; 2^31.</summary>
    public long Key => ((X + 0x80000000L) << 32) | (Y + 0x80000000L);

    public static GridPoint FromKey(long k) => new((k >>> 32) - 0x80000000L, (k & 0xffffffffL) - 0x80000000L);

    /// <summary>Twice the signed area of (a, b, c): positive for a left turn.</summary>
    public static long Orient(GridPoint a, GridPoint b, GridPoint c) => (b.X - a.X) * (c.Y - a.Y) - (b.Y - a.Y) * (c.X - a.X);
}
