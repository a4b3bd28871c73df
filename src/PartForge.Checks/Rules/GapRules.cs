using PartForge.Checks.Stack;
using PartForge.Design.Materials;
using PartForge.Design.Parts;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>running-gap, magnet-pull-deflection, magnet-pull-stress.</summary>
internal static class GapRules
{
    /// <summary>Rim deflection allowed, as a fraction of gap.air_gap (our own rule: a disc that flexes by more than half its gap is too soft whatever the other tolerances; PLA also creeps under the steady pull, docs/physics.md §8).</summary>
    public const double DeflectionFractionOfGap = 0.5;

    public static IEnumerable<CheckResult> Run(CheckContext c)
    {
        foreach (var g in c.Gaps()) yield return RunningGap(c, g);
        foreach (var rotor in c.RotorIds)
        {
            double pull = c.Pull(rotor);
            yield return Deflection(c, rotor, pull);
            yield return RootStress(c, rotor, pull);
        }
    }

    private static CheckResult RunningGap(CheckContext c, FaceGap g)
    {
        double limit = c.D.Gap.MinRunningGapMm;
        double band = MinBand(limit);
        var (status, margin) = AtLeast(g.WorstMm, limit, band);
        string losses = string.Join(", ", g.Losses.Select(l => $"{l.Name} {F(l.Mm)}"));
        string msg = $"{g.RotorPart.Name} to {g.StatorPart.Name}: nominal {F(g.NominalMm)} mm from the {g.NearestRotatingSurface}, worst case {F(g.WorstMm)} mm"
                     + (losses.Length > 0 ? $" after {losses}" : "");
        if (status != CheckStatus.Pass)
        {
            double shortfall = limit + band - g.WorstMm;
            var fixes = new List<string> { $"raise gap.air_gap to at least {Up(c.D.Gap.AirGapMm + shortfall)}" };
            double bulge = g.LossOf("coil bulge");
            if (bulge > 0)
            {
                int? n = TurnsForBulge(c, g, bulge - shortfall);
                if (n is { } turns) fixes.Add($"lower coils.turns to {turns}");
            }
            double defl = g.LossOf("deflection");
            if (defl > shortfall)
            {
                double t = c.Plate.ThicknessForDeflection(c.Pull(g.RotorPart), defl - shortfall);
                fixes.Add($"thicken rotor.thickness to {Up(t)}");
            }
            msg += $"; {string.Join(" or ", fixes)}";
        }
        return new CheckResult
        {
            Id = CheckIds.RunningGap, Part = g.RotorPart, Counterpart = g.StatorPart, Status = status, Value = g.WorstMm, Limit = limit, Unit = "mm", Margin = margin,
            Message = msg, Where = new CheckLocation($"{g.RotorPart.Name} / {g.StatorPart.Name} face"),
            Basis = "linear worst-case stack-up of the axial stack (print_z per printed part, runout, axial_play, Roark rim deflection, coil bulge)",
        };
    }

    /// <summary>The largest turns count whose bulge intrusion stays at or below the target (build scales with turns at the stated fill).</summary>
    private static int? TurnsForBulge(CheckContext c, FaceGap g, double targetIntrusionMm)
    {
        double intrusionNow = g.LossOf("coil bulge");
        double bulgeNow = c.BulgePerFaceMm;
        double slack = bulgeNow - intrusionNow;         // how much bulge the stationary face already absorbs
        int turns = c.E.Turns;
        double buildPerTurn = c.E.Outline.RadialBuildMm / Math.Max(1, turns);
        for (int n = turns - 1; n >= 1; n--)
        {
            double b = CoilBulge.PerFaceMm(n, c.E.WireBareMm, c.D.Coils.HeightMm, buildPerTurn * n, c.D.Former.MarginMm);
            if (b - slack <= Math.Max(0, targetIntrusionMm) + 1e-12) return n;
        }
        return null;
    }

    private static CheckResult Deflection(CheckContext c, PartId rotor, double pull)
    {
        double defl = c.Deflection(rotor);
        double limit = DeflectionFractionOfGap * c.D.Gap.AirGapMm;
        double band = 0.5 * limit;
        var (status, margin) = AtMost(defl, limit, band);
        string msg = $"{rotor.Name}: rim deflects {F(defl)} mm under {F(pull)} N magnetic pull ({c.RotorMaterial.Name}, E {F(c.RotorMaterial.YoungsModulusMpa / 1000)} GPa, t {F(c.Plate.ThicknessMm)} mm, clamped at r {F(c.Plate.HubRadiusMm)} mm)";
        if (status != CheckStatus.Pass)
        {
            double target = limit - band;
            double t = c.Plate.ThicknessForDeflection(pull, target);
            string stiffer = StifferMaterial(c, pull, target);
            msg += $"; thicken rotor.thickness to {Up(t)}" + (stiffer.Length > 0 ? $" or use rotor.material {stiffer}" : "")
                   + (c.D.Rotor.BoltCircle is { } bc ? $" or widen rotor.bolt_circle.diameter (clamped radius) beyond {F(bc.CircleDiameterMm)}" : " or add a rotor.bolt_circle to clamp the disc further out");
        }
        return new CheckResult
        {
            Id = CheckIds.MagnetPullDeflection, Part = rotor, Status = status, Value = defl, Limit = limit, Unit = "mm", Margin = margin,
            Message = msg, Where = new CheckLocation($"{rotor.Name} rim"),
            Basis = "Roark's Formulas for Stress and Strain, 7th ed., Table 11.2, case 1j (ring load at the magnet pitch radius)",
        };
    }

    private static string StifferMaterial(CheckContext c, double pull, double target)
    {
        foreach (var m in MaterialTable.All)
        {
            if (m.YoungsModulusMpa <= c.RotorMaterial.YoungsModulusMpa) continue;
            var plate = c.Plate with { Material = m };
            if (plate.RimDeflectionMm(pull) <= target) return m.Name;
        }
        return "";
    }

    private static CheckResult RootStress(CheckContext c, PartId rotor, double pull)
    {
        double sigma = c.Plate.RootStressMpa(pull);
        double limit = c.RotorMaterial.AllowableStressMpa;
        double band = MaxRelativeBand * limit;
        var (status, margin) = AtMost(sigma, limit, band);
        string msg = $"{rotor.Name}: bending stress at the hub {F(sigma)} MPa under the magnetic pull; allowed {F(limit)} MPa ({c.RotorMaterial.Name} {F(c.RotorMaterial.StrengthMpa)} MPa / safety factor {F(c.RotorMaterial.SafetyFactor)})";
        if (status != CheckStatus.Pass)
        {
            double t = c.Plate.ThicknessMm * Math.Sqrt(sigma / (limit - band));   // bending stress at fixed moment ~ 1/t^2
            msg += $"; thicken rotor.thickness to {Up(t)}";
        }
        return new CheckResult
        {
            Id = CheckIds.MagnetPullStress, Part = rotor, Status = status, Value = sigma, Limit = limit, Unit = "MPa", Margin = margin,
            Message = msg, Where = new CheckLocation($"{rotor.Name} hub clamp"),
            Basis = "Roark's Formulas for Stress and Strain, 7th ed., Table 11.2, case 1j (root moment), sigma = 6 M / t^2",
        };
    }
}
