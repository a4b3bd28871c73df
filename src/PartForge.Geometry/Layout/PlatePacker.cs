using System.Diagnostics.Contracts;

namespace PartForge.Geometry.Layout;

/// <summary>
/// Packs printed parts' footprints onto printer plates (as many plates of one bed size as needed), with the
/// same bottom-left fill engine as <see cref="SheetNester"/>. A footprint larger than the bed in every
/// allowed rotation is reported in <see cref="LayoutResult.NotPlaced"/> and never placed.
/// </summary>
public static class PlatePacker
{
    /// <summary>Packs the footprints; each bin of the result is one plate of the bed's size.</summary>
    /// <param name="footprints">Each part's outline on the bed in its printing orientation (see
    /// <c>PartForge.Geometry.Fabrication.PrintOrientation</c>), with quantities.</param>
    /// <param name="options">Bed size, spacing, edge margin and rotations about z.</param>
    /// <param name="precision">Its chordal tolerance bounds how far the layout outlines may lie outside the exact ones.</param>
    [Pure]
    public static LayoutResult Pack(IReadOnlyList<LayoutItem> footprints, PlateOptions options, Precision precision)
    {
        ArgumentNullException.ThrowIfNull(options);
        var bed = new[] { new SheetStock(options.BedXMm, options.BedYMm, null) };
        return BottomLeftFill.Run(footprints, bed, options.SpacingMm, options.EdgeMarginMm, options.RotationsDeg, precision);
    }
}
