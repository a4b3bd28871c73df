using System.Globalization;
using PartForge.Design.Keys;
using PartForge.Design.Machines;
using PartForge.Geometry.Exact;
using PartForge.Geometry.Profiles;

namespace PartForge.Export.Pipeline;

/// <summary>
/// The triangle budget of a build, checked from the design alone before any part is meshed, so that an
/// absurdly fine <c>mesh.chordal_tolerance</c> is refused at once (exit 2) instead of after minutes or an
/// out-of-memory death.
///
/// Estimate: every circle and arc of every distinct part (rims, bores, the arcs of the pocket outline, bolt and
/// mount holes, coil seats, former flanges and cores; coil sizes approximated from the magnet size, the coil not
/// being known yet) gets the kernel's segment count n = ceil(pi / acos(1 - e / r)) (ArcSegmentation); a part's mesh has
/// about <see cref="TrianglesPerSegment"/> triangles per boundary segment (a wall quad on each layer it
/// bounds plus its share of the caps; fitted on the bundled presets at e = 0.01 mm, where the estimate is
/// 1.1 to 1.6 times the real count, so it errs on the high side).
/// </summary>
public static class MeshBudget
{
    /// <summary>Most triangles one build may produce (all distinct parts), about 75 MB of binary STL; a tolerance near 1e-6 mm on the presets is refused, 1e-4 mm on a 400 mm rotor with 256 pockets fits.</summary>
    public const long MaxTriangles = 1_500_000;

    /// <summary>Triangles per boundary segment (see the class summary).</summary>
    public const double TrianglesPerSegment = 7;

    /// <summary>The refusal message, or null when the design fits the budget.</summary>
    public static string? Check(MachineModel d, string file)
    {
        double tol = d.ChordalToleranceMm;
        double est = Estimate(d, tol);
        if (est <= MaxTriangles) return null;
        double fit = SmallestTolerance(d);
        return string.Create(CultureInfo.InvariantCulture,
            $"{file}: mesh.chordal_tolerance: {KeySpec.Format(tol)} would need about {est:0} triangles, more than the budget of {MaxTriangles} triangles; the smallest tolerance that fits is about {FormatTolerance(fit)} mm");
    }

    /// <summary>Estimated triangles of all distinct parts at chordal tolerance <paramref name="tol"/>.</summary>
    public static double Estimate(MachineModel d, double tol)
    {
        double seg = 0;
        void Circle(double r, int count = 1) { if (r > 0 && count > 0) seg += count * Segments(r, tol); }
        void Arc(double r, double sweepDeg, int count) { if (r > 0 && count > 0) seg += count * Math.Max(1, Segments(r, tol) * sweepDeg / 360); }
        // Every arc and circle of a contour (a pocket's outline), count times.
        void Outline(Contour c, int count)
        {
            foreach (var s in Exact2D.SegmentsOf(c))
                if (s is ArcSegment a) Arc(a.Radius, Math.Abs(a.SweepDeg), count);
        }

        var r = d.Rotor;
        var shape = d.Magnets.Shape;
        int rotors = d.Layout.Rotors.Count;
        int stators = d.Layout.Stators.Count;
        double c = r.PocketClearanceMm;
        // The magnet's half size: the scale of coils and seats.
        double half = shape.PlanSizeMm / 2;
        // The pocket as made, with its corner reliefs (a printed rotor's, the larger arcs of the two kinds).
        var pocket = Parts.Shapes.DesignGeometry.RelievedPocketOutline(d, PartProcess.Print);
        for (int i = 0; i < rotors; i++)
        {
            Circle(r.OuterDiameterMm / 2);
            Circle(r.BoreMm / 2);
            Outline(pocket, d.Poles);
            if (r.BoltCircle is { } bc) Circle(bc.HoleMm / 2, bc.Count);
        }
        if (r.BackIronThicknessMm != null)
        {
            Circle(r.OuterDiameterMm / 2);
            Circle(r.BoreMm / 2);
            if (r.BoltCircle is { } bc) Circle(bc.HoleMm / 2, bc.Count);
        }
        double core = d.Coils.CoreMm ?? 0;
        double coilR = core / 2 + half + d.Former.MarginMm;
        for (int i = 0; i < stators; i++)
        {
            Circle(d.Stator.OuterDiameterMm / 2);
            Circle(d.Stator.InnerDiameterMm / 2);
            Circle(coilR, d.CoilsPerStator);
            if (d.Stator.Mount is { } mt) Circle(mt.HoleMm / 2, mt.Count);
        }
        Circle(coilR);                                 // former flange
        Circle(Math.Max(core / 2, 0.5));               // former core
        Circle(r.BoreMm / 2 + 5);                      // spacer
        Circle(r.BoreMm / 2);
        return seg * TrianglesPerSegment;
    }

    /// <summary>The smallest chordal tolerance whose estimate fits the budget (bisection on the monotone estimate).</summary>
    public static double SmallestTolerance(MachineModel d)
    {
        double lo = 1e-12, hi = 10;
        if (Estimate(d, hi) > MaxTriangles) return hi;
        for (int i = 0; i < 200 && hi / lo > 1.0001; i++)
        {
            double mid = Math.Sqrt(lo * hi);
            if (Estimate(d, mid) > MaxTriangles) lo = mid; else hi = mid;
        }
        return hi;
    }

    private static double Segments(double r, double tol) =>
        tol >= r ? 3 : Math.Max(3, Math.Ceiling(Math.PI / Math.Acos(1 - tol / r)));

    private static string FormatTolerance(double t)
    {
        // Two significant digits, rounded up so the suggested value really fits; plain decimal notation.
        double mag = Math.Pow(10, Math.Floor(Math.Log10(t)) - 1);
        double up = Math.Ceiling(t / mag) * mag;
        return up.ToString("0.############", CultureInfo.InvariantCulture);
    }
}
