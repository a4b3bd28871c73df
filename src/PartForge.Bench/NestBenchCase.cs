using PartForge.Geometry;
using PartForge.Geometry.Layout;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Bench;

/// <summary>
/// Sheet nesting of 50 mixed cut parts (invented scenario): discs with bore and bolt holes, polygon discs
/// with 100-400 straight segments, rings, fork-shaped gauges with a round-ended slot, rectangles; all
/// different, 3 mm spacing, quarter turns, 0.01 mm chordal tolerance, 600 x 400 sheets as many as needed.
/// Target &lt; 1 s.
/// </summary>
public sealed class NestBenchCase : IBenchCase
{
    private LayoutItem[] _parts = Array.Empty<LayoutItem>();
    private static readonly Precision Prec = Precision.FromChordalTolerance(0.01);

    public string Name => "nest-50";
    public string Description => "sheet nesting: 50 mixed parts (discs with holes, 100-400-segment polygons, rings, forks, rectangles) on 600 x 400 sheets; target < 1 s";

    public void Setup() => _parts = Parts();

    public IReadOnlyDictionary<string, double> Run()
    {
        var res = SheetNester.Nest(_parts, new[] { new SheetStock(600, 400) }, new NestOptions { SpacingMm = 3 }, Prec);
        return new Dictionary<string, double>
        {
            ["sheets"] = res.Bins.Count,
            ["placed"] = res.Placements.Count,
            ["mean-utilisation"] = res.Bins.Average(b => b.Utilisation),
            ["first-sheet-utilisation"] = res.Bins[0].Utilisation,
        };
    }

    /// <summary>The 50 invented parts, sizes spread so that no two are alike.</summary>
    public static LayoutItem[] Parts()
    {
        var list = new List<LayoutItem>();
        for (int k = 0; k < 10; k++)
        {
            double r = 30 + 2.5 * k;
            var holes = new List<Contour> { Contour.FullCircle(new Vec2(0, 0), 4 + 0.5 * k) };
            for (int b = 0; b < 6; b++) holes.Add(Contour.FullCircle(Vec2.FromAngleDeg(60 * b) * (0.7 * r), 2));
            list.Add(new LayoutItem($"disc{k}", new Profile(new[] { Contour.FullCircle(new Vec2(0, 0), r) }, holes), 1));
        }
        for (int k = 0; k < 10; k++)
        {
            int n = 100 + 33 * k;
            double r = 25 + 2.5 * k;
            var pts = Enumerable.Range(0, n).Select(i => Vec2.FromAngleDeg(360.0 * i / n) * (r * (1 + 0.03 * Math.Cos(12 * 2 * Math.PI * i / n)))).ToArray();
            list.Add(new LayoutItem($"lobed{k}", Profile.Of(Contour.Polygon(pts), Contour.FullCircle(new Vec2(0, 0), 0.3 * r)), 1));
        }
        for (int k = 0; k < 10; k++)
        {
            double ro = 35 + 3 * k;
            list.Add(new LayoutItem($"ring{k}", Profile.Of(Contour.FullCircle(new Vec2(0, 0), ro), Contour.FullCircle(new Vec2(0, 0), ro - 8)), 1));
        }
        for (int k = 0; k < 10; k++)
        {
            double w = 40 + 3 * k, h = 30 + 2 * k, s = 8 + 0.5 * k, d = h * 0.6;
            double cx = w / 2, half = s / 2;
            var arc = new ArcSegment(new Vec2(cx, h - d), half, 0, -180);
            var segs = new Segment[]
            {
                new LineSegment(new Vec2(0, 0), new Vec2(w, 0)), new LineSegment(new Vec2(w, 0), new Vec2(w, h)),
                new LineSegment(new Vec2(w, h), new Vec2(cx + half, h)), new LineSegment(new Vec2(cx + half, h), arc.Start), arc,
                new LineSegment(arc.End, new Vec2(cx - half, h)), new LineSegment(new Vec2(cx - half, h), new Vec2(0, h)),
                new LineSegment(new Vec2(0, h), new Vec2(0, 0)),
            };
            list.Add(new LayoutItem($"fork{k}", Profile.Of(Contour.FromSegments(segs)), 1));
        }
        for (int k = 0; k < 10; k++)
            list.Add(new LayoutItem($"rect{k}", Profile.Of(Contour.Rectangle(new Vec2(0, 0), 30 + 8 * k, 15 + 3 * k, 0)), 1));
        return list.ToArray();
    }
}
