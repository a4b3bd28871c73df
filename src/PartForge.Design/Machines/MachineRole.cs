namespace PartForge.Design.Machines;

/// <summary>What the machine is for (<c>machine.role</c>): which operating points and checks apply.</summary>
public enum MachineRole
{
    /// <summary>Driven from outside, into its load (<c>operation.load_resistance</c>).</summary>
    Generator,

    /// <summary>Switched from its supply (<c>operation.supply_voltage</c>) by its timing sensor.</summary>
    Motor,

    /// <summary>Both: run as a motor from its store and driven as a generator into it.</summary>
    MotorGenerator,
}
