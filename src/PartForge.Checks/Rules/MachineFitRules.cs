using PartForge.Checks.Inputs;
using PartForge.Design.Machines;
using PartForge.Geometry.Exact;
using PartForge.Geometry.Profiles;
using PartForge.Parts.Fabrication;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>
/// Every part fits the machine that makes it: print-bed-fit (a printed part's footprint in its printing
/// orientation on the bed in one of the layout's quarter turns, and its height under bed_z) and cut-sheet-fit
/// (a cut part's profile on one of the sheets, at least the spacing from every edge). The value is the least
/// spare, mm: exact axis-aligned bounds of the true arcs and lines against the bed or sheet (a quarter turn
/// swaps the part's width and depth), so a part fits exactly when the spare is 0 or more.
/// </summary>
internal static class MachineFitRules
{
    private const string Basis = "exact bounds of the part's outline (true arcs) against the printable area or the sheet less the edge spacing, in the quarter turns the plate and sheet layouts use";

    public static IEnumerable<CheckResult> Run(CheckContext c)
    {
        foreach (var pv in c.Parts)
        {
            if (pv.Layers.Count == 0) continue;
            yield return pv.Process == PartProcess.Print ? Printed(c.D.Printer, pv) : Cut(c.D.Cutter, pv);
        }
    }

    /// <summary>Spare of a w x h box in a bx x by area, in the better quarter turn.</summary>
    internal static double Spare(double w, double h, double bx, double by) =>
        Math.Max(Math.Min(bx - w, by - h), Math.Min(bx - h, by - w));

    internal static Box2 Bounds(IEnumerable<Contour> outers)
    {
        Box2? box = null;
        foreach (var o in outers) box = box is { } b ? b.Union(Box2.Of(o)) : Box2.Of(o);
        return box ?? throw new ArgumentException("no outline");
    }

    private static CheckResult Printed(PrinterSpec printer, PartView pv)
    {
        var fp = PrintFootprint.Of(pv.Layers);
        var box = Bounds(fp.Outline.Outers);
        double plan = Spare(box.Width, box.Height, printer.BedXMm, printer.BedYMm);
        double tall = printer.BedZMm - fp.HeightMm;
        double spare = Math.Min(plan, tall);
        var (status, margin) = AtLeast(spare, 0, MinBand(0));
        string msg = $"{pv.Name}: {F(box.Width)} x {F(box.Height)} x {F(fp.HeightMm)} mm as printed on a {F(printer.BedXMm)} x {F(printer.BedYMm)} x {F(printer.BedZMm)} mm printer, {F(spare)} mm spare";
        if (spare < 0)
        {
            double needX = Math.Min(box.Width, box.Height), needY = Math.Max(box.Width, box.Height);
            msg += plan < 0
                ? $"; it needs a bed of at least {Up(needY)} x {Up(needX)} mm (printer.bed_x and printer.bed_y), or make the part smaller"
                : $"; it needs printer.bed_z of at least {Up(fp.HeightMm)} mm";
        }
        return new CheckResult
        {
            Id = CheckIds.PrintBedFit, Part = pv.Id, Status = status, Value = spare, Limit = 0, Unit = "mm", Margin = margin,
            Message = msg, Basis = Basis,
        };
    }

    private static CheckResult Cut(CutterSpec cutter, PartView pv)
    {
        var box = Bounds(pv.Layers.SelectMany(l => l.Outers));
        double s2 = 2 * cutter.SpacingMm;
        double best = double.NegativeInfinity;
        SheetSize? on = null;
        foreach (var sh in cutter.Sheets)
        {
            double spare = Spare(box.Width, box.Height, sh.WidthMm - s2, sh.HeightMm - s2);
            if (spare > best) { best = spare; on = sh; }
        }
        var (status, margin) = AtLeast(best, 0, MinBand(0));
        string msg = $"{pv.Name}: {F(box.Width)} x {F(box.Height)} mm to cut, {F(best)} mm spare on the {F(on!.WidthMm)} x {F(on.HeightMm)} mm sheet with {F(cutter.SpacingMm)} mm edge spacing";
        if (best < 0)
            msg += $"; it needs a sheet of at least {Up(Math.Max(box.Width, box.Height) + s2)} x {Up(Math.Min(box.Width, box.Height) + s2)} mm (cutter.sheets, within cutter.bed_x x cutter.bed_y), or print the part (parts.{pv.Id.Facts.OverrideKey}.process: print)";
        return new CheckResult
        {
            Id = CheckIds.CutSheetFit, Part = pv.Id, Status = status, Value = best, Limit = 0, Unit = "mm", Margin = margin,
            Message = msg, Basis = Basis,
        };
    }
}
