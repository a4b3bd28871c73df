using PartForge.Geometry.Primitives;

namespace PartForge.Geometry.Fabrication;

/// <summary>
/// One connected down-facing surface that needs support.
/// </summary>
/// <param name="ZMm">Lowest z of the surface (its level, for a horizontal one).</param>
/// <param name="AreaMm2">Its area (true surface area; for a horizontal one also its area in plan).</param>
/// <param name="MinXY">Lower-left corner of its box in plan.</param>
/// <param name="MaxXY">Upper-right corner of its box in plan.</param>
/// <param name="CentroidXY">Area centroid in plan.</param>
/// <param name="IsHorizontal">True for a flat face (all of it at one z): the only kind a prismatic part has.</param>
/// <param name="IsIsland">True when nothing below touches it along its boundary: it floats (a part of the layer
/// that starts in mid air), and a support is needed under all of it.</param>
/// <param name="SpanMm">For a horizontal face that rests on the layer below along part of its boundary: the largest
/// distance from a point of the face to where it rests (how far it bridges or sticks out); null for an island
/// or a sloped surface.</param>
/// <param name="FarthestXY">Where that largest distance occurs (the point farthest from support); null with SpanMm.</param>
public sealed record OverhangRegion(
    double ZMm, double AreaMm2, Vec2 MinXY, Vec2 MaxXY, Vec2 CentroidXY,
    bool IsHorizontal, bool IsIsland, double? SpanMm, Vec2? FarthestXY);
