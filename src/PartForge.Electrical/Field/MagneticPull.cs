using PartForge.Design.Machines;
using PartForge.Design.Machines.Magnets;
using PartForge.Design.Stack;
using PartForge.Geometry.Primitives;
using PartForge.Electrical.Flux;

namespace PartForge.Electrical.Field;

/// <summary>
/// Axial forces between magnets from the surface-charge model, exact for uniformly magnetised bodies with
/// mu_r = 1: the force on an axially magnetised prism is F_z = (Br/mu0) [flux of the other bodies' Bz through
/// its top face - through its bottom face], each flux integrated by composite Gauss-Legendre quadrature graded
/// towards the face edges (where the field of a close neighbour varies fastest). Back iron by the image
/// method (ideal iron; first-order images only when there are two irons) — an approximation.
/// </summary>
public static class MagneticPull
{
    /// <summary>Vacuum permeability, H/m.</summary>
    public const double Mu0 = 4e-7 * Math.PI;

    /// <summary>The simple estimate F = B^2 A / (2 mu0), N, for a flux density in tesla over an area in mm^2.</summary>
    public static double SimpleEstimateN(double bTesla, double areaMm2) => bTesla * bTesla * areaMm2 * 1e-6 / (2 * Mu0);

    /// <summary>
    /// Axial force on <paramref name="target"/> from the field of <paramref name="sources"/>, N (positive: +z).
    /// <paramref name="gapMm"/> is the smallest axial distance between the target's faces and the sources, used
    /// to grade the face quadrature towards the edges.
    /// </summary>
    public static double AxialForceN(MagnetSource target, IReadOnlyList<MagnetSource> sources, double gapMm, int order = 4)
    {
        var (pts, wts) = FacePoints(target.Shape, target.CentreDeg, gapMm, order);
        double top = 0, bottom = 0;
        for (int i = 0; i < pts.Length; i++)
        {
            var (x, y) = pts[i];
            double bt = 0, bb = 0;
            for (int s = 0; s < sources.Count; s++)
            {
                bt += sources[s].Bz(x, y, target.ZMaxMm);
                bb += sources[s].Bz(x, y, target.ZMinMm);
            }
            top += wts[i] * bt;
            bottom += wts[i] * bb;
        }
        return target.SignedBrTesla / Mu0 * (top - bottom) * 1e-6;
    }

    /// <summary>The forces of a machine (see <see cref="MagneticPullResult"/>), with the magnets at <paramref name="brTesla"/>
    /// (default: the design's Br at 20 C).</summary>
    public static MagneticPullResult Compute(MachineModel machine, IReadOnlyList<BackIronFluxResult>? ironFlux = null, double? brTesla = null)
    {
        var g = machine.Magnets.Shape;
        double br = brTesla ?? machine.Magnets.BrTesla;
        var stack = machine.Stack;
        int poles = machine.Poles;
        double far = RotorField.DefaultFarFactor;
        var mags = stack.OfKind(SlabKind.Magnet).OrderByDescending(s => s.ZMax).ToList();
        // Steel faces (back iron or a steel rotor), front first, with their image strengths (1 unless saturated).
        var planes = (ironFlux?.Select(f => (f.Plane, f.ImageStrength)).ToList()
                      ?? IronPlane.Of(machine).Select(p => (Plane: p, ImageStrength: 1.0)).ToList())
            .OrderByDescending(p => p.Plane.FaceZMm).ToList();
        bool iron = planes.Count > 0;
        List<MagnetSource> Ring(AxialSlab m) => Enumerable.Range(0, poles)
            .Select(k => new MagnetSource(g, k * 360.0 / poles, m.ZMin, m.ZMax, machine.Magnets.SignOf(k) * br, far)).ToList();
        var front = Ring(mags[0]);
        var target = front[0];
        double frontIronPlane = iron ? planes[0].Plane.FaceZMm : 0;

        double toIron = 0;
        if (iron)
        {
            var imgs = front.Select(m => m.ImageIn(frontIronPlane, far, planes[0].ImageStrength)).ToList();
            double gap = 2 * (frontIronPlane - target.ZMaxMm);
            // Touching (through pockets on the iron): the coplanar faces contribute their principal value, 0, so
            // the nearest face that matters is a magnet thickness away.
            double grade = gap > 1e-9 ? gap : g.ThicknessMm;
            toIron = Math.Abs(AxialForceN(target, imgs, grade));
        }

        double perMagnet = 0, faceToFace = 0;
        IReadOnlyList<PullCurvePoint> curve = Array.Empty<PullCurvePoint>();
        if (machine.Layout.StatorBetweenRotors && mags.Count == 2)
        {
            var back = Ring(mags[1]);
            faceToFace = target.ZMinMm - back[0].ZMaxMm;
            if (iron)
            {
                double? upperIron = planes.Count >= 1 ? planes[0].Plane.FaceZMm : null;
                double? lowerIron = planes.Count >= 2 ? planes[^1].Plane.FaceZMm : null;
                double ku = planes[0].ImageStrength, kl = planes.Count >= 2 ? planes[^1].ImageStrength : 1;
                double lowerMax = back[0].ZMaxMm, s0 = faceToFace;
                var series = new IronPullSeries(g, poles, br, far);
                perMagnet = Math.Abs(series.PullN(lowerMax + s0, lowerMax, upperIron, lowerIron)) / poles;
                // The assembly curve: a Gauss order lower and the series to 1e-3 (a fraction of a percent; tested).
                var coarse = new IronPullSeries(g, poles, br, far, CurveOrder, CurveTolerance);
                curve = Curve(s0, perMagnet * poles, s => coarse.PullN(lowerMax + s, lowerMax, upperIron + (s - s0), lowerIron, ku, kl));
            }
            else
            {
                var pair = new IronPullSeries(g, poles, br, far, CurveOrder, CurveTolerance);
                perMagnet = Math.Abs(MagneticPull.AxialForceN(target, back, faceToFace));
                curve = Curve(faceToFace, perMagnet * poles, s => pair.RingForceN(s));
            }
        }
        return new MagneticPullResult
        {
            MagnetToBackIronN = toIron,
            RotorToRotorPerMagnetN = perMagnet,
            RotorToRotorN = perMagnet * poles,
            FaceToFaceMm = faceToFace,
            AssemblyCurve = curve,
            Method = iron
                ? "surface-charge force between uniformly magnetised magnets; steel faces by the full image series of both faces (magnet-magnet, magnet-iron and iron-iron attraction), summed to 1e-4; images weakened where the steel saturates (flux per pole limited to the steel section at 2.0 T)."
                : "surface-charge force between uniformly magnetised magnets (mu_r = 1, no iron).",
        };
    }

    /// <summary>Gauss order of the face quadrature for the assembly curve.</summary>
    public const int CurveOrder = 3;

    /// <summary>Relative tolerance of the image series for the assembly curve.</summary>
    public const double CurveTolerance = 1e-3;

    /// <summary>Rotor separations beyond the running one at which the assembly curve is given, mm (added to the running face-to-face gap).</summary>
    public static readonly double[] CurveStepsMm = { 0, 1, 2, 3, 5, 7.5, 10, 15, 20, 30, 40, 60, 80, 100 };

    /// <summary>The pull at growing separation, stopping once it is below 1 % of the running pull.</summary>
    private static IReadOnlyList<PullCurvePoint> Curve(double s0, double running, Func<double, double> pullAt)
    {
        var pts = new List<PullCurvePoint>();
        foreach (double step in CurveStepsMm)
        {
            double n = step == 0 ? running : Math.Abs(pullAt(s0 + step));
            pts.Add(new PullCurvePoint(s0 + step, n));
            if (n < 0.01 * running) break;
        }
        return pts;
    }

    /// <summary>Quadrature points (rotor frame) and weights (mm^2) over a magnet's pole face.</summary>
    public static ((double X, double Y)[] Points, double[] Weights) FacePoints(MagnetShape g, double centreDeg, double gapMm, int order)
    {
        double c = Math.Cos(centreDeg * Math.PI / 180), s = Math.Sin(centreDeg * Math.PI / 180);
        var pts = new List<(double, double)>();
        var wts = new List<double>();
        void Add(double u, double v, double w)
        {
            pts.Add((u * c - v * s, u * s + v * c));
            wts.Add(w);
        }
        switch (g)
        {
            case BlockMagnet blk:
            {
                var (xu, wu) = GaussLegendre.Composite(Graded(blk.PitchRadiusMm - blk.LengthMm / 2, blk.PitchRadiusMm + blk.LengthMm / 2, gapMm, true, true), order, false);
                var (xv, wv) = GaussLegendre.Composite(Graded(-blk.WidthMm / 2, blk.WidthMm / 2, gapMm, true, true), order, false);
                for (int i = 0; i < xu.Length; i++)
                    for (int j = 0; j < xv.Length; j++) Add(xu[i], xv[j], wu[i] * wv[j]);
                break;
            }
            case DiscMagnet disc:
            {
                double a = disc.DiameterMm / 2;
                var (xr, wr) = GaussLegendre.Composite(Graded(0, a, gapMm, false, true), order, false);
                int na = 48;
                for (int i = 0; i < xr.Length; i++)
                    for (int j = 0; j < na; j++)
                    {
                        double t = 2 * Math.PI * (j + 0.5) / na;
                        Add(g.PitchRadiusMm + xr[i] * Math.Cos(t), xr[i] * Math.Sin(t), wr[i] * xr[i] * 2 * Math.PI / na);
                    }
                break;
            }
            case ArcMagnet arc:
            {
                var (xr, wr) = GaussLegendre.Composite(Graded(arc.InnerRadiusMm, arc.OuterRadiusMm, gapMm, arc.InnerRadiusMm > 0, true), order, false);
                double half = arc.SpanDeg * Math.PI / 360;
                for (int i = 0; i < xr.Length; i++)
                {
                    double arcGap = gapMm / Math.Max(xr[i], 1e-9);
                    var (xa, wa) = GaussLegendre.Composite(Graded(-half, half, arcGap, true, true), order, false);
                    for (int j = 0; j < xa.Length; j++) Add(xr[i] * Math.Cos(xa[j]), xr[i] * Math.Sin(xa[j]), wr[i] * wa[j] * xr[i]);
                }
                break;
            }
            default:
            {
                // Any other (convex) shape: a fan of triangles from the face's centre point, each mapped from the unit
                // square (u from the centre to the edge, v along the edge) and graded towards the edge and its ends.
                var poly = ConvexPolygon(g);
                var c0 = new Vec2(poly.Average(q => q.X), poly.Average(q => q.Y));
                var (xu, wu) = GaussLegendre.Composite(Graded(0, 1, gapMm / Math.Max(g.PlanSizeMm / 2, 1e-9), false, true), order, false);
                for (int e = 0; e < poly.Length; e++)
                {
                    var p0 = poly[e];
                    var p1 = poly[(e + 1) % poly.Length];
                    double edge = (p1 - p0).Length;
                    double area2 = (p0 - c0).Cross(p1 - c0); // twice the triangle's area
                    var (xv, wv) = GaussLegendre.Composite(Graded(0, 1, gapMm / Math.Max(edge, 1e-9), true, true), order, false);
                    for (int i = 0; i < xu.Length; i++)
                        for (int j = 0; j < xv.Length; j++)
                        {
                            // (u, v) -> c0 + u ((1 - v) p0 + v p1 - c0); Jacobian u x twice the triangle's area.
                            var q = c0 + ((p0 * (1 - xv[j]) + p1 * xv[j]) - c0) * xu[i];
                            Add(q.X, q.Y, wu[i] * wv[j] * xu[i] * area2);
                        }
                }
                break;
            }
        }
        return (pts.ToArray(), wts.ToArray());
    }

    /// <summary>The outline of magnet 0 as a counter-clockwise polygon of its straight sides (arcs split finely).</summary>
    private static Vec2[] ConvexPolygon(MagnetShape g)
    {
        var pts = new List<Vec2>();
        foreach (var seg in PartForge.Geometry.Exact.Exact2D.SegmentsOf(g.Outline(0)))
        {
            if (seg is PartForge.Geometry.Profiles.ArcSegment a)
            {
                int n = Math.Max(4, (int)Math.Ceiling(Math.Abs(a.SweepDeg) / 2));
                for (int i = 0; i < n; i++) pts.Add(a.Center + Vec2.FromAngleDeg(a.StartDeg + a.SweepDeg * i / n) * a.Radius);
            }
            else pts.Add(seg.Start);
        }
        double area = 0;
        for (int i = 0; i < pts.Count; i++) area += pts[i].Cross(pts[(i + 1) % pts.Count]);
        if (area < 0) pts.Reverse();
        return pts.ToArray();
    }

    /// <summary>Breakpoints on [a, b] graded geometrically (ratio 2) towards the chosen ends, finest piece about gap/2.</summary>
    private static List<double> Graded(double a, double b, double gapMm, bool atStart, bool atEnd)
    {
        double len = b - a;
        double h = Math.Max(gapMm / 2, 1e-2 * len);
        var offs = new List<double>();
        for (double t = h; t < len / 2; t *= 2) offs.Add(t);
        var pts = new SortedSet<double> { a, b, a + len / 2 };
        foreach (var o in offs)
        {
            if (atStart) pts.Add(a + o);
            if (atEnd) pts.Add(b - o);
        }
        if ((!atStart || !atEnd) && h < len / 4)
        {
            // one-sided: also split the coarse side evenly so each piece stays short.
            for (int i = 1; i < 4; i++) pts.Add(a + len * i / 4);
        }
        return pts.ToList();
    }
}
