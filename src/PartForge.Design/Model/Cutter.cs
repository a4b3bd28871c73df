namespace PartForge.Design.Model;

[Doc("The laser cutter the cut parts are made on: its bed, kerf and the sheets you have.")]
public sealed class Cutter
{
    [Range(10, 10000), Doc("Cutting area along x, mm (default 600: a common small laser-cutter class, from memory).")]
    public double BedX { get; init; } = 600;

    [Range(10, 10000), Doc("Cutting area along y, mm.")]
    public double BedY { get; init; } = 400;

    [Range(0, 2), Doc("Kerf (width of the cut), mm; when given it is used in place of process.kerf.")]
    public double? Kerf { get; init; }

    [Range(0, 50), Doc("Least distance between two parts on a sheet and from a part to the sheet edge, mm; at least the kerf (default 2: common practice for thin sheet, so the web does not burn through).")]
    public double Spacing { get; init; } = 2;

    [Pattern(@"^\s*\d+(\.\d+)?x\d+(\.\d+)?(:\d+)?(\s*,\s*\d+(\.\d+)?x\d+(\.\d+)?(:\d+)?)*\s*$"),
     Doc("Sheet sizes you have, in order of preference: WIDTHxHEIGHT mm, optionally :COUNT, comma-separated (e.g. \"600x400:2, 300x200\"); a size without a count has as many sheets as needed. Default: sheets of the bed's size.")]
    public string? Sheets { get; init; }
}
