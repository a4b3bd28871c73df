using PartForge.Formats.Cutting;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Formats.Tests.Cutting;

/// <summary>The small test plate: 60 x 40 with a round hole and a slot, two marks, kerf 0.2 mm.</summary>
internal static class SamplePlate
{
    public const double Width = 60, Height = 40, HoleRadius = 4, SlotRadius = 3, SlotStraight = 12, Kerf = 0.2;
    public static readonly Vec2 HoleCenter = new(15, 20), SlotCenter = new(40, 20);

    public static Contour Slot(Vec2 c, double straight, double r)
    {
        var right = new ArcSegment(c + new Vec2(straight / 2, 0), r, -90, 180);
        var left = new ArcSegment(c + new Vec2(-straight / 2, 0), r, 90, 180);
        return Contour.FromSegments(new Segment[] { right, new LineSegment(right.End, left.Start), left, new LineSegment(left.End, right.Start) });
    }

    public static Profile Profile() => Geometry.Profiles.Profile.Of(
        Contour.Polygon(new[] { new Vec2(0, 0), new Vec2(Width, 0), new Vec2(Width, Height), new Vec2(0, Height) }),
        Contour.FullCircle(HoleCenter, HoleRadius),
        Slot(SlotCenter, SlotStraight, SlotRadius));

    public static CutSheet Sheet() => new("test-plate", Profile(),
        new[] { Contour.FullCircle(new Vec2(5, 35), 0.5), Contour.Rectangle(new Vec2(52, 35), 6, 2, 0) }, Kerf);
}
