using System.Diagnostics.Contracts;

namespace PartForge.Geometry.Layout;

/// <summary>
/// Nests cut parts on sheets: bottom-left fill on no-fit polygons of the parts' convex hulls (see the
/// kernel README, "Sheet nesting"). Every part ends at least <see cref="NestOptions.SpacingMm"/> from every
/// other part and from the sheet edge; holes move with their part; nothing is placed inside another
/// part's hole or notch (the hull is a conservative stand-in for a concave outline).
/// </summary>
public static class SheetNester
{
    /// <summary>
    /// Lays out the parts on as few sheets as the method finds. Sheet sizes are tried in the order given
    /// whenever a new sheet is needed (the first size that still has sheets and holds the part when empty).
    /// </summary>
    /// <param name="parts">Exact outlines with quantities; ids must be unique.</param>
    /// <param name="sheets">Available sizes, in order of preference.</param>
    /// <param name="options">Spacing and rotations.</param>
    /// <param name="precision">Its chordal tolerance bounds how far the layout outlines may lie outside the exact
    /// outlines (they never lie inside them), so it is also how much material the method may waste per edge.</param>
    [Pure]
    public static LayoutResult Nest(IReadOnlyList<LayoutItem> parts, IReadOnlyList<SheetStock> sheets, NestOptions options, Precision precision)
    {
        ArgumentNullException.ThrowIfNull(options);
        return BottomLeftFill.Run(parts, sheets, options.SpacingMm, options.SpacingMm, options.RotationsDeg, precision);
    }
}
