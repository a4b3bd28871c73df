namespace PartForge.Geometry.Layout;

/// <summary>How <see cref="SheetNester"/> lays cut parts out.</summary>
public sealed record NestOptions
{
    /// <summary>
    /// Minimum distance between any two parts and between a part and the sheet edge, mm. Default 2 mm
    /// (common practice for laser cutting of thin sheet: a few kerf widths, so that the web between parts
    /// does not burn through or warp; no published source).
    /// </summary>
    public double SpacingMm { get; init; } = 2.0;

    /// <summary>Allowed rotations in degrees, tried in this order (ties go to the earlier one). Default quarter turns.</summary>
    public IReadOnlyList<double> RotationsDeg { get; init; } = LayoutRotations.QuarterTurns;
}
