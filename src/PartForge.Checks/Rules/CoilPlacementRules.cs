using PartForge.Design.Parts;
using PartForge.Parts.Shapes;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>
/// coil-seat-in-ring, coil-faces-magnets: where the coils sit against the stator ring and the magnet track,
/// from the coil outline the electrical engine computed (radial ranges in the machine frame). Without these a
/// coil pitch radius outside the ring made a stator with no seats and an EMF near zero that passed every check.
/// </summary>
internal static class CoilPlacementRules
{
    /// <summary>Below this share of the magnets' radial length covered by the winding, warn (our own band).</summary>
    public const double WarnCoverage = 0.5;

    public static IEnumerable<CheckResult> Run(CheckContext c)
    {
        yield return SeatInRing(c);
        yield return FacesMagnets(c);
    }

    /// <summary>Radial range of a seat: the winding grown by the flange margin and the seat clearance.</summary>
    public static (double In, double Out) SeatRange(CheckContext c)
    {
        var o = c.E.Outline;
        double grow = c.D.Former.MarginMm + DesignGeometry.SeatClearanceMm(c.D);
        return (o.OuterMinRadiusMm - grow, o.OuterMaxRadiusMm + grow);
    }

    private static CheckResult SeatInRing(CheckContext c)
    {
        var (sIn, sOut) = SeatRange(c);
        double ri = c.D.Stator.InnerDiameterMm / 2, ro = c.D.Stator.OuterDiameterMm / 2;
        double toOuter = ro - sOut, toInner = sIn - ri;
        double value = Math.Min(toOuter, toInner);
        var (status, margin) = AtLeast(value, 0, 0);
        string msg = $"coil seats span radius {F(sIn)} to {F(sOut)} mm, the stator ring {F(ri)} to {F(ro)} mm";
        if (status == CheckStatus.Fail)
        {
            double centre = (ri + ro) / 2, need = sOut - sIn;
            var fixes = new List<string>();
            if (need < ro - ri) fixes.Add($"set coils.pitch_radius to {F(c.E.Outline.PitchRadiusMm + centre - (sIn + sOut) / 2)}");
            if (toOuter < 0 && 2 * sOut <= 1000) fixes.Add($"raise stator.outer_diameter to {Up(2 * sOut)}");
            if (toInner < 0 && sIn > 0) fixes.Add($"lower stator.inner_diameter to {Down(2 * sIn)}");
            msg += toOuter < 0 ? $"; the seats run {F(-toOuter)} mm past the outer edge" : $"; the seats run {F(-toInner)} mm into the bore";
            msg += fixes.Count > 0 ? "; " + string.Join(" or ", fixes) : "; use smaller coils (fewer coils.turns or thinner wire) or a wider stator ring";
        }
        return new CheckResult
        {
            Id = CheckIds.CoilSeatInRing, Part = c.FirstStator, Counterpart = PartId.Former, Status = status, Value = value, Limit = 0, Unit = "mm", Margin = margin,
            Message = msg, Where = new CheckLocation("coil seats"),
            Basis = "radial range of the seat (winding outline + former.margin + seat clearance) against the ring's edges (geometry)",
        };
    }

    private static CheckResult FacesMagnets(CheckContext c)
    {
        var o = c.E.Outline;
        var (mIn, mOut) = c.Magnet.RadialRangeMm(0);
        double overlap = Math.Min(o.OuterMaxRadiusMm, mOut) - Math.Max(o.OuterMinRadiusMm, mIn);
        double length = mOut - mIn;
        double want = WarnCoverage * length;
        CheckStatus status = !(overlap > 0) ? CheckStatus.Fail : overlap < want ? CheckStatus.Warn : CheckStatus.Pass;
        string msg = $"the windings span radius {F(o.OuterMinRadiusMm)} to {F(o.OuterMaxRadiusMm)} mm, the magnets {F(mIn)} to {F(mOut)} mm: {F(Math.Max(0, overlap))} mm of the magnets' {F(length)} mm face the coils";
        if (status != CheckStatus.Pass)
            msg += $"; set coils.pitch_radius to {F(c.Magnet.PitchRadiusMm)} (the magnets' pitch radius)";
        return new CheckResult
        {
            Id = CheckIds.CoilFacesMagnets, Part = PartId.Former, Counterpart = c.RotorIds[0], Status = status, Value = overlap, Limit = want, Unit = "mm",
            Margin = overlap - want, Message = msg, Where = new CheckLocation("coil 0 and the magnet track"),
            Basis = "radial overlap of the winding with the magnets; flux linkage needs the winding over the magnets (geometry); warn below half the magnets' radial length (our own band)",
        };
    }
}
