namespace PartForge.Export.Drawings;

/// <summary>
/// An axial half-section of an assembly as inline SVG, to scale: radius across (the shaft axis on the left),
/// axial position upwards, every cut body as a filled rectangle, the stack-up and gap dimensions beside it.
/// </summary>
public static class HalfSection
{
    public static string Render(string title, IReadOnlyList<SectionBody> bodies, IReadOnlyList<LinearDimension> dims, double displayWidthPx = 640)
    {
        double rMax = bodies.Count > 0 ? bodies.Max(b => b.RMax) : 1;
        double zMin = bodies.Count > 0 ? bodies.Min(b => b.ZMin) : 0;
        double zMax = bodies.Count > 0 ? bodies.Max(b => b.ZMax) : 1;
        double span = Math.Max(rMax, zMax - zMin);
        double text = Math.Max(1.2, span / 42);
        double arrow = text * 0.9;
        double maxOffset = dims.Count > 0 ? dims.Max(d => Math.Abs(d.OffsetMm)) : 0;
        double left = -text * 4, right = rMax + maxOffset + text * 26;
        double bottom = zMin - text * 5, top = zMax + text * 4;
        var c = new SvgCanvas(left, bottom, right - left, top - bottom);

        c.Line(0, zMin - text * 3, 0, zMax + text * 2.5, "axis-line");
        c.Text(0, zMax + text * 2.8, "shaft axis", text * 0.85, "caption", "middle");

        c.BeginGroup(("class", "section-bodies"));
        foreach (var b in bodies.OrderBy(b => Order(b.Kind)))
            c.Rect(b.RMin, b.ZMin, b.RMax - b.RMin, b.ZMax - b.ZMin, "cut cut-" + b.Kind,
                ("data-kind", b.Kind), ("data-owner", b.Owner),
                ("data-rmin", SvgCanvas.Num(b.RMin)), ("data-rmax", SvgCanvas.Num(b.RMax)),
                ("data-zmin", SvgCanvas.Num(b.ZMin)), ("data-zmax", SvgCanvas.Num(b.ZMax)));
        c.EndGroup();

        foreach (var d in dims) PartDrawing.DrawLinear(c, d, text, arrow);

        // Legend of fills, below the section.
        double lx = 0, ly = zMin - text * 4.2;
        foreach (var kind in bodies.Select(b => b.Kind).Distinct().OrderBy(Order))
        {
            c.Rect(lx, ly, text * 1.6, text * 1.1, "cut cut-" + kind);
            c.Text(lx + text * 2, ly + text * 0.15, kind, text * 0.9, "caption");
            lx += text * (3 + kind.Length * 0.62);
        }
        c.Text(right - text, top - text * 1.4, "radius ->, axial position ^, mm, to scale", text * 0.85, "caption", "end");
        return c.ToSvg("section", title, displayWidthPx, ("data-section", "half"));
    }

    private static int Order(string kind) => kind switch
    {
        "stator" => 0, "former" => 1, "copper" => 2, "spacer" => 3, "rotor" => 4, "back-iron" => 5, "magnet" => 6, _ => 7,
    };
}
