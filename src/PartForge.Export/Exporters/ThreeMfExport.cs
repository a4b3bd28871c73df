using PartForge.Export.Pipeline;
using PartForge.Formats.ThreeMf;
using PartForge.Geometry.Primitives;
using PartForge.Parts;
using PartForge.Parts.Fabrication;

namespace PartForge.Export.Exporters;

/// <summary>
/// 3MF: one package of every printed part laid out on printer plates (<see cref="PrintPlates"/>: one object per
/// distinct part, part-local, and one build item per copy whose transform puts it on its plate in its printing
/// orientation; plate k (from 0) spans x from k x (bed_x + <see cref="PlateGapMm"/>), so plates lie side by side);
/// with more than one plate, also one package per plate (<c>&lt;name&gt;-plate-&lt;k&gt;.3mf</c>, k from 1, the
/// plate at the origin), which is what a slicer takes one at a time; and, when the build covers the whole
/// machine, the exploded assembly of every copy of every part (<see cref="AssemblyThreeMf"/>): an assembly with
/// parts missing would mislead the visual check it is for.
/// </summary>
public sealed class ThreeMfExport : ExportFormat
{
    public const string AssemblyVariant = "assembly";

    /// <summary>Gap between neighbouring plates in the package of all plates, mm.</summary>
    public const double PlateGapMm = 20;

    private const string PlateVariant = "plate-";

    public override string Name => "3mf";
    public override ExportInput Input => ExportInput.Mesh;

    public override IEnumerable<PlannedFile> Plan(ExportScope scope)
    {
        var printed = scope.Printed.ToArray();
        if (printed.Length > 0)
        {
            yield return new PlannedFile(OutputNames.ThreeMf(scope.Machine.Name), this, printed, printed, "parts");
            var plates = scope.All.PlatesOf(printed, scope.Machine.Printer, scope.Machine.Precision);
            for (int k = 0; k < plates.PlateCount && plates.PlateCount > 1; k++)
            {
                var on = plates.Layout.Placements.Where(p => p.BinIndex == k).Select(p => p.PartId).ToHashSet();
                var parts = printed.Where(p => on.Contains(p.Name)).ToArray();
                yield return new PlannedFile(OutputNames.PlateThreeMf(scope.Machine.Name, k + 1), this, parts, printed, PlateVariant + k.ToString(System.Globalization.CultureInfo.InvariantCulture));
            }
        }
        if (scope.WholeMachine) yield return new PlannedFile(OutputNames.AssemblyThreeMf(scope.Machine.Name), this, scope.Parts, scope.Parts, AssemblyVariant);
    }

    public override void Write(Stream stream, PlannedFile file, ExportContext context)
    {
        string name = context.Evaluation.Machine.Name;
        if (file.Variant == AssemblyVariant)
            ThreeMfWriter.Write(stream, AssemblyThreeMf.Title(name), AssemblyThreeMf.Objects(context.Evaluation.Parts!));
        else
        {
            var machine = context.Evaluation.Machine;
            int? only = file.Variant.StartsWith(PlateVariant, StringComparison.Ordinal) ? int.Parse(file.Variant[PlateVariant.Length..], System.Globalization.CultureInfo.InvariantCulture) : null;
            // A plate file's meshed parts are all the scope's printed parts: its plate is that plate of their layout.
            var plates = context.Evaluation.Parts!.PlatesOf(file.MeshedParts, machine.Printer, machine.Precision);
            string title = only is { } k ? $"{name} plate {k + 1} of {plates.PlateCount}" : name;
            ThreeMfWriter.Write(stream, title, Objects(plates, only));
        }
    }

    /// <summary>One object per distinct part on the plates written (in the parts' order), its build items the placed copies.</summary>
    public static IReadOnlyList<ThreeMfObject> Objects(PrintPlates plates, int? onlyPlate = null)
    {
        ArgumentNullException.ThrowIfNull(plates);
        var byPart = new List<(string Name, List<ThreeMfTransform> Items)>();
        foreach (var pl in plates.Layout.Placements)
        {
            if (onlyPlate is { } k && pl.BinIndex != k) continue;
            double shift = onlyPlate is null ? pl.BinIndex * (plates.Printer.BedXMm + PlateGapMm) : 0;
            var fp = plates.Footprint(pl.PartId);
            double sg = fp.Flipped ? -1 : 1, c = Angle.CosDeg(pl.RotationDeg), s = Angle.SinDeg(pl.RotationDeg);
            // Row vectors (3MF Core 3.3): turned over about x when flipped (y, z -> -y, h - z), then turned about z.
            var t = new ThreeMfTransform(c, s, 0, -s * sg, c * sg, 0, 0, 0, sg, pl.OffsetMm.X + shift, pl.OffsetMm.Y, fp.Flipped ? fp.HeightMm : 0);
            int i = byPart.FindIndex(b => b.Name == pl.PartId);
            if (i < 0) { byPart.Add((pl.PartId, new List<ThreeMfTransform>())); i = byPart.Count - 1; }
            byPart[i].Items.Add(t);
        }
        // Objects in the parts' order (the machine's), build items in the order placed.
        var order = plates.PartNames.Select((n, i) => (n, i)).ToDictionary(x => x.n, x => x.i);
        return byPart.OrderBy(b => order[b.Name]).Select(b => new ThreeMfObject(b.Name, plates.Part(b.Name).Mesh, b.Items)).ToArray();
    }
}
