using PartForge.Geometry.Profiles;

namespace PartForge.Formats.Cutting;

/// <summary>
/// One path of a compensated cut plan: the contour the cutter's centre line follows. Through cuts are
/// oriented outlines counter-clockwise, holes clockwise; marks keep the direction they were given.
/// </summary>
/// <param name="Kind">Mark, hole or outline.</param>
/// <param name="Contour">The compensated contour (lines and true arcs, or a full circle).</param>
/// <param name="SourceIndex">Index of the contour in the sheet's list it came from (Marks, Holes or Outers).</param>
public sealed record CutPath(CutPathKind Kind, Contour Contour, int SourceIndex);
