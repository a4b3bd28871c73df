using PartForge.Checks.Hardware;
using PartForge.Design.Hardware;
using PartForge.Design.Parts;
using PartForge.Parts;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>
/// The fasteners of every joint (<see cref="FastenerPlanner"/>): the tension in each stud or bolt against class
/// 8.8's proof stress over its tensile stress area, and the bearing stress on the weakest clamped part, both
/// under the clamp force the torque and the pull need.
/// </summary>
internal static class HardwareRules
{
    public static IEnumerable<CheckResult> Run(CheckContext c)
    {
        foreach (var j in FastenerPlanner.Plan(c.D, c.E, c.Parts))
        {
            if (j.Thread is not { } t) continue; // below M1.6: the BOM says to choose a pin; nothing to size
            yield return Tension(j, t);
            yield return Bearing(j, t);
        }
        if (Jacks(c) is { } jr) yield return jr;
    }

    /// <summary>
    /// The jacking screws of the last rotor (its <see cref="FeatureKind.JackHole"/> features) carry the whole pull
    /// at the smallest separation the electrical result gives (the running gap, where the hub spacer stops the
    /// rotor), shared equally: the screw's stress over its tensile stress area against half of class 8.8's proof
    /// stress, and the nut's hex face on the trap floor against the rotor material's allowable stress. The value
    /// is the larger utilisation (1 = at the limit).
    /// </summary>
    private static CheckResult? Jacks(CheckContext c)
    {
        var rotor = c.Parts.FirstOrDefault(p => p.Id.Role == PartRole.Rotor && p.OfKind(FeatureKind.JackHole).Any());
        if (rotor is null) return null;
        var holes = rotor.OfKind(FeatureKind.JackHole).ToList();
        double hole = 2 * (holes[0].Contour.Circle?.Radius ?? 0);
        if (MetricThreads.ForHole(hole) is not { } pick) return null;
        var t = pick.Thread;
        double pull = c.Pull(rotor.Id);
        double each = pull / holes.Count;
        double screw = each / t.StressAreaMm2 / FastenerSteel.AllowableStressMpa;
        double bearingMpa = each / t.NutBearingAreaMm2(hole);
        double bearing = bearingMpa / rotor.Material.AllowableStressMpa;
        double u = Math.Max(screw, bearing);
        var (status, margin) = AtMost(u, 1, MaxRelativeBand);
        string msg = $"{rotor.Name}: {holes.Count} x {t.Size} jacking screws share the {F(pull)} N pull at the running gap ({F(each)} N each): screw {F(each / t.StressAreaMm2)} MPa of {F(FastenerSteel.AllowableStressMpa)}, nut on the {rotor.Material.Name} trap floor {F(bearingMpa)} MPa of {F(rotor.Material.AllowableStressMpa)}";
        if (status != CheckStatus.Pass)
        {
            var bigger = MetricThreads.All.FirstOrDefault(m => m.NominalMm > t.NominalMm
                && each / m.StressAreaMm2 <= FastenerSteel.AllowableStressMpa * (1 - MaxRelativeBand)
                && each / m.NutBearingAreaMm2(m.MediumHoleMm) <= rotor.Material.AllowableStressMpa * (1 - MaxRelativeBand));
            int n = (int)Math.Ceiling(holes.Count * u / (1 - MaxRelativeBand));
            msg += "; " + (n <= 64 ? $"raise rotor.bolt_circle.count to {Math.Max(n, holes.Count + 1)} (one jack between each pair of studs)" : "")
                + (bigger is null ? "" : $"{(n <= 64 ? ", or " : "raise ")}rotor.bolt_circle.hole to {F(bigger.MediumHoleMm)} ({bigger.Size})");
        }
        return new CheckResult
        {
            Id = CheckIds.JackingScrew, Part = rotor.Id, Status = status, Value = u, Limit = 1, Unit = "1", Margin = margin, Message = msg,
            Where = new CheckLocation($"{rotor.Name} nut traps"),
            Basis = "pull at the running gap (electrical engine) shared by the jacking screws; A_s = pi/4 (d - 0.9382 P)^2 (ISO 898-1), class 8.8 proof stress 580 MPa halved; ISO 4032 nut hex face (from memory) on the printed trap floor against the material table's strength / safety factor",
        };
    }

    private static CheckResult Tension(FastenerJoint j, MetricThread t)
    {
        double stress = j.ClampPerFastenerN / t.StressAreaMm2;
        double limit = FastenerSteel.AllowableStressMpa;
        var (status, margin) = AtMost(stress, limit, MaxRelativeBand * limit);
        string msg = $"{j.Where}: {j.Count} x {t.Size} {Words(j)} must each clamp {F(j.ClampPerFastenerN)} N (torque {F(j.TorqueNm)} N m by friction, pull {F(j.PullN)} N); {F(stress)} MPa over A_s {F(t.StressAreaMm2)} mm^2 against {F(limit)} MPa";
        if (status != CheckStatus.Pass) msg += "; " + Fix(j, need => need.StressAreaMm2 * limit * (1 - MaxRelativeBand), j.Count * j.ClampPerFastenerN);
        return new CheckResult
        {
            Id = CheckIds.FastenerTension, Part = j.First, Counterpart = j.Last == j.First ? null : j.Last, Status = status,
            Value = stress, Limit = limit, Unit = "MPa", Margin = margin, Message = msg,
            Where = new CheckLocation($"{j.Where} on D{F(j.CircleDiameterMm)}"),
            Basis = $"A_s = pi/4 (d - 0.9382 P)^2 (ISO 898-1, ISO 724); class {FastenerSteel.PropertyClass} proof stress {F(FastenerSteel.ProofStressMpa)} MPa (from memory), allowed half of it (our choice); clamp = {F(FastenerPlanner.SlipSafetyFactor)} T / (mu r), mu = {F(FastenerPlanner.FrictionCoefficient)} (common practice, from memory), plus the rotor's pull (conservative)",
        };
    }

    /// <summary>
    /// Bearing on the weakest clamped part (lowest allowable stress; thinnest on a tie): the larger of the clamp
    /// over the washer's annulus (ISO 7089 normal washer) and, if the joint slips, the fastener's share of the
    /// torque as a tangential force over the projected hole area d x t of that part.
    /// </summary>
    private static CheckResult Bearing(FastenerJoint j, MetricThread t)
    {
        var weak = j.Clamped.OrderBy(p => p.Material.AllowableStressMpa).ThenBy(p => p.ThicknessMm).First();
        double underWasher = j.ClampPerFastenerN / t.WasherBearingAreaMm2(j.HoleMm);
        double r = j.CircleDiameterMm / 2 / 1000;
        double tangential = r > 0 ? j.TorqueNm / r / Math.Max(1, j.Count) : 0;
        double onWall = tangential / (t.NominalMm * weak.ThicknessMm);
        double stress = Math.Max(underWasher, onWall);
        double limit = weak.Material.AllowableStressMpa;
        var (status, margin) = AtMost(stress, limit, MaxRelativeBand * limit);
        string msg = $"{j.Where}: {weak.Part.Name} ({weak.Material.Name}, {F(weak.ThicknessMm)} mm) bears {F(underWasher)} MPa under a D{F(t.WasherOdMm)} mm washer and {F(onWall)} MPa on the hole wall if the joint slips, against {F(limit)} MPa";
        if (status != CheckStatus.Pass)
            msg += "; " + Fix(j, need => need.WasherBearingAreaMm2(need.MediumHoleMm) * limit * (1 - MaxRelativeBand), j.Count * j.ClampPerFastenerN)
                + $", or a larger washer (at least D{Up(Math.Sqrt(4 * j.ClampPerFastenerN / (limit * (1 - MaxRelativeBand)) / Math.PI + j.HoleMm * j.HoleMm))} mm)";
        return new CheckResult
        {
            Id = CheckIds.FastenerBearing, Part = weak.Part, Counterpart = j.Last == weak.Part ? (j.First == weak.Part ? null : j.First) : j.Last,
            Status = status, Value = stress, Limit = limit, Unit = "MPa", Margin = margin, Message = msg,
            Where = new CheckLocation($"{weak.Part.Name} {j.Where} holes"),
            Basis = $"clamp over the ISO 7089 washer annulus (from memory) and torque share over d x t, against the material table's strength / safety factor; tighten to this clamp, not to the steel's preload",
        };
    }

    private static string Words(FastenerJoint j) => j.Kind == JointKind.ThroughStud ? $"through-studs (grip {F(j.GripMm)} mm)" : $"screws (grip {F(j.GripMm)} mm + hub/frame)";

    /// <summary>The smallest thread that carries the joint at the same count, or the count at the same thread.</summary>
    private static string Fix(FastenerJoint j, Func<MetricThread, double> capacityEach, double totalN)
    {
        var bigger = MetricThreads.All.FirstOrDefault(m => m.NominalMm > (j.Thread?.NominalMm ?? 0) && capacityEach(m) >= totalN / Math.Max(1, j.Count));
        var t = j.Thread!;
        int n = (int)Math.Ceiling(totalN / Math.Max(capacityEach(t), 1e-12));
        string count = Math.Max(n, j.Count + 1) <= 64 ? $"raise {j.Key}.count to {Math.Max(n, j.Count + 1)}" : "";
        string hole = bigger is null ? "" : $"{j.Key}.hole to {F(bigger.MediumHoleMm)} ({bigger.Size})";
        return (count, hole) switch
        {
            ("", "") => "no thread in the table and no count up to 64 carries it: lower the torque or the pull",
            ("", _) => "raise " + hole,
            (_, "") => count,
            _ => $"{count}, or {hole}",
        };
    }
}
