using PartForge.Checks.Mechanics;
using PartForge.Design.Materials;
using PartForge.Design.Parts;
using PartForge.Geometry.Exact;
using PartForge.Parts;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>rotor-hoop-stress, magnet-retention, magnet-pull-out.</summary>
internal static class SpeedRules
{
    /// <summary>Safety factor on the assumed glue strength (our own choice).</summary>
    public const double GlueSafetyFactor = 2;

    public static IEnumerable<CheckResult> Run(CheckContext c)
    {
        foreach (var rotor in c.RotorIds)
        {
            yield return Hoop(c, rotor);
            yield return Retention(c, rotor);
            yield return PullOut(c, rotor);
        }
    }

    /// <summary>
    /// Hoop stress at the bore: the disc's own mass (Timoshenko &amp; Goodier) plus the magnets' centrifugal load
    /// taken as a radial traction on the cylinder of the pitch radius and the rotor thickness, acting on the
    /// annulus bore..pitch radius (Lame); the material outside the pitch radius is not counted as helping,
    /// and the pockets' removed material is still counted as load: both conservative.
    /// </summary>
    public static double HoopStressMpa(CheckContext c, Material m, double rpm)
    {
        double a = c.D.Rotor.BoreMm / 2, b = c.D.Rotor.OuterDiameterMm / 2;
        double own = RotatingDisc.BoreHoopStress(m.DensityKgM3, m.PoissonRatio, a, b, rpm);
        double r = c.Magnet.CentroidRadiusMm;
        double p = RotatingDisc.RingTractionOfMasses(c.D.Poles, c.Magnet.MassKg, r, c.D.Rotor.ThicknessMm, rpm);
        return own + (r > a ? RotatingDisc.BoreHoopStressFromRimTraction(p, a, r) : 0);
    }

    private static CheckResult Hoop(CheckContext c, PartId rotor)
    {
        double rpm = c.D.MaxRpm;
        var m = c.RotorMaterial;
        double sigma = HoopStressMpa(c, m, rpm);
        double limit = m.AllowableStressMpa;
        double band = MaxRelativeBand * limit;
        var (status, margin) = AtMost(sigma, limit, band);
        string msg = $"{rotor.Name}: hoop stress at the bore {F(sigma)} MPa at machine.max_rpm {F(rpm)} (disc and {c.D.Poles} magnets of {F(c.Magnet.MassKg * 1000)} g); allowed {F(limit)} MPa ({m.Name} {F(m.StrengthMpa)} MPa / {F(m.SafetyFactor)})";
        if (status != CheckStatus.Pass)
        {
            double rpmOk = rpm * Math.Sqrt((limit - band) / sigma);   // every term scales with omega^2
            string better = MaterialTable.All.Where(x => x != m).FirstOrDefault(x => HoopStressMpa(c, x, rpm) <= x.AllowableStressMpa * (1 - MaxRelativeBand))?.Name ?? "";
            // machine.max_rpm may not go below machine.rated_rpm (a loader rule): then only the material can change.
            var fixes = new List<string>();
            if (Math.Floor(rpmOk) >= c.D.RatedRpm) fixes.Add($"lower machine.max_rpm to {Math.Floor(rpmOk)}");
            if (better.Length > 0) fixes.Add($"use rotor.material {better}");
            msg += "; " + (fixes.Count > 0 ? string.Join(" or ", fixes) : "use a stronger rotor.material or a smaller rotor.outer_diameter");
        }
        return new CheckResult
        {
            Id = CheckIds.RotorHoopStress, Part = rotor, Status = status, Value = sigma, Limit = limit, Unit = "MPa", Margin = margin,
            Message = msg, Where = new CheckLocation($"{rotor.Name} bore"),
            Basis = "Timoshenko & Goodier, Theory of Elasticity: rotating disc with a hole; magnets as a Lame ring traction at the pitch radius",
        };
    }

    /// <summary>Rim wall between the pockets and the rim, mm: exact from the part's features when present, else from the design.</summary>
    public static double RimWallMm(CheckContext c, PartId rotor)
    {
        if (c.Part(rotor) is { } pv && pv.OfKind(FeatureKind.Rim).FirstOrDefault() is { } rim && pv.OfKind(FeatureKind.MagnetPocket).Any())
            return pv.OfKind(FeatureKind.MagnetPocket).Min(p => Exact2D.ContourContour(p.Contour, rim.Contour));
        return c.D.Rotor.OuterDiameterMm / 2 - c.Magnet.RadialRangeMm(c.D.Rotor.PocketClearanceMm).Max;
    }

    /// <summary>
    /// Assumption: the magnet is held radially by the rim wall in front of it. The centrifugal force m r omega^2
    /// would push out a plug of that wall, shearing it on two planes, each the wall's width by the embedded
    /// depth of the magnet: capacity = 2 w h tau, tau = half the tensile strength (Tresca) over the safety
    /// factor. Glue and press-fit friction are not counted (conservative).
    /// </summary>
    private static CheckResult Retention(CheckContext c, PartId rotor)
    {
        double rpm = c.D.MaxRpm;
        double force = RotatingDisc.CentrifugalForce(c.Magnet.MassKg, c.Magnet.CentroidRadiusMm, rpm);
        double wall = Math.Max(0, RimWallMm(c, rotor));
        double h = Math.Min(c.Stack.PocketDepthMm, c.Magnet.ThicknessMm);
        double tau = c.RotorMaterial.ShearStrengthMpa / c.RotorMaterial.SafetyFactor;
        double capacity = 2 * wall * h * tau;
        double band = MaxRelativeBand * capacity;
        var (status, margin) = AtMost(force, capacity, band);
        string msg = $"{rotor.Name}: {F(force)} N centrifugal force on each magnet at {F(rpm)} rpm; the {F(wall)} mm rim wall over {F(h)} mm holds {F(capacity)} N in shear (glue not counted)";
        if (status != CheckStatus.Pass)
        {
            double target = capacity - band;
            var fixes = new List<string>();
            if (target > 0 && Math.Floor(rpm * Math.Sqrt(target / force)) >= c.D.RatedRpm) fixes.Add($"lower machine.max_rpm to {Math.Floor(rpm * Math.Sqrt(target / force))}");
            double wallNeeded = force / (2 * h * tau * (1 - MaxRelativeBand));
            fixes.Add($"raise rotor.outer_diameter to {Up(c.D.Rotor.OuterDiameterMm + 2 * (wallNeeded - wall))} (rim wall {Up(wallNeeded)} mm)");
            msg += "; " + string.Join(" or ", fixes);
        }
        return new CheckResult
        {
            Id = CheckIds.MagnetRetention, Part = rotor, Status = status, Value = force, Limit = capacity, Unit = "N", Margin = margin,
            Message = msg, Where = new CheckLocation($"{rotor.Name} rim wall at the pockets"),
            Basis = "centrifugal force m r omega^2 against two-plane shear of the rim wall (our assumption)",
        };
    }

    /// <summary>
    /// Assumption: a magnet is pulled out of its pocket by its share of the rotor's axial pull (total / poles)
    /// and held by glue only, at <see cref="MaterialTable.GlueShearMpa"/> over the side wall it is embedded in
    /// and the pocket floor (blind pockets), with a safety factor of 2. Attraction to the rotor's own back iron
    /// would help and is not counted.
    /// </summary>
    private static CheckResult PullOut(CheckContext c, PartId rotor)
    {
        double perMagnet = c.Pull(rotor) / Math.Max(1, c.D.Poles);
        double h = Math.Min(c.Stack.PocketDepthMm, c.Magnet.ThicknessMm);
        double floorArea = !c.D.ThroughPockets ? c.Magnet.FaceAreaMm2 : 0;
        double holding = MaterialTable.GlueShearMpa * (c.Magnet.PerimeterMm * h + floorArea) / GlueSafetyFactor;
        double band = MaxRelativeBand * holding;
        var (status, margin) = AtMost(perMagnet, holding, band);
        string msg = $"{rotor.Name}: each magnet is pulled {F(perMagnet)} N out of its pocket; glue over {F(h)} mm of wall{(floorArea > 0 ? " and the floor" : "")} holds {F(holding)} N (assumed {F(MaterialTable.GlueShearMpa)} MPa, safety factor {F(GlueSafetyFactor)})";
        if (status != CheckStatus.Pass)
        {
            double needH = ((perMagnet / (1 - MaxRelativeBand)) * GlueSafetyFactor / MaterialTable.GlueShearMpa - floorArea) / c.Magnet.PerimeterMm;
            msg += needH <= c.Magnet.ThicknessMm
                ? $"; deepen the pockets to {Up(needH)} mm (rotor.thickness to {Up(needH + c.D.Rotor.PocketFloorMm)}) or raise gap.air_gap to lower the pull"
                : "; no pocket depth suffices with glue alone: raise gap.air_gap to lower the pull or retain the magnets mechanically";
        }
        return new CheckResult
        {
            Id = CheckIds.MagnetPullOut, Part = rotor, Status = status, Value = perMagnet, Limit = holding, Unit = "N", Margin = margin,
            Message = msg, Where = new CheckLocation($"{rotor.Name} magnet pockets"),
            Basis = "axial pull per magnet (electrical engine) against an assumed glue bond",
        };
    }
}
