using System.Globalization;
using PartForge.Design.Machines;
using PartForge.Formats.Cutting;
using PartForge.Geometry.Layout;
using PartForge.Parts;
using PartForge.Parts.Fabrication;

namespace PartForge.Export.Exporters;

/// <summary>
/// The cut sheets: one per cut part (its exact profile, engraved marks and the kerf) and one per nested sheet
/// (<see cref="CutSheetNest"/>: every copy of the cut parts of one material and thickness placed on it, the
/// sheet's edge and a label per copy on the notes layer), written by the DXF and SVG formats alike.
/// </summary>
internal static class CutSheets
{
    /// <summary>The variant of a nested sheet's file: "sheet-" and its number from 1.</summary>
    public const string SheetVariant = "sheet-";

    public static CutSheet Of(MachineModel m, PartModel p) =>
        new(p.Name, p.CutProfile ?? throw new InvalidOperationException($"cut part {p.Name} has no cut profile"), p.Marks, m.Process.KerfMm);

    /// <summary>The nest of the cut parts in scope (computed once per build and shared).</summary>
    public static CutSheetNest Nest(ExportScope scope) => scope.All.SheetsOf(scope.Cut, scope.Machine.Cutter, scope.Machine.Precision);

    /// <summary>The per-part files, then one file per nested sheet.</summary>
    public static IEnumerable<PlannedFile> Plan(ExportScope scope, ExportFormat format, string extension)
    {
        foreach (var p in scope.Cut) yield return new PlannedFile(scope.PartFile(p, extension), format, [p], []);
        var cut = scope.Cut.ToArray();
        if (cut.Length == 0) yield break;
        foreach (var (stock, bin, n) in Nest(scope).Sheets())
        {
            var on = stock.Layout.Placements.Where(p => p.BinIndex == bin.Index).Select(p => p.PartId).ToHashSet();
            var parts = stock.Parts.Where(p => on.Contains(p.Name)).ToArray();
            yield return new PlannedFile(Pipeline.OutputNames.SheetFile(scope.Machine.Name, n, extension), format, parts, [], SheetVariant + n.ToString(CultureInfo.InvariantCulture)) { LaidOut = cut };
        }
    }

    /// <summary>The cut sheet of a planned file: a part's, or a nested sheet's (the nest of the file's scope: the cut parts of the build).</summary>
    public static CutSheet For(PlannedFile file, ExportContext context)
    {
        var m = context.Evaluation.Machine;
        if (!file.Variant.StartsWith(SheetVariant, StringComparison.Ordinal)) return Of(m, file.Part!);
        int number = int.Parse(file.Variant[SheetVariant.Length..], CultureInfo.InvariantCulture);
        var nest = context.Evaluation.Parts!.SheetsOf(file.LaidOut, m.Cutter, m.Precision);
        var (stock, bin, _) = nest.Sheets().Single(s => s.Number == number);
        var (cuts, marks) = stock.Placed(bin.Index);
        var labels = new List<(string, Geometry.Primitives.Vec2)>();
        foreach (var pl in stock.Layout.Placements.Where(p => p.BinIndex == bin.Index))
        {
            var placed = pl.Place(stock.Part(pl.PartId).CutProfile!);
            var box = placed.Outers.Select(Geometry.Exact.Box2.Of).Aggregate((a, b) => a.Union(b));
            labels.Add(($"{pl.PartId} {pl.Copy + 1}/{stock.Part(pl.PartId).Quantity}", new Geometry.Primitives.Vec2(box.MinX + 1, box.MinY + 1)));
        }
        string title = $"{m.Name} sheet {number} of {nest.SheetCount}: {stock.Material} {F(stock.ThicknessMm)} mm, {F(bin.WidthMm)} x {F(bin.HeightMm)} mm, {F(100 * bin.Utilisation)} % used";
        return new CutSheet(title, cuts, marks, m.Process.KerfMm) { Frame = new SheetFrame(bin.WidthMm, bin.HeightMm, labels) };
    }

    private static string F(double v) => v.ToString("0.##", CultureInfo.InvariantCulture);
}
