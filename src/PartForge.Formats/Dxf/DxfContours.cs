namespace PartForge.Formats.Dxf;

/// <summary>How <see cref="DxfWriter"/> writes a contour that is not a full circle (full circles are always CIRCLE).</summary>
public enum DxfContours
{
    /// <summary>One closed POLYLINE of VERTEX entities; arcs are carried exactly by the group 42 bulge.</summary>
    Polyline = 0,

    /// <summary>LINE and ARC entities chained end to end in the contour's order (for laser-cutter software
    /// that reads no bulges).</summary>
    Entities = 1,
}
