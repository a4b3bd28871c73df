namespace PartForge.Design.Model;

[Doc("The 3D printer the printed parts are made on: its printable volume and nozzle.")]
public sealed class Printer
{
    [Range(10, 5000), Doc("Printable size of the bed along x, mm (default 220: a common desktop printer class, from memory).")]
    public double BedX { get; init; } = 220;

    [Range(10, 5000), Doc("Printable size of the bed along y, mm.")]
    public double BedY { get; init; } = 220;

    [Range(1, 5000), Doc("Printable height, mm.")]
    public double BedZ { get; init; } = 250;

    [Range(0.05, 3), Doc("Nozzle diameter, mm; when given it is used in place of process.nozzle (walls, corner reliefs).")]
    public double? Nozzle { get; init; }

    [Range(0, 50), Doc("Gap between parts laid out on one plate, mm (default 3: common practice, keeps the first-layer skirt of one part off its neighbour).")]
    public double Spacing { get; init; } = 3;
}
