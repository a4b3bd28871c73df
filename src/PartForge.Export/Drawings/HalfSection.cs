using PartForge.Geometry.Primitives;

namespace PartForge.Export.Drawings;

/// <summary>
/// An axial half-section of an assembly as inline SVG, to scale: radius across (the shaft axis on the left),
/// axial position upwards, every cut body as a filled rectangle. Dimension lines sit beside the section;
/// their labels are stacked in a column on the right with leaders, so thin slabs never make labels collide.
/// </summary>
public static class HalfSection
{
    public static string Render(string title, IReadOnlyList<SectionBody> bodies, IReadOnlyList<LinearDimension> dims, double displayWidthPx = 1000)
    {
        double rMax = bodies.Count > 0 ? bodies.Max(b => b.RMax) : 1;
        double zMin = bodies.Count > 0 ? bodies.Min(b => b.ZMin) : 0;
        double zMax = bodies.Count > 0 ? bodies.Max(b => b.ZMax) : 1;
        double zSpan = Math.Max(zMax - zMin, 1);
        double text = Math.Max(0.8, Math.Min(zSpan / 14, rMax / 25));
        double arrow = text * 0.8;

        // Where each dimension line ends up, and where its label wants to go.
        var lines = dims.Select(d =>
        {
            var u = d.To - d.From;
            double len = u.Length;
            var n = len > 0 ? new Vec2(-u.Y / len, u.X / len) : new Vec2(0, 0);
            var a = d.From + n * d.OffsetMm;
            var b = d.To + n * d.OffsetMm;
            return (Dim: d, Anchor: (a + b) * 0.5, XMax: Math.Max(a.X, b.X));
        }).ToList();
        double labelX = Math.Max(rMax, lines.Count > 0 ? lines.Max(l => l.XMax) : rMax) + text * 3;
        double gapStep = text * 1.3;
        var placed = new List<(LinearDimension Dim, Vec2 Anchor, double Y)>();
        double next = double.PositiveInfinity;
        foreach (var l in lines.OrderByDescending(l => l.Anchor.Y).ThenBy(l => l.Dim.Id, StringComparer.Ordinal))
        {
            double y = Math.Min(l.Anchor.Y, next);
            placed.Add((l.Dim, l.Anchor, y));
            next = y - gapStep;
        }
        double lowest = placed.Count > 0 ? placed.Min(p => p.Y) : zMin;
        int longest = dims.Select(d => d.Label.Length).DefaultIfEmpty(10).Max();
        double left = -text * 4, right = labelX + text * (0.6 * longest + 2);
        double bottom = Math.Min(zMin, lowest) - text * 5, top = Math.Max(zMax, placed.Count > 0 ? placed.Max(p => p.Y) : zMax) + text * 4;
        var c = new SvgCanvas(left, bottom, right - left, top - bottom);

        c.Line(0, zMin - text * 3, 0, zMax + text * 2.5, "axis-line");
        c.Text(0, zMax + text * 2.8, "shaft axis", text * 0.85, "caption", "middle");

        c.BeginGroup(("class", "section-bodies"));
        foreach (var b in bodies.OrderBy(b => Order(b.Kind)))
        {
            if (!(b.RMax > b.RMin) || !(b.ZMax > b.ZMin)) continue;
            c.Rect(b.RMin, b.ZMin, b.RMax - b.RMin, b.ZMax - b.ZMin, "cut cut-" + Word(b.Kind),
                ("data-kind", Word(b.Kind)), ("data-owner", b.Owner),
                ("data-rmin", SvgCanvas.Num(b.RMin)), ("data-rmax", SvgCanvas.Num(b.RMax)),
                ("data-zmin", SvgCanvas.Num(b.ZMin)), ("data-zmax", SvgCanvas.Num(b.ZMax)));
        }
        c.EndGroup();

        foreach (var (d, anchor, y) in placed)
        {
            PartDrawing.DrawLinear(c, d, text, arrow, withLabel: false);
            bool gap = d.Style == "gap";
            c.BeginGroup(("class", gap ? "dim-label gap-label" : "dim-label"), ("data-for", d.Id));
            c.Line(anchor.X, anchor.Y, labelX - text * 0.6, y + text * 0.35, gap ? "gap-leader" : "leader");
            c.Text(labelX, y, d.Label, text, gap ? "gap-text" : "dim-text");
            c.EndGroup();
        }

        // Legend of fills, below the section.
        double lx = 0, ly = Math.Min(zMin, lowest) - text * 4.2;
        foreach (var kind in bodies.Select(b => b.Kind).Distinct().OrderBy(Order))
        {
            string word = Word(kind);
            c.Rect(lx, ly, text * 1.6, text * 1.1, "cut cut-" + word);
            c.Text(lx + text * 2, ly + text * 0.15, word, text * 0.9, "caption");
            lx += text * (3 + word.Length * 0.62);
        }
        c.Text(right - text, top - text * 1.4, "radius to the right, axial position up, mm, to scale", text * 0.85, "caption", "end");
        return c.ToSvg("section", title, displayWidthPx, ("data-section", "half"));
    }

    /// <summary>Drawing order (back to front) and the legend's word (also the CSS fill class) of each kind of body.</summary>
    private static readonly (PartForge.Design.Stack.SlabKind Kind, string Word)[] Kinds =
    [
        (PartForge.Design.Stack.SlabKind.Stator, "stator"),
        (PartForge.Design.Stack.SlabKind.Former, "former"),
        (PartForge.Design.Stack.SlabKind.Copper, "copper"),
        (PartForge.Design.Stack.SlabKind.Rotor, "rotor"),
        (PartForge.Design.Stack.SlabKind.BackIron, "back-iron"),
        (PartForge.Design.Stack.SlabKind.Magnet, "magnet"),
    ];

    private static int Order(PartForge.Design.Stack.SlabKind kind) => Array.FindIndex(Kinds, k => k.Kind == kind);

    private static string Word(PartForge.Design.Stack.SlabKind kind) => Kinds[Order(kind)].Word;
}
