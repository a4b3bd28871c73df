namespace PartForge.Design.Machines;

/// <summary>The energy store (<c>storage.*</c>): a closed set of variants.</summary>
public abstract record StorageSpec
{
    private protected StorageSpec() { }

    /// <summary>No store: the motor runs from <c>operation.supply_voltage</c>, the generator feeds <c>operation.load_resistance</c>.</summary>
    public static readonly StorageSpec None = new NoStorage();
}

/// <summary>No store.</summary>
public sealed record NoStorage : StorageSpec;

/// <summary>A capacitor: capacitance F, rated voltage V, ESR ohm, charge at the start of a simulation V.</summary>
public sealed record CapacitorStorage(double CapacitanceF, double RatedVoltageV, double EsrOhm, double StartVoltageV) : StorageSpec
{
    /// <summary>Energy stored at a voltage, J (C V^2 / 2).</summary>
    public double EnergyAtJ(double v) => 0.5 * CapacitanceF * v * v;
}

/// <summary>A battery: open-circuit voltage V behind an internal resistance ohm (no state of charge).</summary>
public sealed record BatteryStorage(double VoltageV, double InternalResistanceOhm) : StorageSpec;

/// <summary>The rectifier between each generator circuit and the store (<c>load.rectifier</c>).</summary>
public enum RectifierKind
{
    /// <summary>No rectifier: AC into the resistive load.</summary>
    None,

    /// <summary>One diode per circuit: charges on the positive half-wave only.</summary>
    HalfWave,

    /// <summary>A four-diode bridge per circuit: charges on both half-waves through two drops.</summary>
    Bridge,
}

/// <summary>The generator's load (<c>load.*</c>): rectifier and diode kind.</summary>
public sealed record LoadSpec(RectifierKind Rectifier, DiodeKind Diode)
{
    /// <summary>Diode drops in the conducting path: 0, 1 (half-wave) or 2 (bridge).</summary>
    public int DropsInPath => Rectifier switch { RectifierKind.Bridge => 2, RectifierKind.HalfWave => 1, _ => 0 };
}

/// <summary>Extra inertia and drag of the rotating assembly (<c>mechanics.*</c>).</summary>
/// <param name="ExtraInertiaKgM2">Inertia beyond the parts and magnets, kg m^2.</param>
/// <param name="FrictionTorqueNm">Constant (Coulomb) friction torque, N m.</param>
/// <param name="ViscousDragNmsPerRad">Viscous drag, N m s/rad.</param>
public sealed record MechanicsSpec(double ExtraInertiaKgM2, double FrictionTorqueNm, double ViscousDragNmsPerRad);
