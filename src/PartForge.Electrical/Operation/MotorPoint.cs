namespace PartForge.Electrical.Operation;

/// <summary>
/// Motor on a DC supply through the switch. 3 phases: an ideal six-step drive; at every rotor angle the pair of
/// terminals with the largest line EMF conducts, through two switch drops and the line-to-line resistance
/// (star 2R, delta 2R/3). 1 phase: the sensor-timed switch conducts for the half period in which the EMF is
/// positive (shifted by the advance), through one switch drop. Current i = max(0, (V - drops - e) / R)
/// (a freewheel diode stops reverse current), torque i e / omega; inductance neglected, so currents are
/// upper bounds at speed. Averages are over one electrical period. No-load speed: where the average
/// conducting EMF equals the supply less the drops. Hot winding resistance (at the coils' steady temperature, Thermal/).
/// </summary>
public sealed record MotorPoint
{
    /// <summary>"six-step" or "pulse".</summary>
    public required string Drive { get; init; }
    public required double SupplyVoltageV { get; init; }
    public required double SwitchDropV { get; init; }

    /// <summary>Resistance in the conducting path, ohm (hot).</summary>
    public required double PathResistanceOhm { get; init; }

    public required double NoLoadRpm { get; init; }

    /// <summary>Average torque at standstill over rotor positions, N m.</summary>
    public required double StallTorqueNm { get; init; }

    /// <summary>Supply current at standstill while conducting, A.</summary>
    public required double StallCurrentA { get; init; }

    public required double RatedRpm { get; init; }

    /// <summary>Average supply current at rated speed, A (0 when rated speed is above the no-load speed).</summary>
    public required double CurrentAtRatedA { get; init; }
    public required double TorqueAtRatedNm { get; init; }
    public required double OutputPowerAtRatedW { get; init; }
    public required double InputPowerAtRatedW { get; init; }

    /// <summary>Copper loss of the whole winding at rated speed, W: the mean square of the path current times the path resistance.</summary>
    public double CopperLossAtRatedW { get; init; }

    /// <summary>Mechanical output / electrical input at rated speed (switch and copper losses only), 0..1.</summary>
    public required double EfficiencyAtRated { get; init; }

    /// <summary>RMS current density in the wire at rated speed, A/mm^2.</summary>
    public required double CurrentDensityAtRatedAPerMm2 { get; init; }

    /// <summary>Current density at stall while conducting, A/mm^2.</summary>
    public required double CurrentDensityAtStallAPerMm2 { get; init; }
}
