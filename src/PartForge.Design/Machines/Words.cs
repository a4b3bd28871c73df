namespace PartForge.Design.Machines;

/// <summary>
/// The design file's words for the model's closed sets, for output (results document, report, BOM): the one
/// place they are written. The loader reads the same words (<see cref="MachineModel.From"/>).
/// </summary>
public static class Words
{
    public static string Of(PartProcess p) => p switch { PartProcess.Cut => "cut", _ => "print" };

    public static string Of(Connection c) => c switch
    {
        Connection.Star => "star",
        Connection.Delta => "delta",
        Connection.Series => "series",
        _ => "parallel",
    };

    public static string Of(SensorKind k) => k switch { SensorKind.Hall => "hall", SensorKind.Reed => "reed", _ => "none" };

    public static string Of(MachineRole r) => r switch { MachineRole.Motor => "motor", MachineRole.MotorGenerator => "motor-generator", _ => "generator" };

    public static string Of(MagnetArrangement a) => a switch { MagnetArrangement.Same => "same", _ => "alternating" };

    public static string Of(SwitchingKind s) => s switch { SwitchingKind.Bipolar => "bipolar", SwitchingKind.SixStep => "six-step", _ => "unipolar" };

    public static string Of(DiodeKind k) => k == DiodeKind.Schottky ? "schottky" : "silicon";

    public static string Of(RectifierKind r) => r switch { RectifierKind.Bridge => "bridge", RectifierKind.HalfWave => "half-wave", _ => "none" };

    public static string Of(StorageSpec s) => s switch { CapacitorStorage => "capacitor", BatteryStorage => "battery", _ => "none" };

    public static string Of(CoilShape s) => s switch { CoilShape.Keystone => "keystone", _ => "round" };
}
