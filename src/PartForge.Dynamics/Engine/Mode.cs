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
    public readonly int[] Cmd;
    public readonly int[] Path;

    public Mode(int circuits)
    {
        Cmd = new int[circuits];
        Path = new int[circuits];
    }

    public void CopyFrom(Mode o)
    {
        Rotor = o.Rotor;
        Dir = o.Dir;
        Array.Copy(o.Cmd, Cmd, Cmd.Length);
        Array.Copy(o.Path, Path, Path.Length);
    }

    public bool SameAs(Mode o) =>
        Rotor == o.Rotor && Dir == o.Dir && Cmd.AsSpan().SequenceEqual(o.Cmd) && Path.AsSpan().SequenceEqual(o.Path);
}
