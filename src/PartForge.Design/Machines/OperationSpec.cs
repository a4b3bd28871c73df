namespace PartForge.Design.Machines;

/// <summary>Operating points (<c>operation.*</c>): generator load, motor supply and switch drop, and the lead length per coil.</summary>
public sealed record OperationSpec(double LoadResistanceOhm, double SupplyVoltageV, double SwitchDropV, double LeadAllowanceMm);
