namespace PartForge.Dynamics.Engine;

/// <summary>
/// The conduction paths of one circuit for each switch command (-1, 0, +1): the path a positive current takes,
/// the path a negative current takes (null: that sign is blocked), or one two-way resistive load.
/// </summary>
internal sealed class PortTable
{
    private readonly Branch?[] _pos = new Branch?[3];
    private readonly Branch?[] _neg = new Branch?[3];

    /// <summary>A resistive load: always conducting, both signs.</summary>
    public Branch? Load { get; init; }

    /// <summary>Open terminals: never any current.</summary>
    public bool IsOpen { get; init; }

    /// <summary>A leg of the six-step star (the coil runs from the leg to the star point).</summary>
    public bool IsStarLeg { get; init; }

    /// <summary>The smallest series resistance of any path (0 if there is none), ohm.</summary>
    public double MinOhm => _pos.Concat(_neg).Append(Load).Where(b => b is not null).Select(b => b!.Value.Ohm).DefaultIfEmpty(0).Min();

    public Branch? Positive(int cmd) => _pos[cmd + 1];

    public Branch? Negative(int cmd) => _neg[cmd + 1];

    public PortTable Set(int cmd, Branch? positive, Branch? negative)
    {
        _pos[cmd + 1] = positive;
        _neg[cmd + 1] = negative;
        return this;
    }

    /// <summary>The same paths for every command.</summary>
    public PortTable SetAll(Branch? positive, Branch? negative)
    {
        for (int c = -1; c <= 1; c++) Set(c, positive, negative);
        return this;
    }
}
