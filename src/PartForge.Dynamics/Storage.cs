namespace PartForge.Dynamics;

/// <summary>
/// The energy store on the drive's and rectifiers' DC side, a closed set of variants: an internal source (fixed
/// or a capacitor's voltage) behind a series resistance. The terminal voltage is V_source - R_series I, with I
/// the current drawn from the store (negative while charging).
/// </summary>
public abstract record Storage
{
    private protected Storage() { }

    /// <summary>Series resistance, ohm.</summary>
    internal abstract double SeriesOhm { get; }

    /// <summary>Capacitance, F, or 0 when the internal voltage is fixed.</summary>
    internal virtual double FaradsOrZero => 0;

    /// <summary>Internal voltage at the start, V.</summary>
    internal abstract double InitialV { get; }
}

/// <summary>An ideal DC source: fixed voltage, no internal resistance.</summary>
/// <param name="VoltageV">Voltage, V.</param>
public sealed record IdealSupply(double VoltageV) : Storage
{
    internal override double SeriesOhm => 0;
    internal override double InitialV => VoltageV;
}

/// <summary>A capacitor with an equivalent series resistance and no leakage.</summary>
/// <param name="CapacitanceF">Capacitance, F (more than 0).</param>
/// <param name="EsrOhm">Equivalent series resistance, ohm (0 or more).</param>
/// <param name="InitialVoltageV">Voltage at the start, V.</param>
public sealed record Capacitor(double CapacitanceF, double EsrOhm, double InitialVoltageV) : Storage
{
    internal override double SeriesOhm => EsrOhm;
    internal override double FaradsOrZero => CapacitanceF;
    internal override double InitialV => InitialVoltageV;
}

/// <summary>
/// A battery as a fixed open-circuit voltage behind an internal resistance (no state of charge: for runs short
/// against its capacity).
/// </summary>
/// <param name="OpenCircuitV">Open-circuit voltage, V.</param>
/// <param name="InternalOhm">Internal resistance, ohm (0 or more).</param>
public sealed record Battery(double OpenCircuitV, double InternalOhm) : Storage
{
    internal override double SeriesOhm => InternalOhm;
    internal override double InitialV => OpenCircuitV;
}
