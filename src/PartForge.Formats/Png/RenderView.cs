namespace PartForge.Formats.Png;

/// <summary>
/// How a picture is taken: an orthographic camera looking at the scene from a direction given by azimuth
/// (about +z, from +x) and elevation (above the xy plane), fitted to the image with a margin.
/// </summary>
public sealed record RenderView
{
    /// <summary>Image width in pixels.</summary>
    public int Width { get; init; } = 800;

    /// <summary>Image height in pixels.</summary>
    public int Height { get; init; } = 600;

    /// <summary>Camera direction about +z, measured from +x, degrees.</summary>
    public double AzimuthDeg { get; init; } = -60;

    /// <summary>Camera height above the xy plane, degrees (90 = looking straight down).</summary>
    public double ElevationDeg { get; init; } = 35;

    /// <summary>Free border on each side as a fraction of the image size when the scale is fitted.</summary>
    public double Margin { get; init; } = 0.06;

    /// <summary>Fixed scale; when null the scene is fitted into the image.</summary>
    public double? PixelsPerMm { get; init; }

    /// <summary>Samples per pixel along each axis (1 = no anti-aliasing); the result is a box-filtered average.</summary>
    public int Supersample { get; init; } = 2;

    public Rgb Background { get; init; } = new(246, 244, 238);

    /// <summary>Draw dark lines at silhouettes and depth steps (pocket rims, holes, layer steps).</summary>
    public bool Outlines { get; init; } = true;

    /// <summary>Depth step that counts as an edge, as a fraction of the scene's projected size.</summary>
    public double OutlineDepthFraction { get; init; } = 0.004;

    /// <summary>Light not depending on the surface direction, 0..1.</summary>
    public double Ambient { get; init; } = 0.30;
}
