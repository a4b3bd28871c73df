namespace PartForge.Export.Report;

/// <summary>
/// The radial extents of one coil where the half-section plane (through the coil's centre, along the radius)
/// cuts it, mm from the shaft axis: the copper from <paramref name="CopperRMin"/> to
/// <paramref name="CopperRMax"/> less the window (hole) from <paramref name="WindowRMin"/> to
/// <paramref name="WindowRMax"/>, and the former's flanges from <paramref name="FormerRMin"/> to <paramref name="FormerRMax"/>.
/// </summary>
public sealed record CoilSection(double CopperRMin, double CopperRMax, double WindowRMin, double WindowRMax, double FormerRMin, double FormerRMax);
