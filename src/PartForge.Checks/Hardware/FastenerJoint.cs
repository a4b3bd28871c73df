using PartForge.Design.Materials;
using PartForge.Design.Parts;

using PartForge.Design.Hardware;

namespace PartForge.Checks.Hardware;

/// <summary>How a joint's fasteners are made.</summary>
public enum JointKind
{
    /// <summary>A stud (threaded rod) with a nut and washer at each end, both nuts on parts of the machine.</summary>
    ThroughStud,

    /// <summary>A screw (or stud) that clamps the machine's parts to a hub or frame outside the design.</summary>
    BoltToMount,
}

/// <summary>Which hole pattern of the design a joint uses.</summary>
public enum HolePattern
{
    /// <summary>The rotor bolt circle (<c>rotor.bolt_circle</c>).</summary>
    RotorBoltCircle,

    /// <summary>The stator mount holes (<c>stator.mount</c>).</summary>
    StatorMount,
}

/// <summary>One part clamped by a joint, and the copy of it, bottom to top.</summary>
public readonly record struct ClampedPart(PartId Part, Material Material, double BottomZMm, double ThicknessMm)
{
    public double TopZMm => BottomZMm + ThicknessMm;
}

/// <summary>
/// A set of identical fasteners on one hole pattern that clamp a contiguous run of parts, read from the placed
/// parts (<see cref="FastenerPlanner"/>). The grip is the sum of the clamped parts' thicknesses.
/// </summary>
public sealed record FastenerJoint
{
    public required HolePattern Pattern { get; init; }
    public required JointKind Kind { get; init; }

    /// <summary>The thread the pattern's hole takes (ISO 273 fine series rule); null when the hole is below M1.6's.</summary>
    public required MetricThread? Thread { get; init; }

    /// <summary>The ISO 273 series the hole falls in.</summary>
    public required string HoleSeries { get; init; }

    public required double HoleMm { get; init; }
    public required double CircleDiameterMm { get; init; }
    public required int Count { get; init; }

    /// <summary>The parts between the nuts (or between the head and the mount), bottom to top.</summary>
    public required IReadOnlyList<ClampedPart> Clamped { get; init; }

    /// <summary>Sum of the clamped parts' thicknesses, mm (equal to the stack's height, which is contiguous).</summary>
    public double GripMm => Clamped.Sum(c => c.ThicknessMm);

    /// <summary>Torque the joint transmits, N m.</summary>
    public required double TorqueNm { get; init; }

    /// <summary>Axial magnetic pull on the clamped rotor(s) counted against the joint, N (conservative, see the planner).</summary>
    public required double PullN { get; init; }

    /// <summary>Clamp force each fastener must hold: friction for the torque plus the pull, per fastener, N.</summary>
    public required double ClampPerFastenerN { get; init; }

    /// <summary>The design key of the pattern (rotor.bolt_circle or stator.mount).</summary>
    public string Key => Pattern == HolePattern.RotorBoltCircle ? "rotor.bolt_circle" : "stator.mount";

    /// <summary>A few words for the BOM and the report.</summary>
    public string Where => Pattern == HolePattern.RotorBoltCircle ? "rotor bolt circle" : "stator mount";

    /// <summary>The part at the bottom and the part at the top of the clamped run.</summary>
    public PartId First => Clamped[0].Part;
    public PartId Last => Clamped[^1].Part;
}
