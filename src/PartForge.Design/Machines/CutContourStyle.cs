namespace PartForge.Design.Machines;

/// <summary>How cut sheets (DXF) carry contours that are not full circles (<c>process.dxf_contours</c>).</summary>
public enum CutContourStyle
{
    /// <summary>One closed polyline per contour, arcs as bulges.</summary>
    Polyline,

    /// <summary>Line and arc entities chained end to end, for laser-cutter software that reads no bulges.</summary>
    Entities,
}
