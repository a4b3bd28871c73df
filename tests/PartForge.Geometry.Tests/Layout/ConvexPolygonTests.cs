using CsCheck;
using NetTopologySuite.Geometries;
using PartForge.Geometry.Layout;
using PartForge.Geometry.Primitives;

namespace PartForge.Geometry.Tests.Layout;

public class ConvexPolygonTests
{
    private static readonly GeometryFactory F = new();

    private static Polygon Nts(Vec2[] v) =>
        F.CreatePolygon(v.Append(v[0]).Select(p => new Coordinate(p.X, p.Y)).ToArray());

    private static Vec2[] RandomConvex(Random rnd, int n, double r, Vec2 c)
    {
        var pts = Enumerable.Range(0, n).Select(_ =>
        {
            double a = rnd.NextDouble() * 2 * Math.PI, rr = r * (0.3 + 0.7 * rnd.NextDouble());
            return c + new Vec2(rr * Math.Cos(a), rr * Math.Sin(a));
        }).ToArray();
        return ConvexPolygon.Hull(pts);
    }

    [Fact]
    public void MinkowskiSumEqualsTheHullOfAllVertexSums()
    {
        // Source: the Minkowski sum of two convex polygons is the convex hull of the pairwise vertex sums
        // (a standard fact of convex geometry); computed here by brute force with the library's hull.
        Gen.Int.Sample(seed =>
        {
            var rnd = new Random(seed);
            var p = RandomConvex(rnd, 3 + rnd.Next(30), 10 + 40 * rnd.NextDouble(), new Vec2(rnd.NextDouble() * 50, 0));
            var q = RandomConvex(rnd, 3 + rnd.Next(30), 10 + 40 * rnd.NextDouble(), new Vec2(0, rnd.NextDouble() * 50));
            var sum = Nts(ConvexPolygon.MinkowskiSum(p, q));
            var brute = F.CreateMultiPointFromCoords(p.SelectMany(a => q.Select(b => new Coordinate(a.X + b.X, a.Y + b.Y))).ToArray()).ConvexHull();
            Assert.True(sum.IsValid);
            Assert.Equal(brute.Area, sum.Area, 6);
            Assert.True(sum.SymmetricDifference(brute).Area < 1e-6);
        }, iter: 200);
    }

    [Fact]
    public void OutwardSimplificationContainsTheInputWithinTheTolerance()
    {
        Gen.Int.Sample(seed =>
        {
            var rnd = new Random(seed);
            int n = 50 + rnd.Next(400);
            double r = 5 + 100 * rnd.NextDouble(), tol = 0.001 + 0.05 * rnd.NextDouble();
            // A dense nearly-round polygon (the case the simplification is for).
            var v = ConvexPolygon.Hull(Enumerable.Range(0, n).Select(i => Vec2.FromAngleDeg(360.0 * i / n) * r).ToArray());
            var s = ConvexPolygon.SimplifyOutward(v, tol);
            var inner = Nts(v); var outer = Nts(s);
            Assert.True(outer.IsValid);
            Assert.True(s.Length <= v.Length);
            // Contains: nothing of the input sticks out (up to rounding).
            Assert.True(inner.Difference(outer).Area < 1e-9);
            // Within the tolerance: the Hausdorff distance of nested convex polygons is reached at a vertex of the outer.
            foreach (var w in s) Assert.True(inner.Distance(F.CreatePoint(new Coordinate(w.X, w.Y))) <= tol + 1e-9);
        }, iter: 100);
    }

    [Fact]
    public void InflationContainsTheOffsetWithinTheTolerance()
    {
        // Source: the outward offset of a convex polygon by d is its Minkowski sum with a disc of radius d;
        // NTS's buffer (fine round joins) is the independent reference, its area Steiner's formula
        // A + P d + pi d^2.
        Gen.Int.Sample(seed =>
        {
            var rnd = new Random(seed);
            var v = RandomConvex(rnd, 3 + rnd.Next(20), 20, new Vec2(0, 0));
            double d = 0.5 + 5 * rnd.NextDouble(), tol = 0.001 + 0.02 * rnd.NextDouble();
            var g = Nts(ConvexPolygon.Inflate(v, d, tol));
            var exact = Nts(v).Buffer(d, 256);
            Assert.True(exact.Difference(g).Area < 1e-6, "the inflated polygon must contain the offset");
            foreach (var c in g.Coordinates) Assert.True(Nts(v).Distance(F.CreatePoint(c)) <= d + tol + 1e-9);
            double steiner = Math.Abs(ConvexPolygon.Area(v)) + Nts(v).Length * d + Math.PI * d * d;
            Assert.InRange(g.Area, steiner - 1e-6, steiner + g.Length * tol);
        }, iter: 100);
    }

    [Fact]
    public void HullIsCounterClockwiseFromTheLowestVertex()
    {
        var h = ConvexPolygon.Hull(new[] { new Vec2(1, 1), new Vec2(0, 0), new Vec2(2, 0), new Vec2(2, 2), new Vec2(0, 2), new Vec2(1, 0) });
        Assert.Equal(new[] { new Vec2(0, 0), new Vec2(2, 0), new Vec2(2, 2), new Vec2(0, 2) }, h);
        Assert.Throws<ArgumentException>(() => ConvexPolygon.Hull(new[] { new Vec2(0, 0), new Vec2(1, 1), new Vec2(2, 2) }));
    }
}
