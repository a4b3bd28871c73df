namespace PartForge.Export.Drawings;

/// <summary>An x-y line plot as inline SVG: framed axes with ticks, tick labels, axis titles with units, a legend.</summary>
public static class LinePlot
{
    public static string Render(string id, string title, string xTitle, string yTitle, IReadOnlyList<PlotSeries> series,
        double? xMin = null, double? xMax = null, double? xStep = null)
    {
        const double W = 640, H = 300, left = 64, right = 150, top = 28, bottom = 48;
        double pw = W - left - right, ph = H - top - bottom;
        var all = series.Where(s => s.X.Count > 0).ToList();
        double x0 = xMin ?? (all.Count > 0 ? all.Min(s => s.X.Min()) : 0);
        double x1 = xMax ?? (all.Count > 0 ? all.Max(s => s.X.Max()) : 1);
        double yLo = all.Count > 0 ? all.Min(s => s.Y.Where(double.IsFinite).DefaultIfEmpty(0).Min()) : -1;
        double yHi = all.Count > 0 ? all.Max(s => s.Y.Where(double.IsFinite).DefaultIfEmpty(0).Max()) : 1;
        var (ya, yb, ys) = NiceTicks.For(yLo, yHi, 6);
        double xs = xStep ?? NiceTicks.For(x0, x1, 8).Step;
        if (!(x1 > x0)) x1 = x0 + 1;

        // Plot coordinates: the canvas is y-up, so plot y grows upwards from the bottom margin.
        var c = new SvgCanvas(0, 0, W, H);
        double PX(double x) => left + (x - x0) / (x1 - x0) * pw;
        double PY(double y) => bottom + (y - ya) / (yb - ya) * ph;

        c.BeginGroup(("class", "plot-axes"));
        c.Rect(left, bottom, pw, ph, "plot-frame");
        for (double t = ya; t <= yb + ys * 1e-6; t += ys)
        {
            double y = PY(t);
            c.Line(left, y, left + pw, y, Math.Abs(t) < ys * 1e-6 ? "plot-zero" : "plot-grid");
            c.Line(left - 5, y, left, y, "plot-tick");
            c.Text(left - 8, y - 3.5, SvgCanvas.Num(Math.Round(t / ys) * ys), 11, "plot-label", "end");
        }
        for (double t = x0; t <= x1 + xs * 1e-6; t += xs)
        {
            double x = PX(t);
            c.Line(x, bottom, x, bottom + ph, "plot-grid");
            c.Line(x, bottom - 5, x, bottom, "plot-tick");
            c.Text(x, bottom - 18, SvgCanvas.Num(t), 11, "plot-label", "middle");
        }
        c.Text(left + pw / 2, 8, xTitle, 12, "plot-title", "middle");
        c.Text(16, bottom + ph / 2, yTitle, 12, "plot-title", "middle", 90);
        c.Text(left, H - 16, title, 13, "plot-heading");
        c.EndGroup();

        int k = 0;
        foreach (var s in all)
        {
            var sb = new System.Text.StringBuilder();
            for (int i = 0; i < s.X.Count && i < s.Y.Count; i++)
            {
                if (!double.IsFinite(s.Y[i])) continue;
                sb.Append(sb.Length == 0 ? "M" : " L").Append(c.P(PX(s.X[i]), PY(s.Y[i])));
            }
            c.Path(sb.ToString(), "plot-line", ("stroke", s.Colour), ("data-series", s.Label));
            double ly = bottom + ph - 10 - k * 20;
            c.Line(left + pw + 14, ly, left + pw + 40, ly, "plot-key").Path($"M{c.P(left + pw + 14, ly)} L{c.P(left + pw + 40, ly)}", "plot-line", ("stroke", s.Colour));
            c.Text(left + pw + 46, ly - 4, s.Label, 11, "plot-label");
            k++;
        }
        return c.ToSvg("plot", title, W, ("id", id));
    }
}
