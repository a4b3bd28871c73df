namespace PartForge.Dynamics.Engine;

/// <summary>
/// The discrete part of the state, constant between events: the rotor mode, each driven circuit's switch
/// command, and which conduction path each circuit uses (0 none, +1 the positive-current path, -1 the negative,
/// 2 a resistive load).
/// </summary>
internal sealed class Mode
{
    public RotorMode Rotor;
    public int Dir;
    /// <summary>The rotor's present motion started from rest (breakaway or reversal).</summary>
    public bool FromRest;
    public readonly int[] Cmd;
    public readonly int[] Path;
    /// <summary>The circuit's present path started at zero current (a turn-on).</summary>
    public readonly bool[] FromZero;

    public Mode(int circuits)
    {
        Cmd = new int[circuits];
        Path = new int[circuits];
        FromZero = new bool[circuits];
    }

    public void CopyFrom(Mode o)
    {
        Rotor = o.Rotor;
        Dir = o.Dir;
        FromRest = o.FromRest;
        Array.Copy(o.Cmd, Cmd, Cmd.Length);
        Array.Copy(o.Path, Path, Path.Length);
        Array.Copy(o.FromZero, FromZero, FromZero.Length);
    }

    public bool SameAs(Mode o) =>
        Rotor == o.Rotor && Dir == o.Dir && FromRest == o.FromRest && Cmd.AsSpan().SequenceEqual(o.Cmd)
        && Path.AsSpan().SequenceEqual(o.Path) && FromZero.AsSpan().SequenceEqual(o.FromZero);
}
