namespace PartForge.Electrical.Operation;

/// <summary>
/// Generator at rated speed into a resistive load. 3 phases: `operation.load_resistance` is the load per
/// phase of a balanced star-connected load (a delta load of R is the star-equivalent R/3); the machine is
/// reduced to its star equivalent (star: the phase; delta: line EMF / sqrt 3, R/3, L/3) driving
/// I = E / sqrt((R + R_load)^2 + (omega_e L)^2). 1 phase: the load across the winding. Hot winding resistance
/// (at the coils' steady temperature, Thermal/), coil self-inductance only; copper loss is the only loss counted (no eddy,
/// bearing or windage loss), so efficiency is an upper bound.
/// </summary>
public sealed record GeneratorPoint
{
    public required double Rpm { get; init; }
    public required double LoadResistanceOhm { get; init; }

    /// <summary>Line current (star) or winding current (1-phase), A rms.</summary>
    public required double CurrentA { get; init; }

    /// <summary>Current in the wire of one coil, A rms.</summary>
    public required double CoilCurrentA { get; init; }

    /// <summary>Terminal voltage: line-to-line (3-phase) or across the winding (1-phase), V rms.</summary>
    public required double TerminalVoltageV { get; init; }

    public required double OutputPowerW { get; init; }
    public required double CopperLossW { get; init; }

    /// <summary>Output / (output + copper loss), 0..1.</summary>
    public required double Efficiency { get; init; }

    /// <summary>Shaft torque needed, N m (electromagnetic: output + copper loss over the shaft speed).</summary>
    public required double ShaftTorqueNm { get; init; }

    /// <summary>The source the load sees, per phase of the star equivalent (3-phase) or the winding (1-phase): EMF (V rms),
    /// hot resistance and reactance (ohm), and the phases m: I = E / sqrt((R + R_load)^2 + X^2), copper loss m I^2 R.</summary>
    public double SourceEmfRmsV { get; init; }
    public double SourceResistanceOhm { get; init; }
    public double SourceReactanceOhm { get; init; }
    public int SourcePhases { get; init; } = 1;

    /// <summary>Current density in the copper, A/mm^2 (rms).</summary>
    public required double CurrentDensityAPerMm2 { get; init; }
}
