namespace PartForge.Design.Model;

[Doc("How the coils are switched from the supply (machine.role motor or motor-generator).")]
public sealed class Drive
{
    [OneOf("unipolar", "bipolar", "six-step"),
     Doc("unipolar: one switch per circuit, current one way; bipolar: an H-bridge, +V or -V from a Hall's two states; six-step: a 3-phase bridge from 3 Halls. Default: unipolar for 1 phase, six-step for 3 phases.")]
    public string? Switching { get; init; }

    [OneOf("diode", "none"), Doc("diode: a freewheel (flyback) diode across each coil (unipolar) or the bridge's diodes; none: the switch opens the coil current (a reed arcs).")]
    public string Freewheel { get; init; } = "diode";

    [OneOf("silicon", "schottky"), Doc("Freewheel diode type: silicon (0.7 V) or schottky (0.4 V drop; typical values, from memory).")]
    public string Diode { get; init; } = "silicon";

    [Range(0, 1000, MinExclusive = true), Doc("Largest current the switch may carry, A (default: reed 0.5, transistor 1.0; datasheet-typical, from memory).")]
    public double? SwitchCurrentRating { get; init; }

    [Range(0, 10000, MinExclusive = true), Doc("Largest voltage across the open switch, V (default: reed 200, transistor 40; datasheet-typical, from memory).")]
    public double? SwitchVoltageRating { get; init; }

    [Range(0, 10000, MinExclusive = true), Doc("Reed contact rating, W (switched current x supply voltage; default 10: datasheet-typical, from memory). Not used for a transistor.")]
    public double? SwitchPowerRating { get; init; }
}

[Doc("The energy store: the motor's supply and the generator's load (through load.rectifier).")]
public sealed class Storage
{
    [OneOf("none", "capacitor", "battery"), Doc("none: the motor runs from operation.supply_voltage and the generator feeds operation.load_resistance; capacitor or battery: the store.")]
    public string Kind { get; init; } = "none";

    [Range(0, 10000, MinExclusive = true), Doc("Capacitance, F (capacitor).")]
    public double? Capacitance { get; init; }

    [Range(0, 1000, MinExclusive = true), Doc("Rated voltage of the capacitor, V.")]
    public double? RatedVoltage { get; init; }

    [Range(0, 1000), Doc("Equivalent series resistance of the capacitor, ohm.")]
    public double Esr { get; init; } = 0.1;

    [Range(0, 1000), Doc("Charge of the capacitor at the start of a simulation, V (at most storage.rated_voltage).")]
    public double StartVoltage { get; init; }

    [Range(0, 1000, MinExclusive = true), Doc("Open-circuit voltage of the battery, V.")]
    public double? Voltage { get; init; }

    [Range(0, 100), Doc("Internal resistance of the battery, ohm.")]
    public double InternalResistance { get; init; } = 0.05;
}

[Doc("How the generator's coils feed the store.")]
public sealed class Load
{
    [OneOf("none", "half-wave", "bridge"), Doc("Rectifier between each circuit and the store: none (AC into operation.load_resistance), half-wave (one diode) or bridge (four diodes). Default: bridge with a store, none without.")]
    public string? Rectifier { get; init; }

    [OneOf("silicon", "schottky"), Doc("Rectifier diode type: silicon (0.7 V) or schottky (0.4 V drop; typical values, from memory).")]
    public string Diode { get; init; } = "silicon";
}

[Doc("What turns with the rotor beyond the parts and magnets, and what holds it back.")]
public sealed class Mechanics
{
    [Range(0, 100), Doc("Moment of inertia on the shaft beyond the parts and magnets (a wheel, a flywheel), kg m^2.")]
    public double ExtraInertia { get; init; }

    [Range(0, 100), Doc("Constant friction torque of the bearings and seals, N m (default 0.0002: two small ball bearings, order of magnitude, from memory).")]
    public double FrictionTorque { get; init; } = 0.0002;

    [Range(0, 100), Doc("Viscous drag (air, grease), torque per unit speed, N m s/rad.")]
    public double ViscousDrag { get; init; }
}
