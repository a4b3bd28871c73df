using PartForge.Design.Parts;
using PartForge.Electrical.Coils;

namespace PartForge.Checks.Inputs;

/// <summary>
/// What the checks take from the electrical results, in one small record (the runner fills it from the
/// electrical engine; tests may build it directly).
/// </summary>
public sealed record ElectricalFacts
{
    /// <summary>Turns per coil.</summary>
    public required int Turns { get; init; }

    /// <summary>Bare copper diameter, mm.</summary>
    public required double WireBareMm { get; init; }

    /// <summary>Overall (enamelled) diameter, mm.</summary>
    public required double WireOverallMm { get; init; }

    /// <summary>The coil outline the turns need at the stated fill factor (coil 0, machine frame).</summary>
    public required CoilOutline Outline { get; init; }

    /// <summary>Current density in the wire at the operating point, A/mm^2 (0 when not computed).</summary>
    public double CurrentDensityAPerMm2 { get; init; }

    /// <summary>Which operating point the current density belongs to ("generator into 10 ohm", ...).</summary>
    public string OperatingPoint { get; init; } = "operating point";

    /// <summary>Axial magnetic pull on each rotor toward the stator side, N, by rotor.</summary>
    public IReadOnlyDictionary<PartId, double> PullOnRotorN { get; init; } = new Dictionary<PartId, double>();

    /// <summary>Shaft torque at the operating point the fasteners must carry, N m (motor: the stall torque; 0 when not computed).</summary>
    public double ShaftTorqueNm { get; init; }

    /// <summary>Attraction between one magnet and its rotor's back iron, N (0 without back iron).</summary>
    public double MagnetToBackIronN { get; init; }

    /// <summary>Mechanical sensor angles (machine frame), degrees.</summary>
    public IReadOnlyList<double> SensorAnglesDeg { get; init; } = Array.Empty<double>();

    /// <summary>Errors and warnings of the electrical engine: (id, error?, key, message).</summary>
    public IReadOnlyList<(string Id, bool IsError, string Key, string Message)> Diagnostics { get; init; } = Array.Empty<(string, bool, string, string)>();

    /// <summary>The drive as the sensors switch it (null: no motor role or no sensor).</summary>
    public PartForge.Electrical.Switching.SwitchingPlan? Switching { get; init; }

    /// <summary>The generator charging its store (null: no generator role or no store).</summary>
    public PartForge.Electrical.Operation.ChargingPoint? Charging { get; init; }

    /// <summary>Flux in each steel face behind the magnets (the electrical engine's <c>BackIron</c>).</summary>
    public IReadOnlyList<PartForge.Electrical.Field.BackIronFluxResult> BackIron { get; init; } = Array.Empty<PartForge.Electrical.Field.BackIronFluxResult>();
}
