using PartForge.Geometry.Primitives;
using PartForge.Geometry.Profiles;

namespace PartForge.Export.Drawings;

/// <summary>A dimensioned top view of one part as inline SVG, to scale, millimetres.</summary>
public static class PartDrawing
{
    public static string Render(PartSketch sk, double displayWidthPx = 560)
    {
        var (minX, minY, maxX, maxY) = Bounds(sk.Outline);
        double extent = Math.Max(maxX - minX, maxY - minY);
        if (!(extent > 0)) extent = 1;
        double text = Math.Max(1.6, extent / 34);
        int longest = sk.Diameters.Select(x => x.Label.Length).Concat(sk.Notes.Select(x => x.Label.Length)).DefaultIfEmpty(8).Max();
        double pad = extent * 0.15 + text * (0.6 * longest + 5);
        var c = new SvgCanvas(minX - pad, minY - pad * 0.55, maxX - minX + 2 * pad, maxY - minY + pad * 1.1);
        double arrow = text * 1.1;

        c.BeginGroup(("class", "part-body"));
        c.Path(ContourPath.Of(c, sk.Outline), "part-fill", ("fill-rule", "evenodd"));
        c.EndGroup();
        if (sk.Blind.Count > 0)
        {
            c.BeginGroup(("class", "part-blind"));
            foreach (var k in sk.Blind) c.Path(ContourPath.Of(c, k), "blind");
            c.EndGroup();
        }
        if (sk.Marks.Count > 0)
        {
            c.BeginGroup(("class", "part-marks"));
            foreach (var k in sk.Marks) c.Path(ContourPath.Of(c, k), "mark");
            c.EndGroup();
        }

        c.BeginGroup(("class", "poles"));
        foreach (var p in sk.Poles)
        {
            c.BeginGroup(("class", p.North ? "pole pole-n" : "pole pole-s"), ("data-pole", p.North ? "N" : "S"),
                ("data-x", SvgCanvas.Num(p.Centre.X)), ("data-y", SvgCanvas.Num(p.Centre.Y)));
            c.Circle(p.Centre.X, p.Centre.Y, p.SizeMm / 2, p.North ? "pole-badge-n" : "pole-badge-s");
            c.Text(p.Centre.X, p.Centre.Y - p.SizeMm * 0.28, p.North ? "N" : "S", p.SizeMm * 0.78, p.North ? "pole-text-n" : "pole-text-s", "middle");
            c.EndGroup();
        }
        c.EndGroup();

        double outerR = Math.Max(maxX - minX, maxY - minY) / 2;
        foreach (var d in sk.Diameters)
        {
            double r = d.Diameter / 2;
            var u = Vec2.FromAngleDeg(d.AngleDeg);
            var a = d.Centre - u * r;
            var b = d.Centre + u * r;
            c.BeginGroup(("class", "dim dim-diameter"), ("data-dim", d.Id), ("data-value", SvgCanvas.Num(d.Diameter)));
            if (d.DrawCircle) c.Circle(d.Centre.X, d.Centre.Y, r, "chain");
            c.Line(a.X, a.Y, b.X, b.Y, "dim-line");
            c.Arrow(a.X, a.Y, -u.X, -u.Y, arrow, "dim-arrow");
            c.Arrow(b.X, b.Y, u.X, u.Y, arrow, "dim-arrow");
            // Leader from the arrow out past the part's rim, then a short shoulder carrying the label.
            double reach = Math.Max(r, outerR) + text * 3 + extent * 0.06;
            var elbow = d.Centre + u * reach;
            c.Line(b.X, b.Y, elbow.X, elbow.Y, "dim-line");
            bool rightSide = u.X >= 0;
            double sx = elbow.X + (rightSide ? text * 1.5 : -text * 1.5);
            c.Line(elbow.X, elbow.Y, sx, elbow.Y, "dim-line");
            c.Text(sx + (rightSide ? text * 0.4 : -text * 0.4), elbow.Y - text * 0.35, d.Label, text, "dim-text", rightSide ? "start" : "end");
            c.EndGroup();
        }

        foreach (var n in sk.Notes)
        {
            var u = Vec2.FromAngleDeg(n.AngleDeg);
            double tr = n.Target.Length;
            double reach = Math.Max(outerR, tr) + text * 3 + extent * 0.12;
            var elbow = u * reach;
            c.BeginGroup(("class", "dim dim-note"), ("data-dim", n.CountId), ("data-value", n.Count.ToString(System.Globalization.CultureInfo.InvariantCulture)));
            c.BeginGroup(("class", "dim-size"), ("data-dim", n.SizeId), ("data-value", SvgCanvas.Num(n.Size)));
            if (n.Size2Id != null) c.BeginGroup(("class", "dim-size2"), ("data-dim", n.Size2Id), ("data-value", SvgCanvas.Num(n.Size2)));
            c.Line(n.Target.X, n.Target.Y, elbow.X, elbow.Y, "dim-line");
            c.Circle(n.Target.X, n.Target.Y, text * 0.3, "dim-dot");
            bool rightSide = u.X >= 0;
            double sx = elbow.X + (rightSide ? text * 1.5 : -text * 1.5);
            c.Line(elbow.X, elbow.Y, sx, elbow.Y, "dim-line");
            c.Text(sx + (rightSide ? text * 0.4 : -text * 0.4), elbow.Y - text * 0.35, n.Label, text, "dim-text", rightSide ? "start" : "end");
            if (n.Size2Id != null) c.EndGroup();
            c.EndGroup();
            c.EndGroup();
        }

        foreach (var l in sk.Linear) DrawLinear(c, l, text, arrow);

        c.Text(minX - pad + text, minY - pad * 0.55 + text * 1.2, "top view, mm, 1 unit = 1 mm", text * 0.85, "caption");
        return c.ToSvg("drawing", sk.Title, displayWidthPx, ("data-part", sk.PartName));
    }

    internal static void DrawLinear(SvgCanvas c, LinearDimension l, double text, double arrow, bool withLabel = true)
    {
        var d = l.To - l.From;
        double len = d.Length;
        if (!(len > 0)) return;
        var u = d * (1 / len);
        var nrm = new Vec2(-u.Y, u.X);
        var a = l.From + nrm * l.OffsetMm;
        var b = l.To + nrm * l.OffsetMm;
        c.BeginGroup(("class", l.Style == "gap" ? "dim dim-gap" : "dim dim-linear"), ("data-dim", l.Id), ("data-value", SvgCanvas.Num(l.Value)));
        double ext = Math.Sign(l.OffsetMm) * text * 0.4;
        c.Line(l.From.X, l.From.Y, a.X + nrm.X * ext, a.Y + nrm.Y * ext, "ext-line");
        c.Line(l.To.X, l.To.Y, b.X + nrm.X * ext, b.Y + nrm.Y * ext, "ext-line");
        if (len > 2.6 * arrow)
        {
            c.Line(a.X, a.Y, b.X, b.Y, l.Style == "gap" ? "gap-line" : "dim-line");
            c.Arrow(a.X, a.Y, -u.X, -u.Y, arrow, l.Style == "gap" ? "gap-arrow" : "dim-arrow");
            c.Arrow(b.X, b.Y, u.X, u.Y, arrow, l.Style == "gap" ? "gap-arrow" : "dim-arrow");
        }
        else
        {
            // Too short for arrows inside: arrows outside pointing in.
            c.Line(a.X - u.X * arrow * 2.2, a.Y - u.Y * arrow * 2.2, b.X + u.X * arrow * 2.2, b.Y + u.Y * arrow * 2.2, l.Style == "gap" ? "gap-line" : "dim-line");
            c.Arrow(a.X, a.Y, u.X, u.Y, arrow, l.Style == "gap" ? "gap-arrow" : "dim-arrow");
            c.Arrow(b.X, b.Y, -u.X, -u.Y, arrow, l.Style == "gap" ? "gap-arrow" : "dim-arrow");
        }
        if (!withLabel)
        {
            c.EndGroup();
            return;
        }
        var mid = (a + b) * 0.5 + nrm * (Math.Sign(l.OffsetMm == 0 ? 1 : l.OffsetMm) * text * 0.5);
        double ang = Math.Atan2(u.Y, u.X) * 180 / Math.PI;
        if (ang > 90.001 || ang < -89.999) ang += 180;
        if (ang > 180) ang -= 360;
        bool vertical = Math.Abs(Math.Abs(ang) - 90) < 1e-6;
        if (vertical)
        {
            // Vertical dimensions: horizontal text beside the line, readable without turning the head.
            bool leftSide = l.OffsetMm > 0 ? nrm.X < 0 : nrm.X > 0;
            c.Text(mid.X + (leftSide ? -text * 0.4 : text * 0.4), (a.Y + b.Y) / 2 - text * 0.35, l.Label, text, l.Style == "gap" ? "gap-text" : "dim-text", leftSide ? "end" : "start");
        }
        else c.Text(mid.X, mid.Y, l.Label, text, l.Style == "gap" ? "gap-text" : "dim-text", "middle", ang);
        c.EndGroup();
    }

    private static (double, double, double, double) Bounds(Profile p)
    {
        double minX = double.MaxValue, minY = double.MaxValue, maxX = double.MinValue, maxY = double.MinValue;
        void Add(Vec2 v) { minX = Math.Min(minX, v.X); maxX = Math.Max(maxX, v.X); minY = Math.Min(minY, v.Y); maxY = Math.Max(maxY, v.Y); }
        foreach (var k in p.Outers)
        {
            if (k.Circle is { } ci) { Add(ci.Center - new Vec2(ci.Radius, ci.Radius)); Add(ci.Center + new Vec2(ci.Radius, ci.Radius)); continue; }
            foreach (var s in k.Segments)
            {
                Add(s.Start);
                if (s is ArcSegment a)
                    for (int i = 1; i <= 16; i++) Add(a.Center + Vec2.FromAngleDeg(a.StartDeg + a.SweepDeg * i / 16) * a.Radius);
            }
        }
        if (minX > maxX) return (-1, -1, 1, 1);
        return (minX, minY, maxX, maxY);
    }
}
