namespace PartForge.Geometry.Layout;

/// <summary>How <see cref="PlatePacker"/> lays printed parts out on a printer bed.</summary>
/// <param name="BedXMm">Printable size of the bed along x.</param>
/// <param name="BedYMm">Printable size of the bed along y.</param>
public sealed record PlateOptions(double BedXMm, double BedYMm)
{
    /// <summary>
    /// Minimum distance between two parts' footprints, mm. Default 3 mm (common practice: 2-5 mm keeps the
    /// nozzle and the first-layer skirt or brim of one part off its neighbour; no published source).
    /// </summary>
    public double SpacingMm { get; init; } = 3.0;

    /// <summary>Minimum distance from a footprint to the edge of the printable area, mm. Default 0 (the bed
    /// size given is already the printable area).</summary>
    public double EdgeMarginMm { get; init; } = 0.0;

    /// <summary>Allowed rotations about z in degrees, tried in this order. Default quarter turns.</summary>
    public IReadOnlyList<double> RotationsDeg { get; init; } = LayoutRotations.QuarterTurns;
}
