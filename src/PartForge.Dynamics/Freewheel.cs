namespace PartForge.Dynamics;

/// <summary>What carries a coil's current when its switches open: a closed set of variants.</summary>
public abstract record Freewheel
{
    private protected Freewheel() { }

    internal abstract DiodeModel? Diode { get; }
}

/// <summary>Freewheel (flyback) diodes of the given model; see the switching variants for their places.</summary>
public sealed record DiodeFreewheel(DiodeModel Model) : Freewheel
{
    internal override DiodeModel? Diode => Model;
}

/// <summary>
/// No freewheel path: opening a switch forces the coil current to zero at once. The energy 1/2 L i^2 is lost in
/// the switch (arc or avalanche) and counted as switch turn-off loss; the result reports a peak voltage estimate.
/// </summary>
public sealed record NoFreewheel : Freewheel
{
    internal override DiodeModel? Diode => null;
}
