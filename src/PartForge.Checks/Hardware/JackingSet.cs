using PartForge.Checks.Inputs;
using PartForge.Design.Hardware;
using PartForge.Design.Parts;
using PartForge.Parts;

namespace PartForge.Checks.Hardware;

/// <summary>
/// The jacking screws of the last rotor, read from its <see cref="FeatureKind.JackHole"/> features: thread,
/// count, the parts they pass (the rotor and its back iron, if it has the holes too), the screw length
/// (those parts + <see cref="LiftMm"/>) and the pull they hold at the running gap.
/// </summary>
public sealed record JackingSet(PartId Rotor, MetricThread Thread, int Count, double PassMm, double PullN)
{
    /// <summary>How far the screws can hold the rotor off the hub spacer, mm (our choice: enough to set the rotor on
    /// the screws, align the studs and lower it; the pull there is below the running-gap pull).</summary>
    public const double LiftMm = 20;

    /// <summary>Screw length: the parts it passes plus the lift, mm.</summary>
    public double ScrewLengthMm => PassMm + LiftMm;

    public static JackingSet? From(ElectricalFacts e, IReadOnlyList<PartView> parts)
    {
        var rotor = parts.FirstOrDefault(p => p.Id.Role == PartRole.Rotor && p.OfKind(FeatureKind.JackHole).Any());
        if (rotor is null) return null;
        var holes = rotor.OfKind(FeatureKind.JackHole).ToList();
        if (MetricThreads.ForHole(2 * (holes[0].Contour.Circle?.Radius ?? 0)) is not { } pick) return null;
        double pass = rotor.Instances[0].HeightMm;
        var ri = rotor.Instances[0];
        // The back-iron copy that lies on this rotor's back face (hosted by it) and carries the jack holes too.
        foreach (var p in parts.Where(p => p.Id.Role == PartRole.BackIron && p.OfKind(FeatureKind.JackHole).Any()))
            pass += p.Instances.Where(i => i.Host == rotor.Id).Sum(i => i.HeightMm);
        double pull = e.PullOnRotorN.TryGetValue(rotor.Id, out double f) ? Math.Max(0, f) : 0;
        return new JackingSet(rotor.Id, pick.Thread, holes.Count, pass, pull);
    }
}
