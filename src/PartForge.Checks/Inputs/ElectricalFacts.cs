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

    /// <summary>The winding's steady temperature at the operating point, C (the electrical engine's heat balance).</summary>
    public double CoilTemperatureC { get; init; } = 25;

    /// <summary>Still air around the machine, C.</summary>
    public double AmbientC { get; init; } = 25;

    /// <summary>Copper loss in one coil at its steady temperature, W.</summary>
    public double CopperLossPerCoilW { get; init; }

    /// <summary>Thermal resistance from one coil's winding to the air, K/W (0 when not computed).</summary>
    public double CoilThermalResistanceKPerW { get; init; }

    /// <summary>True when the motor point governs (its current heats the coils), false for the generator point.</summary>
    public bool MotorGoverns { get; init; }

    /// <summary>The generator's source per phase at the coils' temperature (null when not computed): EMF V rms, resistance and
    /// reactance ohm, phases; with the coils in the machine, what the coil-temperature fix recomputes the loss from.</summary>
    public (double EmfV, double ROhm, double XOhm, int Phases, int Coils)? GeneratorSource { get; init; }

    /// <summary>The magnets' estimated operating temperature, C.</summary>
    public double MagnetTemperatureC { get; init; } = 25;

    /// <summary>Axial magnetic pull on each rotor toward the stator side, N, by rotor.</summary>
    public IReadOnlyDictionary<PartId, double> PullOnRotorN { get; init; } = new Dictionary<PartId, double>();

    /// <summary>Shaft torque at the operating point the fasteners must carry, N m (motor: the stall torque; 0 when not computed).</summary>
    public double ShaftTorqueNm { get; init; }

    /// <summary>Attraction between one magnet and its rotor's back iron, N (0 without back iron).</summary>
    public double MagnetToBackIronN { get; init; }

    /// <summary>Mechanical sensor angles (machine frame), degrees.</summary>
    public IReadOnlyList<double> SensorAnglesDeg { get; init; } = Array.Empty<double>();

    /// <summary>Errors and warnings of the electrical engine: (id, error?, key, message).</summary>
    public IReadOnlyList<(string Id, bool IsError, string Key, string Message, PartForge.Electrical.DiagnosticMeasure? Measure)> Diagnostics { get; init; } = Array.Empty<(string, bool, string, string, PartForge.Electrical.DiagnosticMeasure?)>();

    /// <summary>The drive as the sensors switch it (null: no motor role or no sensor).</summary>
    public PartForge.Electrical.Switching.SwitchingPlan? Switching { get; init; }

    /// <summary>The generator charging its store (null: no generator role or no store).</summary>
    public PartForge.Electrical.Operation.ChargingPoint? Charging { get; init; }

    /// <summary>Flux in each steel face behind the magnets (the electrical engine's <c>BackIron</c>).</summary>
    public IReadOnlyList<PartForge.Electrical.Field.BackIronFluxResult> BackIron { get; init; } = Array.Empty<PartForge.Electrical.Field.BackIronFluxResult>();
}
