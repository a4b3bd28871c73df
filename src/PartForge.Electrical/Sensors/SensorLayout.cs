using PartForge.Design.Machines;

namespace PartForge.Electrical.Sensors;

/// <summary>Where the timing sensors go, and the rule used.</summary>
public sealed record SensorLayout
{
    /// <summary>Hall, reed or none.</summary>
    public required SensorKind Kind { get; init; }
    public required IReadOnlyList<SensorPlacement> Sensors { get; init; }

    /// <summary>1-phase pulse drive: the electrical rotor angle at which the coil is switched on (advance included), degrees; null for 3 phases.</summary>
    public double? SwitchOnElecDeg { get; init; }

    /// <summary>How the angles were found, one sentence.</summary>
    public required string Rule { get; init; }
}
