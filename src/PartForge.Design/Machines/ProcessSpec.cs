namespace PartForge.Design.Machines;

/// <summary>How parts are made (<c>process.*</c>): the printer's nozzle and layer, the minimum wall in lines, the laser kerf, and the DXF contour style.</summary>
public sealed record ProcessSpec(double NozzleMm, double LayerMm, int MinWallLines, double KerfMm, CutContourStyle DxfContours)
{
    /// <summary>Smallest printable wall: min_wall_lines x nozzle, mm.</summary>
    public double MinWallMm => MinWallLines * NozzleMm;
}
