using PartForge.Geometry;
using PartForge.Geometry.Layout;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Bench;

/// <summary>
/// Sheet nesting of many copies of two small parts (invented scenario: 400 tabs 20 x 12 mm and 200 discs of
/// 18 mm) on one 600 x 400 sheet, 2 mm spacing: how the method scales with the number of parts on a sheet
/// (each placement looks at every part already on it).
/// </summary>
public sealed class NestManyBenchCase : IBenchCase
{
    private static readonly Precision Prec = Precision.FromChordalTolerance(0.01);
    private readonly LayoutItem[] _parts =
    {
        new("tab", Profile.Of(Contour.Rectangle(new Vec2(0, 0), 20, 12, 0)), 400),
        new("disc", Profile.Of(Contour.FullCircle(new Vec2(0, 0), 9)), 200),
    };

    public string Name => "nest-600";
    public string Description => "sheet nesting: 600 copies of two small parts on one 600 x 400 sheet (scaling with parts per sheet)";

    public void Setup() { }

    public IReadOnlyDictionary<string, double> Run()
    {
        var res = SheetNester.Nest(_parts, new[] { new SheetStock(600, 400) }, new NestOptions { SpacingMm = 2 }, Prec);
        return new Dictionary<string, double> { ["sheets"] = res.Bins.Count, ["placed"] = res.Placements.Count, ["utilisation"] = res.Bins[0].Utilisation };
    }
}
