namespace PartForge.Design.Model;

public sealed class Rotor
{
    [Range(0, 1000, MinExclusive = true), Doc("Rotor disc outer diameter, mm (at most 1000: parts are meshed on a 0.0001 mm grid written as float32, which keeps grid points apart only within 512 mm of the centre).")]
    public double OuterDiameter { get; init; } = 110;

    [Range(0.0001, 100), Doc("Rotor disc thickness, mm (at least the 0.0001 mm mesh grid).")]
    public double Thickness { get; init; } = 7;

    [Range(0, 1000), Doc("Central bore diameter, mm (0 = none).")]
    public double Bore { get; init; } = 8;

    [Range(0, 5), Doc("Added to the magnet's size for the pocket (on diameter / on each width), mm.")]
    public double PocketClearance { get; init; } = 0.15;

    [Range(0, 100), Doc("Material left under a blind pocket, mm; 0 = through pockets.")]
    public double PocketFloor { get; init; } = 1.2;

    [Doc("Bolt circle for fixing the rotor to its hub; omit for none.")]
    public BoltCircle? BoltCircle { get; init; }

    [Doc("Optional steel disc behind the magnets; omit for none.")]
    public BackIron? BackIron { get; init; }

    [OneOf("PLA", "PETG", "ABS", "ASA", "PA", "aluminium", "steel", "acrylic", "plywood"), Doc("Rotor disc material.")]
    public string Material { get; init; } = "PLA";

    [OneOf("dots", "none"), Doc("Polarity marks: dots (shallow blind holes beside the north-up pockets, or engraved on a cut disc) or none (mark the magnets yourself).")]
    public string Marks { get; init; } = "dots";

    [OneOf("notch", "none"), Doc("Index mark on the rim at pocket 0: notch (a half-round cut-out) or none.")]
    public string Index { get; init; } = "notch";
}

public sealed class BoltCircle
{
    [Range(0, 2000, MinExclusive = true), Doc("Bolt circle diameter, mm.")]
    public double Diameter { get; init; } = 24;

    [Range(1, 64), Doc("Number of bolt holes.")]
    public int Count { get; init; } = 4;

    [Range(0, 100, MinExclusive = true), Doc("Bolt hole diameter, mm.")]
    public double Hole { get; init; } = 3.4;
}

public sealed class BackIron
{
    [Range(0.0001, 50), Doc("Steel back-iron disc thickness, mm (at least the 0.0001 mm mesh grid).")]
    public double Thickness { get; init; } = 1.5;
}
