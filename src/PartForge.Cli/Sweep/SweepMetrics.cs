namespace PartForge.Cli.Sweep;

/// <summary>
/// Names of the numeric results a sweep reports per variant: the results document's own paths
/// (electrical.phase.emf_rms_v, summary.fail), and worst_running_gap, the smallest worst-case running gap of the
/// running-gap checks (the limit a design sets is gap.min_running_gap; this is the value computed against it).
/// <c>--target</c> takes any of them; the shorter names of earlier versions (phase.emf_rms_v) are read as aliases.
/// </summary>
public static class SweepMetrics
{
    public const string PhaseEmfRms = "electrical.phase.emf_rms_v";
    public const string LineEmfRms = "electrical.line_emf_rms_v";
    public const string PhaseResistance = "electrical.phase.resistance_20c_ohm";
    public const string PhaseResistanceHot = "electrical.phase.resistance_hot_ohm";
    public const string FillFactor = "electrical.coil.fill_factor";
    public const string Turns = "electrical.coil.turns";
    public const string CoilWireLength = "electrical.coil.wire_length_m";
    public const string KeVPerKrpm = "electrical.ke_v_per_krpm";
    public const string MagneticGap = "electrical.magnetic_gap";
    public const string ElectricalHz = "electrical.electrical_hz";
    /// <summary>The smallest worst-case running gap over every rotating face (the checker's running-gap value), mm.</summary>
    public const string WorstRunningGap = "worst_running_gap";
    public const string FailCount = "summary.fail";
    public const string WarnCount = "summary.warn";

    /// <summary>The metric a name stands for: a metric's own name, or an earlier short name (phase.emf_rms_v, checks.fail,
    /// min_running_gap); null for anything else.</summary>
    public static string? Resolve(string name)
    {
        if (All.Contains(name)) return name;
        if (All.Contains("electrical." + name)) return "electrical." + name;
        return name switch
        {
            "min_running_gap" => WorstRunningGap,
            "checks.fail" => FailCount,
            "checks.warn" => WarnCount,
            _ => null,
        };
    }

    public static readonly IReadOnlyList<string> All =
    [
        PhaseEmfRms, LineEmfRms, PhaseResistance, PhaseResistanceHot, FillFactor, Turns, CoilWireLength, KeVPerKrpm,
        MagneticGap, ElectricalHz, WorstRunningGap, FailCount, WarnCount,
    ];

    /// <summary>The columns of the printed table after the varied keys: (metric, heading, format).</summary>
    public static readonly IReadOnlyList<(string Key, string Heading, string Format)> TableColumns =
    [
        (PhaseEmfRms, "phase V rms", "0.000"),
        (LineEmfRms, "line V rms", "0.000"),
        (PhaseResistance, "phase ohm", "0.000"),
        (FillFactor, "fill", "0.000"),
        (WorstRunningGap, "worst gap mm", "0.000"),
    ];
}
