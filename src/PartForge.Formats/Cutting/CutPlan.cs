using PartForge.Geometry.Primitives;

namespace PartForge.Formats.Cutting;

/// <summary>
/// A cut sheet after kerf compensation, in writing order (marks, holes, outlines), with the exact bounding
/// box of all paths. Built by <see cref="KerfCompensation.Apply"/>; the DXF and SVG writers both use it, so
/// both files carry identical geometry.
/// </summary>
public sealed record CutPlan(string PartName, double KerfMm, IReadOnlyList<CutPath> Paths, Vec2 MinMm, Vec2 MaxMm)
{
    /// <summary>The sheet of a nest (see <see cref="CutSheet.Frame"/>), or null.</summary>
    public SheetFrame? Frame { get; init; }

    /// <summary>Half the kerf: how far outlines moved out and holes moved in.</summary>
    public double HalfKerfMm => KerfMm / 2;

    public double WidthMm => MaxMm.X - MinMm.X;

    public double HeightMm => MaxMm.Y - MinMm.Y;
}
