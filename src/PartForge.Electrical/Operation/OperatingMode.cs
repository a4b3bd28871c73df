using PartForge.Design.Machines;

namespace PartForge.Electrical.Operation;

/// <summary>The operating point that governs a machine's loading (its current density and its coils' heat).</summary>
public enum OperatingMode
{
    /// <summary>Generator at rated speed into <c>operation.load_resistance</c>.</summary>
    Generator,

    /// <summary>Motor at rated speed on <c>operation.supply_voltage</c>.</summary>
    Motor,
}

/// <summary>Which operating point governs a machine: decided here only.</summary>
public static class OperatingChoice
{
    /// <summary>
    /// A machine with a timing sensor is driven as a motor (the sensor switches the coils); one without is a generator
    /// into <c>operation.load_resistance</c>. Both at rated rpm.
    /// </summary>
    public static OperatingMode For(MachineModel machine) =>
        machine.Sensor.Kind != SensorKind.None ? OperatingMode.Motor : OperatingMode.Generator;
}
