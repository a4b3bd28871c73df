using PartForge.Design.Machines;

namespace PartForge.Electrical.Operation;

/// <summary>The operating point that governs a machine's loading (its current density and its coils' heat).</summary>
public enum OperatingMode
{
    /// <summary>Generator at rated speed into <c>operation.load_resistance</c>.</summary>
    Generator,

    /// <summary>Motor at rated speed on <c>operation.supply_voltage</c>.</summary>
    Motor,

    /// <summary>A motor-generator: judged at the harder of the two points (the larger copper loss or current density).</summary>
    Both,
}

/// <summary>Which operating point governs a machine: decided here only.</summary>
public static class OperatingChoice
{
    /// <summary>
    /// From <c>machine.role</c>, never from the sensor: a motor at rated speed on <c>operation.supply_voltage</c>, a
    /// generator at rated speed into <c>operation.load_resistance</c>, a motor-generator at the harder of the two.
    /// </summary>
    public static OperatingMode For(MachineModel machine) =>
        machine.RunsAsMotor && machine.RunsAsGenerator ? OperatingMode.Both
        : machine.RunsAsMotor ? OperatingMode.Motor : OperatingMode.Generator;
}
