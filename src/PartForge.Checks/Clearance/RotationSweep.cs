using PartForge.Geometry.Exact;
using NetTopologySuite.Geometries;
using NetTopologySuite.Index.Strtree;

namespace PartForge.Checks.Clearance;

/// <summary>
/// Minimum 3D clearance between rotating and stationary prismatic bodies as the rotor turns through one
/// period (one pole pitch: the rotating set looks the same after it).
///
/// Method (everything is prismatic): for a rotating prism turned by theta and a stationary prism, if their
/// z-ranges overlap the distance is the exact 2D distance between the shapes; if not, it is
/// sqrt(dz^2 + d2^2) with dz the axial gap and d2 the 2D distance of the projections (dz alone where they
/// overlap). Pairs are found with an STRtree over the stationary prisms' bounds, queried with the rotating
/// prism's bounds grown by the best clearance so far, and pruned before any exact distance is taken by a
/// rotation-invariant lower bound (axial gap and the gap between the radial ranges about the axis).
/// The coarse step is the smaller of the requested step and the smallest feature's angular size; the
/// minimum is then refined on a bracket of one coarse step either side, three times tenfold.
/// </summary>
public static class RotationSweep
{
    private const int RefineRounds = 3;
    private const int RefineSamples = 10;

    public static SweepResult Run(SweepScene scene, double maxStepDeg = 0.5)
    {
        if (scene.Rotating.Count == 0 || scene.Stationary.Count == 0)
            return new SweepResult(double.PositiveInfinity, 0, null, null, 0, 0, 0, 0);
        double period = scene.PeriodDeg > 0 && scene.PeriodDeg <= 360 ? scene.PeriodDeg : 360;
        double step = Math.Min(maxStepDeg > 0 ? maxStepDeg : 0.5, SmallestFeatureDeg(scene));
        int n = Math.Max(1, (int)Math.Ceiling(period / step - 1e-9));
        step = period / n;

        var tree = Index(scene);
        var bounds = LowerBounds(scene);

        var best = new Candidate(double.PositiveInfinity, 0, -1, -1, 0, 0);
        int evaluations = 0;
        for (int k = 0; k < n; k++)
        {
            Evaluate(scene, tree, bounds, k * step, ref best);
            evaluations++;
        }
        double h = step;
        for (int round = 0; round < RefineRounds && best.Rotating >= 0; round++)
        {
            double centre = best.AngleDeg;
            for (int s = -RefineSamples; s <= RefineSamples; s++)
            {
                if (s == 0) continue;
                Evaluate(scene, tree, bounds, centre + s * h / RefineSamples, ref best);
                evaluations++;
            }
            h /= RefineSamples;
        }
        if (best.Rotating < 0)
            return new SweepResult(double.PositiveInfinity, 0, null, null, 0, 0, step, evaluations);
        double angle = best.AngleDeg % period;
        if (angle < 0) angle += period;
        return new SweepResult(best.Distance, angle, scene.Rotating[best.Rotating], scene.Stationary[best.Stationary],
            best.Axial, best.Planar, step, evaluations);
    }

    /// <summary>The clearance at one rotor angle (no pruning across angles); for tests and the report.</summary>
    public static SweepResult At(SweepScene scene, double angleDeg)
    {
        var tree = Index(scene);
        var best = new Candidate(double.PositiveInfinity, angleDeg, -1, -1, 0, 0);
        Evaluate(scene, tree, LowerBounds(scene), angleDeg, ref best);
        return best.Rotating < 0
            ? new SweepResult(double.PositiveInfinity, angleDeg, null, null, 0, 0, 0, 1)
            : new SweepResult(best.Distance, angleDeg, scene.Rotating[best.Rotating], scene.Stationary[best.Stationary], best.Axial, best.Planar, 0, 1);
    }

    private readonly record struct Candidate(double Distance, double AngleDeg, int Rotating, int Stationary, double Axial, double Planar);

    private static STRtree<int> Index(SweepScene scene)
    {
        var tree = new STRtree<int>();
        for (int i = 0; i < scene.Stationary.Count; i++)
        {
            var b = scene.Stationary[i].Shape.Bounds;
            tree.Insert(new Envelope(b.MinX, b.MaxX, b.MinY, b.MaxY), i);
        }
        tree.Build();
        return tree;
    }

    /// <summary>
    /// Rotation-invariant lower bounds: for each pair, sqrt(dz^2 + g^2) with dz the axial gap (0 when the
    /// z-ranges overlap) and g the gap between the two shapes' radial ranges about the axis; and for each
    /// rotating prism the smallest of its bounds. A prism or pair whose bound is not below the best clearance
    /// so far cannot improve it at any angle and is skipped before it is even rotated.
    /// </summary>
    private sealed record Bounds(double[,] Pair, double[] Prism, int[] PrismOrder);

    private static Bounds LowerBounds(SweepScene scene)
    {
        var rr = scene.Rotating.Select(p => Exact2D.RadialRange(p.Shape)).ToArray();
        var sr = scene.Stationary.Select(p => Exact2D.RadialRange(p.Shape)).ToArray();
        var pair = new double[rr.Length, sr.Length];
        var prism = new double[rr.Length];
        for (int r = 0; r < rr.Length; r++)
        {
            prism[r] = double.PositiveInfinity;
            for (int s = 0; s < sr.Length; s++)
            {
                var rp = scene.Rotating[r];
                var sp = scene.Stationary[s];
                double dz = Math.Max(0, Math.Max(sp.Z0 - rp.Z1, rp.Z0 - sp.Z1));
                double g = Math.Max(0, Math.Max(sr[s].Min - rr[r].Max, rr[r].Min - sr[s].Max));
                pair[r, s] = Math.Sqrt(dz * dz + g * g);
                prism[r] = Math.Min(prism[r], pair[r, s]);
            }
        }
        var order = Enumerable.Range(0, rr.Length).OrderBy(i => prism[i]).ThenBy(i => i).ToArray();
        return new Bounds(pair, prism, order);
    }

    /// <summary>A lower bound that is not below the best cannot improve it; a positive bound cannot interfere either.</summary>
    private static bool CannotImprove(double lowerBound, double best) => best > 0 ? lowerBound >= best : lowerBound > 0;

    private static void Evaluate(SweepScene scene, STRtree<int> tree, Bounds bounds, double angleDeg, ref Candidate best)
    {
        // Prisms in ascending order of their lower bound: once one cannot improve, none after it can.
        foreach (int r in bounds.PrismOrder)
        {
            if (CannotImprove(bounds.Prism[r], best.Distance)) break;
            var rp = scene.Rotating[r];
            var shape = rp.Shape.RotatedDeg(angleDeg);
            var b = shape.Bounds;
            double grow = double.IsFinite(best.Distance) ? Math.Max(0, best.Distance) : 1e9;
            var env = new Envelope(b.MinX - grow, b.MaxX + grow, b.MinY - grow, b.MaxY + grow);
            var hits = tree.Query(env);
            // Deterministic order regardless of the tree's internal order.
            var order = hits.ToArray();
            int rr = r;
            Array.Sort(order, (x, y) => bounds.Pair[rr, x] != bounds.Pair[rr, y] ? bounds.Pair[rr, x].CompareTo(bounds.Pair[rr, y]) : x.CompareTo(y));
            foreach (int s in order)
            {
                if (CannotImprove(bounds.Pair[r, s], best.Distance)) break;
                var sp = scene.Stationary[s];
                double dz = Math.Max(sp.Z0 - rp.Z1, rp.Z0 - sp.Z1);
                if (dz >= best.Distance) continue;
                if (dz >= 0)
                {
                    double budget = double.IsFinite(best.Distance) ? Math.Sqrt(best.Distance * best.Distance - dz * dz) : double.PositiveInfinity;
                    double d2 = Exact2D.ShapeShape(shape, sp.Shape, budget, out bool overlap);
                    if (overlap) d2 = 0;
                    if (!double.IsFinite(d2)) continue;
                    double d = Math.Sqrt(dz * dz + d2 * d2);
                    if (d < best.Distance) best = new Candidate(d, angleDeg, r, s, dz, d2);
                }
                else
                {
                    double d2 = Exact2D.ShapeShape(shape, sp.Shape, double.IsFinite(best.Distance) && best.Distance > 0 ? best.Distance : double.PositiveInfinity, out bool overlap);
                    double d = overlap ? dz : d2;   // interference: minus the axial shift that separates them
                    if (d < best.Distance) best = new Candidate(d, angleDeg, r, s, 0, overlap ? 0 : d2);
                }
            }
        }
    }

    /// <summary>
    /// Smallest angular size, seen from the axis, of any feature that does not enclose the axis: the angle
    /// subtended by its bounding box's half-diagonal at its centre's radius (at least 0.01 degree).
    /// </summary>
    public static double SmallestFeatureDeg(SweepScene scene)
    {
        double best = 360;
        foreach (var p in scene.Rotating.Concat(scene.Stationary))
        {
            var b = p.Shape.Bounds;
            if (b.MinX <= 0 && b.MaxX >= 0 && b.MinY <= 0 && b.MaxY >= 0) continue; // encloses the axis: turns into itself
            double half = 0.5 * Math.Sqrt(b.Width * b.Width + b.Height * b.Height);
            double r = b.Center.Length;
            if (r <= half) continue;
            double deg = 2 * Math.Asin(Math.Min(1, half / r)) * 180 / Math.PI;
            best = Math.Min(best, deg);
        }
        return Math.Max(0.01, best);
    }
}
