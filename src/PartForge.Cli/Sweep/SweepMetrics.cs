namespace PartForge.Cli.Sweep;

/// <summary>
/// Names of the numeric results a sweep reports per variant. They follow the results document's keys
/// (electrical.phase.emf_rms_v is "phase.emf_rms_v"); <c>--target</c> takes any of them.
/// </summary>
public static class SweepMetrics
{
    public const string PhaseEmfRms = "phase.emf_rms_v";
    public const string LineEmfRms = "line_emf_rms_v";
    public const string PhaseResistance = "phase.resistance_20c_ohm";
    public const string PhaseResistanceHot = "phase.resistance_hot_ohm";
    public const string FillFactor = "coil.fill_factor";
    public const string Turns = "coil.turns";
    public const string CoilWireLength = "coil.wire_length_m";
    public const string KeVPerKrpm = "ke_v_per_krpm";
    public const string MagneticGap = "magnetic_gap";
    public const string ElectricalHz = "electrical_hz";
    /// <summary>The smallest worst-case running gap over every rotating face (the checker's running-gap value), mm.</summary>
    public const string MinRunningGap = "min_running_gap";
    public const string FailCount = "checks.fail";
    public const string WarnCount = "checks.warn";

    public static readonly IReadOnlyList<string> All =
    [
        PhaseEmfRms, LineEmfRms, PhaseResistance, PhaseResistanceHot, FillFactor, Turns, CoilWireLength, KeVPerKrpm,
        MagneticGap, ElectricalHz, MinRunningGap, FailCount, WarnCount,
    ];

    /// <summary>The columns of the printed table after the varied keys: (metric, heading, format).</summary>
    public static readonly IReadOnlyList<(string Key, string Heading, string Format)> TableColumns =
    [
        (PhaseEmfRms, "phase V rms", "0.000"),
        (LineEmfRms, "line V rms", "0.000"),
        (PhaseResistance, "phase ohm", "0.000"),
        (FillFactor, "fill", "0.000"),
        (MinRunningGap, "min gap mm", "0.000"),
    ];
}
