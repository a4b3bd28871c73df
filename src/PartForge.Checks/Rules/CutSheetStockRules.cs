using PartForge.Design.Machines;
using PartForge.Parts;
using static PartForge.Checks.Judge;

namespace PartForge.Checks.Rules;

/// <summary>
/// cut-sheet-stock: every copy of every cut part finds a place in the nest of its material and thickness on the
/// sheets the user has (<c>cutter.sheets</c>, each count per material and thickness). The value is the copies of
/// the part left without a sheet; it passes at 0. The nest is the one the DXF and SVG sheets are written from
/// (<see cref="PartSet.SheetsOf"/>), so the check judges exactly what the files hold.
/// </summary>
internal static class CutSheetStockRules
{
    private const string Basis = "the nest of the cut sheets (bottom-left fill on no-fit polygons of the parts' convex hulls) on the sheet sizes and counts of cutter.sheets";

    public static IEnumerable<CheckResult> Run(MachineModel d, PartSet parts)
    {
        var cut = parts.Parts.Where(p => p.Process == PartProcess.Cut && p.CutProfile is not null).ToArray();
        if (cut.Length == 0) yield break;
        var nest = parts.SheetsOf(cut, d.Cutter, d.Precision);
        foreach (var stock in nest.Stocks)
        {
            foreach (var p in stock.Parts)
            {
                int missing = stock.Layout.NotPlaced.Count(m => m.PartId == p.Name);
                int sheets = stock.Layout.Bins.Count(b => stock.Layout.Placements.Any(pl => pl.BinIndex == b.Index && pl.PartId == p.Name));
                var (status, margin) = AtMost(missing, 0, 0);
                string msg = missing == 0
                    ? $"{p.Name}: all {p.Quantity} on {sheets} sheet{(sheets == 1 ? "" : "s")} of {stock.Material} {F(stock.ThicknessMm)} mm"
                    : $"{p.Name}: {missing} of {p.Quantity} left without a sheet of {stock.Material} {F(stock.ThicknessMm)} mm: the sheets of cutter.sheets are used up; raise a size's count (or leave the count off for as many as needed) or add a larger size";
                yield return new CheckResult
                {
                    Id = CheckIds.CutSheetStock, Part = p.Id, Status = status, Value = missing, Limit = 0, Unit = "copies", Margin = margin,
                    Message = msg, Basis = Basis,
                };
            }
        }
    }
}
