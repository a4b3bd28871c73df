namespace PartForge.Design.Machines;

/// <summary>Operating points (<c>operation.*</c>): generator load, motor supply and switch drop, the lead length per coil,
/// and the still air around the machine (<c>operation.ambient_temperature</c>, C) the coils shed their heat into.</summary>
public sealed record OperationSpec(double LoadResistanceOhm, double SupplyVoltageV, double SwitchDropV, double LeadAllowanceMm)
{
    /// <summary>Still-air temperature around the machine, C (<c>operation.ambient_temperature</c>).</summary>
    public double AmbientC { get; init; } = 25;
}
