using PartForge.Design.Machines;
using PartForge.Geometry;
using PartForge.Geometry.Layout;
using PartForge.Geometry.Profiles;

namespace PartForge.Parts.Fabrication;

/// <summary>
/// Every copy of every cut part nested on the cutter's sheets, one nest per stock (material and thickness):
/// the kernel's <see cref="SheetNester"/> (bottom-left fill on no-fit polygons of the parts' convex hulls,
/// largest part first, quarter turns) on the sizes of <c>cutter.sheets</c> in their order, each size only as
/// many times as its count allows. Parts are placed by their exact design outline (before kerf compensation)
/// at least <c>cutter.spacing</c> apart and from every sheet edge; the cutter's centre lines then lie
/// <c>cutter.spacing - kerf</c> apart and the kerf stays inside the sheet (the spacing is at least the kerf,
/// a loader rule). Holes travel with their part; nothing is placed inside another part's hole (the hull is a
/// conservative stand-in for the outline). Sheets are numbered from 1 across the stocks, in stock order.
/// </summary>
public sealed class CutSheetNest
{
    private CutSheetNest(IReadOnlyList<CutStock> stocks, CutterSpec cutter)
    {
        Stocks = stocks;
        Cutter = cutter;
    }

    /// <summary>The stocks in the order their first part appears in the part set.</summary>
    public IReadOnlyList<CutStock> Stocks { get; }

    public CutterSpec Cutter { get; }

    /// <summary>Sheets used, over every stock.</summary>
    public int SheetCount => Stocks.Sum(s => s.Layout.Bins.Count);

    /// <summary>Every sheet in file order: (stock, bin within its stock, sheet number from 1).</summary>
    public IEnumerable<(CutStock Stock, LayoutBin Bin, int Number)> Sheets()
    {
        int n = 0;
        foreach (var s in Stocks)
            foreach (var b in s.Layout.Bins)
                yield return (s, b, ++n);
    }

    /// <summary>Nests the cut parts given (every copy); printed parts are ignored.</summary>
    public static CutSheetNest Of(IEnumerable<PartModel> parts, CutterSpec cutter, Precision precision)
    {
        ArgumentNullException.ThrowIfNull(parts);
        ArgumentNullException.ThrowIfNull(cutter);
        var stockSizes = cutter.Sheets.Select(s => new SheetStock(s.WidthMm, s.HeightMm, s.Count)).ToArray();
        var options = new NestOptions { SpacingMm = cutter.SpacingMm };
        var groups = parts.Where(p => p.Process == PartProcess.Cut && p.CutProfile is not null)
            .GroupBy(p => (p.Material.Name, p.HeightMm))
            .Select(g =>
            {
                var list = g.ToArray();
                var items = list.Select(p => new LayoutItem(p.Name, p.CutProfile!, p.Quantity)).ToArray();
                return new CutStock(g.Key.Name, g.Key.HeightMm, list, SheetNester.Nest(items, stockSizes, options, precision));
            })
            .ToArray();
        return new CutSheetNest(groups, cutter);
    }
}

/// <summary>One material and thickness of sheet, its parts and their nest.</summary>
/// <param name="Material">Material name as in the design file.</param>
/// <param name="ThicknessMm">Sheet thickness (the parts' height).</param>
/// <param name="Parts">Its cut parts, in part order.</param>
/// <param name="Layout">The nest: sheets (bins), placements, copies not placed.</param>
public sealed record CutStock(string Material, double ThicknessMm, IReadOnlyList<PartModel> Parts, LayoutResult Layout)
{
    /// <summary>The part a placement refers to.</summary>
    public PartModel Part(string name) => Parts.First(p => p.Name == name);

    /// <summary>Everything cut from one sheet, placed: the through cuts (outers and holes) and the marks.</summary>
    public (Profile Cuts, IReadOnlyList<Contour> Marks) Placed(int bin)
    {
        var outers = new List<Contour>();
        var holes = new List<Contour>();
        var marks = new List<Contour>();
        foreach (var pl in Layout.Placements.Where(p => p.BinIndex == bin))
        {
            var part = Part(pl.PartId);
            var placed = pl.Place(part.CutProfile!);
            outers.AddRange(placed.Outers);
            holes.AddRange(placed.Holes);
            marks.AddRange(part.Marks.Select(pl.Place));
        }
        return (new Profile(outers, holes), marks);
    }
}
