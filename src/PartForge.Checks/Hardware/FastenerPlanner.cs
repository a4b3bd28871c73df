using PartForge.Checks.Inputs;
using PartForge.Design.Machines;
using PartForge.Design.Parts;
using PartForge.Parts;

using PartForge.Design.Hardware;

namespace PartForge.Checks.Hardware;

/// <summary>
/// The fasteners that hold the stack together, read from the placed parts: for each hole pattern (the rotor
/// bolt circle, the stator mount holes), every placed part that carries the pattern's holes, ordered along the
/// shaft and split into contiguous runs (a part whose bottom face lies on the previous part's top face belongs to
/// the same run). A run that holds a spacer between the parts it clamps is held by through-studs with a nut at
/// each end (dual-rotor: back iron, rotor, hub spacer, rotor, back iron; dual-stator: stator, rim spacer,
/// stator); any other run is screwed to a hub or frame the design does not contain.
///
/// Loads (our assumptions, stated in the checks' basis):
/// - torque: held by friction between the clamped faces at the pattern's radius, coefficient
///   <see cref="FrictionCoefficient"/> (printed plastic on plastic or steel, common practice, from memory), with a
///   slip safety factor <see cref="SlipSafetyFactor"/> (our choice); the torque is the operating point's shaft
///   torque (motor: the stall torque, the largest the drive gives);
/// - pull: a joint that clamps a rotor counts that rotor's axial pull as if it acted to open the joint
///   (conservative: in a dual-rotor stack the pull presses the rotors onto the hub spacer).
/// </summary>
public static class FastenerPlanner
{
    public const double FrictionCoefficient = 0.2;
    public const double SlipSafetyFactor = 2.0;

    /// <summary>Two faces closer than this are in contact, mm.</summary>
    public const double ContactToleranceMm = 1e-6;

    public static IReadOnlyList<FastenerJoint> Plan(MachineModel d, ElectricalFacts e, IReadOnlyList<PartView> parts)
    {
        var joints = new List<FastenerJoint>();
        if (d.Rotor.BoltCircle is { } bc) joints.AddRange(Joints(d, e, parts, HolePattern.RotorBoltCircle, FeatureKind.BoltHole, bc));
        if (d.Stator.Mount is { } mt) joints.AddRange(Joints(d, e, parts, HolePattern.StatorMount, FeatureKind.MountHole, mt));
        return joints;
    }

    private static IEnumerable<FastenerJoint> Joints(MachineModel d, ElectricalFacts e, IReadOnlyList<PartView> parts, HolePattern pattern, FeatureKind kind, BoltPattern bp)
    {
        var placed = parts.Where(p => p.Id.Role != PartRole.Former && p.OfKind(kind).Any())
            .SelectMany(p => p.Instances.Select(i => new ClampedPart(p.Id, p.Material, i.BottomZMm, i.HeightMm)))
            .OrderBy(c => c.BottomZMm).ThenBy(c => c.Part.Name, StringComparer.Ordinal).ToList();
        var runs = new List<List<ClampedPart>>();
        foreach (var c in placed)
        {
            if (runs.Count > 0 && Math.Abs(runs[^1][^1].TopZMm - c.BottomZMm) <= ContactToleranceMm) runs[^1].Add(c);
            else runs.Add([c]);
        }
        var pick = MetricThreads.ForHole(bp.HoleMm);
        double torque = Math.Max(0, e.ShaftTorqueNm);
        double r = bp.CircleDiameterMm / 2 / 1000;
        foreach (var run in runs)
        {
            bool spacer = run.Skip(1).SkipLast(1).Any(c => c.Part.Role is PartRole.HubSpacer or PartRole.RimSpacer);
            double pull = run.Where(c => c.Part.Role == PartRole.Rotor).Select(c => e.PullOnRotorN.TryGetValue(c.Part, out double f) ? Math.Max(0, f) : 0)
                .DefaultIfEmpty(0).Max();
            double clamp = r > 0 ? SlipSafetyFactor * torque / (FrictionCoefficient * r) : 0;
            yield return new FastenerJoint
            {
                Pattern = pattern, Kind = spacer ? JointKind.ThroughStud : JointKind.BoltToMount,
                Thread = pick?.Thread, HoleSeries = pick?.Series ?? "", HoleMm = bp.HoleMm, CircleDiameterMm = bp.CircleDiameterMm, Count = bp.Count,
                Clamped = run, TorqueNm = torque, PullN = pull, ClampPerFastenerN = (clamp + pull) / Math.Max(1, bp.Count),
            };
        }
    }
}
