using System.Diagnostics.Contracts;
using PartForge.Dynamics.Engine;

namespace PartForge.Dynamics;

/// <summary>What a circuit's terminals are connected to: a closed set of variants.</summary>
public abstract record CircuitConnection
{
    private protected CircuitConnection() { }

    /// <summary>The circuit's conduction paths; the drive is given for driven circuits.</summary>
    internal abstract PortTable Table(Drive? drive);
}

/// <summary>
/// Driven by the machine's <see cref="Drive"/>: the switches close while the rotor angle is inside one of the
/// windows (sensor timing). Windows must not overlap.
/// </summary>
public sealed record DriveConnection : CircuitConnection
{
    private readonly ConductionWindow[] _windows;

    /// <summary>A driven circuit with its conduction windows over one revolution.</summary>
    public DriveConnection(IEnumerable<ConductionWindow> windows) => _windows = windows.ToArray();

    /// <summary>The conduction windows over one mechanical revolution.</summary>
    public IReadOnlyList<ConductionWindow> Windows => _windows;

    /// <summary>
    /// Windows given within the first of <paramref name="periodsPerRevolution"/> equal periods (angles from 0 to
    /// 360 / periods; a window whose end is below its start wraps through the end of the period), repeated over
    /// the revolution, for example once per magnet or once per pole pair.
    /// </summary>
    [Pure]
    public static DriveConnection Periodic(int periodsPerRevolution, params ConductionWindow[] firstPeriod)
    {
        int n = Math.Max(1, periodsPerRevolution);
        double pitch = 360.0 / n;
        var all = new List<ConductionWindow>();
        for (int k = 0; k < n; k++)
            foreach (var w in firstPeriod)
            {
                double width = w.OffDeg >= w.OnDeg ? w.OffDeg - w.OnDeg : w.OffDeg + pitch - w.OnDeg;
                double on = w.OnDeg + k * pitch;
                all.Add(new ConductionWindow(Wrap(on), Wrap(on + width), w.Sign));
            }
        return new DriveConnection(all);
    }

    private static double Wrap(double deg)
    {
        double r = deg % 360.0;
        if (r < 0) r += 360.0;
        return r >= 360.0 ? 0 : r;
    }

    internal override PortTable Table(Drive? drive) =>
        drive is null ? new PortTable { IsOpen = true } : drive.Switching.Table(drive.Switch, drive.Freewheel.Diode);

    public bool Equals(DriveConnection? other) => other is not null && _windows.AsSpan().SequenceEqual(other._windows);

    public override int GetHashCode()
    {
        var h = new HashCode();
        foreach (var w in _windows) h.Add(w);
        return h.ToHashCode();
    }
}

/// <summary>
/// One diode in series from the circuit's + terminal to the store's + terminal: it conducts while the back-EMF
/// exceeds the store voltage plus one drop (positive EMF only), charging the store.
/// </summary>
public sealed record HalfWaveRectifier(DiodeModel Diode) : CircuitConnection
{
    internal override PortTable Table(Drive? drive) => new PortTable().SetAll(null, Branch.Diodes(1, -1, 1, Diode));
}

/// <summary>
/// A single-phase diode bridge of its own between the circuit and the store: it conducts on either sign of the
/// back-EMF once its size exceeds the store voltage plus two drops.
/// </summary>
public sealed record BridgeRectifier(DiodeModel Diode) : CircuitConnection
{
    internal override PortTable Table(Drive? drive) =>
        new PortTable().SetAll(Branch.Diodes(-1, 1, 2, Diode), Branch.Diodes(1, -1, 2, Diode));
}

/// <summary>A resistor across the circuit's terminals (an AC load, no rectifier); the store is not involved.</summary>
public sealed record ResistiveLoad(double LoadOhm) : CircuitConnection
{
    internal override PortTable Table(Drive? drive) => new() { Load = Branch.Load(LoadOhm) };
}

/// <summary>Open terminals: the circuit carries no current (its flux linkage still turns with the rotor).</summary>
public sealed record OpenCircuit : CircuitConnection
{
    internal override PortTable Table(Drive? drive) => new() { IsOpen = true };
}
