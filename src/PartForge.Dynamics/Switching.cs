using PartForge.Dynamics.Engine;

namespace PartForge.Dynamics;

/// <summary>How the drive connects its circuits to the store: a closed set of variants.</summary>
public abstract record Switching
{
    private protected Switching() { }

    /// <summary>The signs a conduction window may carry for this switching.</summary>
    internal abstract bool AllowsSign(int sign);

    /// <summary>The conduction paths of one driven circuit (or star leg) under this switching.</summary>
    internal abstract PortTable Table(SwitchModel sw, DiodeModel? freewheel);
}

/// <summary>
/// One switch per circuit, in series with the coil across the store; current flows one way only, while the
/// switch is closed. With a diode freewheel the diode sits across the coil (the usual flyback diode): at
/// turn-off the current circulates through coil and diode and decays; the same diode also conducts whenever the
/// back-EMF drives current forward through it (it brakes). Windows carry sign +1.
/// </summary>
public sealed record UnipolarSwitching : Switching
{
    internal override bool AllowsSign(int sign) => sign == 1;

    internal override PortTable Table(SwitchModel sw, DiodeModel? freewheel) =>
        new PortTable()
            .Set(1, Branch.Switches(1, 1, 1, sw), null)
            .Set(0, freewheel is null ? null : Branch.Diodes(0, 1, 1, freewheel), null)
            .Set(-1, null, null);
}

/// <summary>
/// An H-bridge per circuit: a window of sign +1 applies +V through two switches, sign -1 applies -V; otherwise
/// the bridge is off. With a diode freewheel the bridge's four diodes return the coil current to the store (and
/// rectify the back-EMF when it exceeds the store voltage plus two drops).
/// </summary>
public sealed record BipolarSwitching : Switching
{
    internal override bool AllowsSign(int sign) => sign is 1 or -1;

    internal override PortTable Table(SwitchModel sw, DiodeModel? freewheel)
    {
        Branch? dPos = freewheel is null ? null : Branch.Diodes(-1, 1, 2, freewheel);
        Branch? dNeg = freewheel is null ? null : Branch.Diodes(1, -1, 2, freewheel);
        return new PortTable()
            .Set(1, Branch.Switches(1, 1, 2, sw), dNeg)
            .Set(0, dPos, dNeg)
            .Set(-1, dPos, Branch.Switches(-1, -1, 2, sw));
    }
}

/// <summary>
/// A three-phase bridge driving exactly three circuits connected in star (120-degree conduction: the windows
/// close each leg's high side with sign +1 and its low side with sign -1, two legs at a time). The bridge's
/// diodes carry the outgoing phase current during commutation, so a diode freewheel is required.
/// </summary>
public sealed record SixStepSwitching : Switching
{
    internal override bool AllowsSign(int sign) => sign is 1 or -1;

    internal override PortTable Table(SwitchModel sw, DiodeModel? freewheel)
    {
        var d = freewheel ?? DiodeModel.Ideal;
        var t = new PortTable { IsStarLeg = true };
        for (int c = -1; c <= 1; c++)
        {
            Branch pos = c == 1 ? Branch.Switches(1, 1, 1, sw) : Branch.Diodes(0, 1, 1, d);
            Branch neg = c == -1 ? Branch.Switches(0, -1, 1, sw) : Branch.Diodes(1, -1, 1, d);
            t.Set(c, pos, neg);
        }
        return t;
    }
}
