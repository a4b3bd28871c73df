namespace PartForge.Design.Model;

public sealed class Magnets
{
    [OneOf("disc", "block", "arc", "sector"), Doc("disc | block | arc (segment of an annulus) | sector (trapezoidal block, wider at its outer edge).")]
    public string Shape { get; init; } = "disc";

    [OneOf("alternating", "same"),
     Doc("alternating: neighbouring magnets show opposite poles to the coils; same: every magnet shows the same pole to the coils (the flux in a coil has a steady part and pulses once per magnet; any magnet count).")]
    public string Arrangement { get; init; } = "alternating";

    [Range(0, 500, MinExclusive = true), Doc("Disc magnet diameter, mm (shape: disc).")]
    public double? Diameter { get; init; }

    [Range(0, 500, MinExclusive = true), Doc("Radial length, mm (shape: block, sector).")]
    public double? Length { get; init; }

    [Range(0, 500, MinExclusive = true), Doc("Block magnet tangential width, mm (shape: block).")]
    public double? Width { get; init; }

    [Range(0, 500, MinExclusive = true), Doc("Tangential width at the inner edge, mm (shape: sector).")]
    public double? InnerWidth { get; init; }

    [Range(0, 500, MinExclusive = true), Doc("Tangential width at the outer edge, mm (shape: sector).")]
    public double? OuterWidth { get; init; }

    [Range(0, 1000), Doc("Arc segment inner radius, mm (shape: arc).")]
    public double? InnerRadius { get; init; }

    [Range(0, 1000, MinExclusive = true), Doc("Arc segment outer radius, mm (shape: arc).")]
    public double? OuterRadius { get; init; }

    [Range(0, 360, MinExclusive = true), Doc("Arc segment angular span, degrees (shape: arc).")]
    public double? Span { get; init; }

    [Range(0.0001, 100), Doc("Magnet thickness along the axis, mm (at least the 0.0001 mm mesh grid).")]
    public double Thickness { get; init; } = 4;

    [Pattern("^N(3[5-9]|4[0-9]|5[0-2])(M|H|SH|UH|EH)?$"), Doc("Sintered NdFeB grade N35 ... N52 with an optional suffix M, H, SH, UH, EH; its Br is ignored when br is given, its suffix still sets the maximum working temperature.")]
    public string Grade { get; init; } = "N42";

    [Range(0, 2, MinExclusive = true), Doc("Remanence at 20 C in tesla; overrides the grade's mid-range value (it falls with the magnets' temperature).")]
    public double? Br { get; init; }

    [Range(0, 1000, MinExclusive = true), Doc("Radius of the magnet centres, mm (disc, block; sector: the midpoint of its radial centre line).")]
    public double? PitchRadius { get; init; }
}
