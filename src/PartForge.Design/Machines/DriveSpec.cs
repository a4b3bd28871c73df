namespace PartForge.Design.Machines;

/// <summary>How the drive connects its circuits to the supply (<c>drive.switching</c>).</summary>
public enum SwitchingKind
{
    /// <summary>One switch per circuit; current flows one way only.</summary>
    Unipolar,

    /// <summary>An H-bridge per circuit: +V while the sensor is on, -V while it is off.</summary>
    Bipolar,

    /// <summary>A 3-phase bridge in 120-degree conduction from three Hall sensors.</summary>
    SixStep,
}

/// <summary>A diode's kind: its typical forward drop.</summary>
public enum DiodeKind
{
    /// <summary>A silicon junction diode, 0.7 V (typical, from memory).</summary>
    Silicon,

    /// <summary>A Schottky diode, 0.4 V (typical, from memory).</summary>
    Schottky,
}

/// <summary>The motor drive (<c>drive.*</c>), defaults resolved.</summary>
/// <param name="Switching">Unipolar, bipolar or six-step.</param>
/// <param name="HasFreewheel">A freewheel (flyback) diode is fitted.</param>
/// <param name="Diode">The freewheel diode's kind.</param>
/// <param name="SwitchCurrentRatingA">Largest current the switch may carry, A.</param>
/// <param name="SwitchVoltageRatingV">Largest voltage across the open switch, V.</param>
/// <param name="SwitchPowerRatingW">Reed contact rating (switched current x supply voltage), W; null for a transistor.</param>
public sealed record DriveSpec(SwitchingKind Switching, bool HasFreewheel, DiodeKind Diode, double SwitchCurrentRatingA,
    double SwitchVoltageRatingV, double? SwitchPowerRatingW)
{
    /// <summary>The forward drop of a diode kind, V (typical values, from memory).</summary>
    public static double DropOf(DiodeKind k) => k == DiodeKind.Schottky ? 0.4 : 0.7;
}
