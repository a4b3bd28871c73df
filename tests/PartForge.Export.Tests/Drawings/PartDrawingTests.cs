using System.Globalization;
using System.Xml.Linq;
using PartForge.Export.Drawings;
using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Export.Tests.Drawings;

public class PartDrawingTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    private static PartSketch Disc() => new()
    {
        PartName = "disc",
        Title = "test disc",
        Outline = Profile.Of(Contour.FullCircle(new Vec2(0, 0), 55), Contour.FullCircle(new Vec2(0, 0), 4)),
        Diameters =
        [
            new DiameterDimension("outer_diameter", new Vec2(0, 0), 110, 30, "D110"),
            new DiameterDimension("pitch_circle", new Vec2(0, 0), 80, 150, "PCD 80", DrawCircle: true),
        ],
        Notes = [new PatternNote("pocket_count", 12, "pocket_diameter", 12.15, new Vec2(40, 0), -20, "12 x D12.15")],
        Poles = [new PoleMark(new Vec2(40, 0), true, 6), new PoleMark(new Vec2(-40, 0), false, 6)],
    };

    [Fact]
    public void Is_well_formed_svg_with_the_dimension_values_as_attributes()
    {
        var doc = XDocument.Parse(PartDrawing.Render(Disc()));
        Assert.Equal(Svg + "svg", doc.Root!.Name);
        var dims = doc.Descendants().Where(e => e.Attribute("data-dim") != null)
            .ToDictionary(e => e.Attribute("data-dim")!.Value, e => double.Parse(e.Attribute("data-value")!.Value, CultureInfo.InvariantCulture));
        Assert.Equal(110, dims["outer_diameter"]);
        Assert.Equal(80, dims["pitch_circle"]);
        Assert.Equal(12, dims["pocket_count"]);
        Assert.Equal(12.15, dims["pocket_diameter"]);
        Assert.Equal(["N", "S"], doc.Descendants().Where(e => e.Attribute("data-pole") != null).Select(e => e.Attribute("data-pole")!.Value));
    }

    [Fact]
    public void Diameter_arrows_touch_the_circle_at_the_given_angle()
    {
        var doc = XDocument.Parse(PartDrawing.Render(Disc()));
        var g = doc.Descendants(Svg + "g").First(e => (string?)e.Attribute("data-dim") == "outer_diameter");
        var line = g.Elements(Svg + "line").First();
        double x1 = D(line, "x1"), y1 = -D(line, "y1"), x2 = D(line, "x2"), y2 = -D(line, "y2");
        // The dimension line spans the diameter: its length is the dimension value (to the 4 written decimals).
        Assert.Equal(110, Math.Sqrt((x2 - x1) * (x2 - x1) + (y2 - y1) * (y2 - y1)), 3);
        Assert.Equal(30, Math.Atan2(y2 - y1, x2 - x1) * 180 / Math.PI, 3);
    }

    [Fact]
    public void Full_circle_contours_become_two_true_arcs()
    {
        var c = new SvgCanvas(0, 0, 10, 10);
        string d = ContourPath.Of(c, Contour.FullCircle(new Vec2(1, 2), 3));
        Assert.Equal("M4,-2 A3,3 0 1 0 -2,-2 A3,3 0 1 0 4,-2 Z", d);
    }

    [Fact]
    public void Numbers_are_invariant_and_rounded()
    {
        Assert.Equal("0", SvgCanvas.Num(-0.00001));
        Assert.Equal("1234.5679", SvgCanvas.Num(1234.56789));
        Assert.Equal("-2.5", SvgCanvas.Num(-2.5));
    }

    private static double D(XElement e, string a) => double.Parse(e.Attribute(a)!.Value, CultureInfo.InvariantCulture);
}
