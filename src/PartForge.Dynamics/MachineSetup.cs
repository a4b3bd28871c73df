namespace PartForge.Dynamics;

/// <summary>
/// Everything the engine simulates: rotor, circuits, drive and store. Plain numbers in SI units; compared by
/// value. All coil currents start at zero.
/// </summary>
public sealed record MachineSetup
{
    private readonly CoilCircuit[] _circuits;

    /// <summary>A machine from its parts.</summary>
    public MachineSetup(RotorParameters rotor, IEnumerable<CoilCircuit> circuits, Storage storage, Drive? drive = null)
    {
        Rotor = rotor;
        _circuits = circuits.ToArray();
        Storage = storage;
        Drive = drive;
    }

    /// <summary>The rotor.</summary>
    public RotorParameters Rotor { get; init; }

    /// <summary>The coil circuits, indexed as in the results.</summary>
    public IReadOnlyList<CoilCircuit> Circuits => _circuits;

    /// <summary>The store the drive draws from and the rectifiers charge.</summary>
    public Storage Storage { get; init; }

    /// <summary>The drive for circuits with a <see cref="DriveConnection"/> (null when there are none).</summary>
    public Drive? Drive { get; init; }

    /// <summary>Rotor angle at the start, mechanical degrees.</summary>
    public double InitialAngleDeg { get; init; }

    public bool Equals(MachineSetup? other) =>
        other is not null && Rotor == other.Rotor && Storage == other.Storage && Drive == other.Drive
        && InitialAngleDeg.Equals(other.InitialAngleDeg) && _circuits.AsSpan().SequenceEqual(other._circuits);

    public override int GetHashCode()
    {
        var h = new HashCode();
        h.Add(Rotor);
        h.Add(Storage);
        h.Add(Drive);
        h.Add(InitialAngleDeg);
        foreach (var c in _circuits) h.Add(c);
        return h.ToHashCode();
    }
}
