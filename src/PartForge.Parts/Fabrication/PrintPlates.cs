using PartForge.Design.Machines;
using PartForge.Geometry;
using PartForge.Geometry.Layout;
using PartForge.Geometry.Primitives;

namespace PartForge.Parts.Fabrication;

/// <summary>
/// Every copy of every printed part laid out on printer plates: each part in its printing orientation
/// (<see cref="PrintFootprint"/>, largest flat face down), placed by <see cref="PlatePacker"/> (bottom-left
/// fill on no-fit polygons of the footprints' convex hulls, quarter turns about z, <c>printer.spacing</c>
/// between parts) on as many plates of <c>printer.bed_x x bed_y</c> as needed. A part larger than the bed is
/// listed in <see cref="LayoutResult.NotPlaced"/> (the print-bed-fit check fails it).
/// </summary>
public sealed class PrintPlates
{
    private PrintPlates(LayoutResult layout, IReadOnlyDictionary<string, (PartModel Part, PrintFootprint Footprint)> parts, IReadOnlyList<string> names, PrinterSpec printer)
    {
        PartNames = names;
        Layout = layout;
        _parts = parts;
        Printer = printer;
    }

    private readonly IReadOnlyDictionary<string, (PartModel Part, PrintFootprint Footprint)> _parts;

    /// <summary>Plates (bins) and placements (by plate, then in the order placed); layout ids are part names.</summary>
    public LayoutResult Layout { get; }

    public PrinterSpec Printer { get; }

    /// <summary>The printed parts laid out, in the order given.</summary>
    public IReadOnlyList<string> PartNames { get; }

    public int PlateCount => Layout.Bins.Count;

    /// <summary>Lays out the printed parts given (their every copy).</summary>
    public static PrintPlates Of(IEnumerable<PartModel> printed, PrinterSpec printer, Precision precision)
    {
        ArgumentNullException.ThrowIfNull(printed);
        ArgumentNullException.ThrowIfNull(printer);
        var parts = new Dictionary<string, (PartModel, PrintFootprint)>();
        var items = new List<LayoutItem>();
        var names = new List<string>();
        foreach (var p in printed.Where(p => p.Process == PartProcess.Print))
        {
            var fp = PrintFootprint.Of(p.ExactLayers);
            parts[p.Name] = (p, fp);
            names.Add(p.Name);
            items.Add(fp.Item(p.Name, p.Quantity));
        }
        var options = new PlateOptions(printer.BedXMm, printer.BedYMm) { SpacingMm = printer.SpacingMm };
        return new PrintPlates(PlatePacker.Pack(items, options, precision), parts, names, printer);
    }

    /// <summary>The footprint (orientation) of a laid-out part.</summary>
    public PrintFootprint Footprint(string partName) => _parts[partName].Footprint;

    /// <summary>The part a placement refers to.</summary>
    public PartModel Part(string partName) => _parts[partName].Part;

    /// <summary>
    /// Where a part-local point goes on its plate: turned over if the part prints upside down
    /// ((x, y, z) -> (x, -y, h - z)), then turned about z by the placement's rotation and shifted by its offset.
    /// </summary>
    public Vec3 ToPlate(LayoutPlacement placement, Vec3 local)
    {
        ArgumentNullException.ThrowIfNull(placement);
        var fp = Footprint(placement.PartId);
        var q = fp.Flipped ? new Vec3(local.X, -local.Y, fp.HeightMm - local.Z) : local;
        var xy = placement.Apply(new Vec2(q.X, q.Y));
        return new Vec3(xy.X, xy.Y, q.Z);
    }

    /// <summary>
    /// Share of a plate's area under the parts' bed faces (the first layer), 0..1: the sum of the faces on the
    /// bed of the copies on that plate over bed_x x bed_y.
    /// </summary>
    public double Fill(int plate) =>
        Layout.Placements.Where(p => p.BinIndex == plate).Sum(p => Footprint(p.PartId).BedFaceAreaMm2) / (Printer.BedXMm * Printer.BedYMm);

    /// <summary>Copies placed on a plate.</summary>
    public int CopiesOn(int plate) => Layout.Placements.Count(p => p.BinIndex == plate);
}
