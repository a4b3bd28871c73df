using PartForge.Geometry.Profiles;

namespace PartForge.Formats.Cutting;

/// <summary>
/// Splits arcs that sweep more than a half turn into equal halves, so that every written arc is at most
/// 180 degrees (a polyline bulge of at most 1, an SVG arc with the large-arc flag never needed).
/// </summary>
internal static class ArcPieces
{
    public static IEnumerable<Segment> Of(Contour c)
    {
        foreach (var s in c.Segments)
        {
            if (s is ArcSegment a && Math.Abs(a.SweepDeg) > 180)
            {
                double half = a.SweepDeg / 2;
                yield return a with { SweepDeg = half };
                yield return a with { StartDeg = a.StartDeg + half, SweepDeg = half };
            }
            else yield return s;
        }
    }
}
