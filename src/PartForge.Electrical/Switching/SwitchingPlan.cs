using PartForge.Design.Machines;

namespace PartForge.Electrical.Switching;

/// <summary>One conduction window of a driven circuit: [OnDeg, OffDeg) of the mechanical rotor angle within one
/// revolution (OffDeg below OnDeg wraps through 360), the sign of the applied voltage, and what the pulse does.</summary>
/// <param name="OnDeg">Rotor angle at which the switch closes, mechanical degrees, [0, 360).</param>
/// <param name="OffDeg">Rotor angle at which it opens, mechanical degrees, [0, 360).</param>
/// <param name="Sign">+1: the supply drives positive current into the circuit; -1: negative (bipolar, six-step low side).</param>
/// <param name="FluxChangeWb">Sign x (lambda(off) - lambda(on)), Wb-turns: the pulse's torque integral per ampere
/// (the integral of T = i d lambda / d theta over the window at a constant current of 1 A), N m rad/A. Negative: the pulse brakes.</param>
public sealed record PulseWindow(double OnDeg, double OffDeg, int Sign, double FluxChangeWb)
{
    /// <summary>Width of the window, mechanical degrees.</summary>
    public double WidthDeg => OffDeg >= OnDeg ? OffDeg - OnDeg : OffDeg + 360 - OnDeg;

    /// <summary>True when the pulse's torque integral is negative.</summary>
    public bool Brakes { get; init; }
}

/// <summary>The pulses of one circuit (a phase) over one revolution.</summary>
/// <param name="Phase">'A', 'B' or 'C'.</param>
/// <param name="Windows">Every conduction window over one revolution, in angle order.</param>
/// <param name="ConductionElecDeg">Conducting share of one electrical period, electrical degrees (both signs).</param>
public sealed record CircuitPulses(char Phase, IReadOnlyList<PulseWindow> Windows, double ConductionElecDeg);

/// <summary>
/// The drive as the sensors really switch it: the field at each sensor's place read against its thresholds
/// (see <see cref="SwitchingPlanner"/>), the conduction windows of every driven circuit, each pulse's torque sign,
/// what the rotor does at standstill, and the switch's duty (peak current, voltage at turn-off).
/// </summary>
public sealed record SwitchingPlan
{
    public required SwitchingKind Switching { get; init; }
    public required SensorKind Sensor { get; init; }

    /// <summary>Operate (pull-in) and release fields, T.</summary>
    public required double OperateTesla { get; init; }
    public required double ReleaseTesla { get; init; }

    /// <summary>Axial position of the sensing point, mm (machine frame), and its radius, mm.</summary>
    public required double SensorZMm { get; init; }
    public required double SensorRadiusMm { get; init; }

    /// <summary>Largest and smallest field the first sensor sees over a revolution, T (positive along +z).</summary>
    public required double FieldMaxTesla { get; init; }
    public required double FieldMinTesla { get; init; }

    /// <summary>The field the first sensor sees against the rotor angle over one electrical period (<see cref="FieldAngleDeg"/>), T.</summary>
    public required IReadOnlyList<double> FieldTesla { get; init; }
    public required IReadOnlyList<double> FieldAngleDeg { get; init; }

    public required IReadOnlyList<CircuitPulses> Circuits { get; init; }

    /// <summary>Pulses per revolution that brake (torque integral below zero by more than 0.1 % of the largest pulse).</summary>
    public int BrakingPulses => Circuits.Sum(c => c.Windows.Count(w => w.Brakes));

    /// <summary>Pulses per revolution that drive.</summary>
    public int DrivingPulses => Circuits.Sum(c => c.Windows.Count(w => !w.Brakes));

    /// <summary>The supply the drive switches, V (the store's start or battery voltage, else operation.supply_voltage).</summary>
    public required double SupplyV { get; init; }

    /// <summary>Drops of the closed switches in the conducting path, V.</summary>
    public required double SwitchDropsV { get; init; }

    /// <summary>Resistance of the conducting path (hot winding, plus the store's series resistance), ohm.</summary>
    public required double PathResistanceOhm { get; init; }

    /// <summary>Current while conducting at standstill, A: the peak the switch carries.</summary>
    public required double PeakCurrentA { get; init; }

    /// <summary>Mean torque at standstill over rotor angles (quasi-static, no inductance), N m.</summary>
    public required double MeanStallTorqueNm { get; init; }

    /// <summary>Share of rotor angles from which the rotor starts by itself, 0..1: the drive's work less the friction's, summed
    /// along the path from rest (quasi-static, no inductance), stays above zero for a whole electrical period.</summary>
    public required double SelfStartShare { get; init; }

    /// <summary>Rotor angle (mechanical degrees, first electrical period) from which a start from rest has the largest least
    /// energy margin (else the largest standstill torque): where a start from rest is simulated.</summary>
    public required double BestStartAngleDeg { get; init; }

    /// <summary>Voltage across the opening switch, V: supply plus a diode drop with a freewheel; without one
    /// supply + i sqrt(L / C_stray), C_stray = 100 pF (an order of magnitude for a small coil and its wiring, from memory).</summary>
    public required double TurnOffVoltageV { get; init; }

    /// <summary>Switched power (peak current x supply voltage), W.</summary>
    public double SwitchedPowerW => PeakCurrentA * SupplyV;

    /// <summary>The advance (electrical degrees, within the key's range) that gives the largest mean drive torque with this
    /// sensor and drive, and whether the pulses then all drive; null when no advance makes a positive torque.</summary>
    public double? BestAdvanceElecDeg { get; init; }
    public bool BestAdvanceRuns { get; init; }

    /// <summary>When pulses brake: the smallest operate field (release in the same ratio), T, at which every pulse drives
    /// at the design's advance (a less sensitive sensor, or one farther from the magnets); null if none up to the peak field.</summary>
    public double? RunsFromOperateTesla { get; init; }

    /// <summary>The sign of the drive of a circuit at a rotor angle (mechanical degrees): +1, -1, or 0 when open.</summary>
    public int SignAt(int circuit, double angleDeg)
    {
        double a = angleDeg % 360;
        if (a < 0) a += 360;
        foreach (var w in Circuits[circuit].Windows)
        {
            bool inside = w.OffDeg >= w.OnDeg ? a >= w.OnDeg && a < w.OffDeg : a >= w.OnDeg || a < w.OffDeg;
            if (inside) return w.Sign;
        }
        return 0;
    }

    /// <summary>Stray capacitance assumed across an opening switch without a freewheel, F (from memory).</summary>
    public const double StrayCapacitanceF = 100e-12;
}
