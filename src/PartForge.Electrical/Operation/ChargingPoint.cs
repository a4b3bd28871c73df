using PartForge.Design.Machines;

namespace PartForge.Electrical.Operation;

/// <summary>One point of the charging curve: speed, mean charging current into the store, power into the store.</summary>
public readonly record struct ChargingSample(double Rpm, double CurrentA, double PowerW);

/// <summary>
/// The generator charging its store through its rectifier (<c>load.rectifier</c>, <c>storage.*</c>), quasi-static:
/// at each rotor angle the rectifier conducts when the rectified EMF exceeds the store voltage plus the diode drops
/// in the path, and the current is that excess over the path resistance (winding, hot, plus the store's series
/// resistance). Inductance is neglected, so currents are upper bounds (the time simulation integrates it). 1 phase:
/// the winding's EMF (bridge: its size; half-wave: its positive part). 3 phases: a three-phase bridge (the largest
/// line EMF, through two phase resistances in star or 2R/3 in delta) or a three-phase half-wave (the largest phase
/// EMF to the star point). Results at the store's voltage: a battery's, or a capacitor's rated voltage.
/// </summary>
public sealed record ChargingPoint
{
    public required RectifierKind Rectifier { get; init; }

    /// <summary>The store voltage the curve is computed at, V (battery voltage, or the capacitor's rated voltage).</summary>
    public required double StoreVoltageV { get; init; }

    /// <summary>Diode drops in the conducting path, V.</summary>
    public required double DropsV { get; init; }

    /// <summary>Resistance of the conducting path, ohm.</summary>
    public required double PathResistanceOhm { get; init; }

    /// <summary>Speed at which charging begins: the rectified EMF peak equals the store voltage plus the drops, rpm.</summary>
    public required double CutInRpm { get; init; }

    /// <summary>Mean charging current and power into the store at rated speed.</summary>
    public required double CurrentAtRatedA { get; init; }
    public required double PowerAtRatedW { get; init; }

    /// <summary>Charging current and power against speed, 0 to max_rpm.</summary>
    public required IReadOnlyList<ChargingSample> Curve { get; init; }

    /// <summary>The highest voltage the rectifier can put on an unloaded store at max_rpm (rectified EMF peak less the drops), V.</summary>
    public required double OpenCircuitPeakAtMaxRpmV { get; init; }

    /// <summary>The same at rated speed, V: the most a capacitor charges to at rated speed.</summary>
    public required double ReachableAtRatedV { get; init; }

    /// <summary>Capacitor: the voltage the time to charge is counted to (its rated voltage, or 90 % of the way from the start
    /// to the reachable voltage when the rated one is not reached), V; null for a battery.</summary>
    public double? ChargeTargetV { get; init; }

    /// <summary>Capacitor: time from storage.start_voltage to <see cref="ChargeTargetV"/> at rated speed, s; null for a battery or when it never charges.</summary>
    public double? TimeToChargeS { get; init; }

    /// <summary>Capacitor: energy at its rated voltage, J.</summary>
    public double? StoredEnergyAtRatedJ { get; init; }
}
