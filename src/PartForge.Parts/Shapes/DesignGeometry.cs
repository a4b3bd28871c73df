using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;
using D = PartForge.Design.Model;

namespace PartForge.Parts.Shapes;

/// <summary>
/// Sizes and outlines that several parts derive from the design, in one place so rotor, back iron,
/// stator and the checker can never disagree.
/// </summary>
public static class DesignGeometry
{
    /// <summary>
    /// Radial fit clearance added on each side of a printed part that slides into a printed opening (former
    /// in its seat, sensor body in its pocket), on top of <c>tolerances.print_xy</c>: 0.10 mm, a slip fit that
    /// takes a drop of glue (common practice; ../shared/REFERENCE.md section 4 gives +0.1-0.3 mm on size for
    /// press to glued fits).
    /// </summary>
    public const double SlipFitClearanceMm = 0.10;

    /// <summary>Per-side clearance between a former's flange footprint and its stator seat.</summary>
    public static double SeatClearanceMm(D.Design d) => d.Tolerances.PrintXy + SlipFitClearanceMm;

    /// <summary>Smallest printable wall: <c>process.min_wall_lines x process.nozzle</c>.</summary>
    public static double MinWallMm(D.Design d) => d.Process.MinWallLines * d.Process.Nozzle;

    /// <summary>Radius of the magnet centres: arc magnets (inner + outer) / 2; else <c>magnets.pitch_radius</c>, falling back to <c>coils.pitch_radius</c>.</summary>
    public static double MagnetPitchRadiusMm(D.Design d)
    {
        var m = d.Magnets;
        if (m.Shape == "arc")
            return (Need(m.InnerRadius, "magnets.inner_radius") + Need(m.OuterRadius, "magnets.outer_radius")) / 2;
        return m.PitchRadius ?? d.Coils.PitchRadius ?? throw new PartsException("magnets.pitch_radius is required for disc and block magnets");
    }

    /// <summary>Radius of the coil centres: <c>coils.pitch_radius</c>, default the magnets' pitch radius.</summary>
    public static double CoilPitchRadiusMm(D.Design d) => d.Coils.PitchRadius ?? MagnetPitchRadiusMm(d);

    /// <summary>Angle of pocket (pole) i: i x 360 / poles, pocket 0 on +x.</summary>
    public static double PoleAngleDeg(D.Design d, int i) => i * 360.0 / d.Machine.Poles;

    /// <summary>Angle of coil k: k x 360 / coils, coil 0 on +x.</summary>
    public static double CoilAngleDeg(D.Design d, int k) => k * 360.0 / d.Machine.Coils;

    /// <summary>
    /// Outline of magnet 0 (centred on +x) grown by <paramref name="clearanceMm"/> as the design defines the
    /// pocket: disc diameter + c; block (length + c) x (width + c) with the length radial; arc: radii
    /// inner - c/2 .. outer + c/2 and the span widened so that the arc length at the pitch radius grows by c
    /// (span + c / r_pitch radians). The arc pocket's radial sides stay radial, so their clearance is c/2
    /// measured along the pitch circle, c/2 x r/r_pitch at other radii.
    /// </summary>
    public static Contour MagnetOutline(D.Design d, double clearanceMm)
    {
        var m = d.Magnets;
        double r = MagnetPitchRadiusMm(d);
        switch (m.Shape)
        {
            case "disc":
                return Contour.FullCircle(new Vec2(r, 0), (Need(m.Diameter, "magnets.diameter") + clearanceMm) / 2);
            case "block":
                return Contour.Rectangle(new Vec2(r, 0), Need(m.Length, "magnets.length") + clearanceMm,
                    Need(m.Width, "magnets.width") + clearanceMm, 0);
            case "arc":
            {
                double ri = Need(m.InnerRadius, "magnets.inner_radius") - clearanceMm / 2;
                double ro = Need(m.OuterRadius, "magnets.outer_radius") + clearanceMm / 2;
                double span = Need(m.Span, "magnets.span") + clearanceMm / r * 180.0 / Math.PI;
                if (!(ri >= 0) || !(ro > ri)) throw new PartsException("magnets: arc pocket radii are invalid (inner_radius - clearance/2 < 0 or outer <= inner)");
                return Contour.AnnularSector(ri, ro, -span / 2, span);
            }
            default: throw new PartsException($"magnets.shape '{m.Shape}' is not one of disc, block, arc");
        }
    }

    /// <summary>Magnet pocket 0 (rotor.pocket_clearance added as the design defines it).</summary>
    public static Contour PocketOutline(D.Design d) => MagnetOutline(d, d.Rotor.PocketClearance);

    /// <summary>Smallest and largest radius of the bare magnets (no clearance).</summary>
    public static (double Min, double Max) MagnetRadialExtentMm(D.Design d) => ExactGeometry.RadialExtent(MagnetOutline(d, 0));

    internal static double Need(double? v, string key) => v ?? throw new PartsException($"{key} is required for this magnet shape");
}
