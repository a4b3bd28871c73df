namespace PartForge.Design.Model;

public sealed class Stator
{
    [Range(0, 1000), Doc("Stator ring inner diameter, mm.")]
    public double InnerDiameter { get; init; } = 30;

    [Range(0, 1000, MinExclusive = true), Doc("Stator ring outer diameter, mm (at most 1000: parts are meshed on a 0.0001 mm grid written as float32, which keeps grid points apart only within 512 mm of the centre).")]
    public double OuterDiameter { get; init; } = 130;

    [Range(0.0001, 100), Doc("Stator ring thickness, mm (at least the 0.0001 mm mesh grid).")]
    public double Thickness { get; init; } = 6;

    [Doc("Mount holes on a circle; omit for none.")]
    public Mount? Mount { get; init; }

    [OneOf("PLA", "PETG", "ABS", "ASA", "PA", "aluminium", "steel", "acrylic", "plywood"), Doc("Stator ring material.")]
    public string Material { get; init; } = "PLA";
}

public sealed class Mount
{
    [Range(0, 3000, MinExclusive = true), Doc("Mount hole circle diameter, mm.")]
    public double CircleDiameter { get; init; } = 122;

    [Range(1, 64), Doc("Number of mount holes.")]
    public int Count { get; init; } = 4;

    [Range(0, 100, MinExclusive = true), Doc("Mount hole diameter, mm.")]
    public double Hole { get; init; } = 4.5;
}
