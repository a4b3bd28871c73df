using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using PartForge.Geometry.Regions;
using PartForge.Geometry.Solids;

namespace PartForge.Geometry.Tests;

/// <summary>Random regions (unions and differences of circles and rotated rectangles) and layer stacks.</summary>
public static class RandomScenes
{
    public static Contour RandomShape(Random rnd, double spread, double minSize, double maxSize)
    {
        var c = new Vec2((rnd.NextDouble() * 2 - 1) * spread, (rnd.NextDouble() * 2 - 1) * spread);
        double a = minSize + rnd.NextDouble() * (maxSize - minSize);
        if (rnd.Next(2) == 0) return Contour.FullCircle(c, a / 2);
        double b = minSize + rnd.NextDouble() * (maxSize - minSize);
        return Contour.Rectangle(c, a, b, rnd.NextDouble() * 180);
    }

    public static Region RandomRegion(Random rnd, Precision prec)
    {
        var r = Region.FromContour(Contour.FullCircle(new Vec2(0, 0), 15 + rnd.NextDouble() * 15), prec);
        int k = rnd.Next(0, 7);
        for (int i = 0; i < k; i++)
        {
            var s = RandomShape(rnd, 30, 2, 16);
            r = rnd.NextDouble() < 0.3 ? r.Union(Region.FromContour(s, prec)) : r.Difference(Region.FromContour(s, prec, asHole: true));
        }
        return r;
    }

    /// <summary>1..4 layers, touching or with gaps; each layer a random region or a variation of the one below.</summary>
    public static LayeredSolid RandomStack(Random rnd, Precision prec)
    {
        int n = rnd.Next(1, 5);
        var layers = new List<Layer>();
        double z = 0;
        Region? prev = null;
        for (int i = 0; i < n; i++)
        {
            if (i > 0 && rnd.NextDouble() < 0.2) z += 0.5 + rnd.NextDouble() * 2;
            double h = 0.5 + rnd.NextDouble() * 4;
            Region r;
            if (prev is not null && rnd.NextDouble() < 0.6)
            {
                // Same region with a few features added or removed: rings that continue, cross and touch.
                r = prev;
                int k = rnd.Next(1, 4);
                for (int j = 0; j < k; j++)
                {
                    var s = RandomShape(rnd, 30, 2, 14);
                    r = rnd.NextDouble() < 0.5 ? r.Union(Region.FromContour(s, prec)) : r.Difference(Region.FromContour(s, prec, asHole: true));
                }
            }
            else r = RandomRegion(rnd, prec);
            if (!r.IsEmpty) layers.Add(new Layer(z, z + h, r));
            prev = r;
            z += h;
        }
        return new LayeredSolid(layers);
    }
}
