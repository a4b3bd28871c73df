using System.Globalization;
using System.Text;
using PartForge.Export.Drawings;

namespace PartForge.Export.Report;

/// <summary>
/// Renders the design report: one self-contained HTML file (inline CSS and SVG, PNG previews as data URIs,
/// the meshes inline for the 3D view, nothing fetched). Deterministic: the same input gives the same bytes (no dates, no random ids). Its one script is the project's own 3D view (<see cref="Viewer3d"/>).
/// </summary>
public static class HtmlReport
{
    public static string Render(ReportInput r)
    {
        var sb = new StringBuilder();
        string name = Esc(r.DesignName);
        sb.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
          .Append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
          .Append("<title>").Append(name).Append(" - PartForge design report</title>\n<style>\n")
          .Append(ReportStyle.Css).Append("</style>\n</head>\n<body data-status=\"").Append(Esc(r.Status)).Append("\">\n");

        sb.Append("<header class=\"masthead\"><h1>").Append(name).Append("</h1><p>PartForge design report: electrical results, checks, drawings, half-section and bill of materials. Millimetres throughout.</p></header>\n");
        if (r.Forced)
            sb.Append("<div class=\"banner-failed\" id=\"failed-banner\">FAILED: this build was forced past failing checks. The parts below do not pass the checks; do not build them as they are.</div>\n");
        sb.Append("<main>\n");

        // Summary and status
        sb.Append("<section id=\"summary\"><h2>Design summary</h2>\n<p class=\"status-line\">Checks: ").Append(Pill(r.Status))
          .Append(' ').Append(r.Checks.Count(c => c.Status == "fail")).Append(" failed, ")
          .Append(Plural(r.Checks.Count(c => c.Status == "warn"), "warning")).Append(", ")
          .Append(r.Checks.Count(c => c.Status == "pass")).Append(" passed.</p>\n");
        RowsTable(sb, "summary-table", r.Summary);
        sb.Append("</section>\n");

        // Cautions early: people read the top of a page.
        sb.Append("<section id=\"cautions\" class=\"cautions\"><h2>Cautions</h2><ul>\n");
        foreach (var (t, text) in Cautions.All) sb.Append("<li><b>").Append(Esc(t)).Append(".</b> ").Append(Esc(text)).Append("</li>\n");
        sb.Append("</ul></section>\n");

        // Electrical
        sb.Append("<section id=\"electrical\"><h2>Electrical results</h2>\n");
        RowsTable(sb, "electrical-table", r.Electrical);
        string speed = r.WaveformRpm.ToString("0.#", CultureInfo.InvariantCulture);
        sb.Append("<figure>").Append(LinePlot.Render("plot-coil", $"One coil at {speed} rpm", "rotor position, electrical degrees", "back-EMF, V", r.CoilWaveform, 0, 360, 60))
          .Append("<figcaption>Back-EMF of a single coil over one electrical period.</figcaption></figure>\n");
        sb.Append("<figure>").Append(LinePlot.Render("plot-phases", $"Each phase at {speed} rpm", "rotor position, electrical degrees", "back-EMF, V", r.PhaseWaveforms, 0, 360, 60))
          .Append("<figcaption>Back-EMF of each phase (its coils in series, with their winding directions) over one electrical period.</figcaption></figure>\n");
        foreach (var t in r.Tables) Table(sb, t);
        sb.Append("</section>\n");

        // Checks
        sb.Append("<section id=\"checks\"><h2>Checks</h2>\n<table id=\"check-table\"><thead><tr><th>status</th><th>check</th><th>part</th><th>value</th><th>limit</th><th>margin</th><th>unit</th><th>finding and fix</th></tr></thead><tbody>\n");
        foreach (var c in r.Checks)
        {
            sb.Append("<tr data-check=\"").Append(Esc(c.Id)).Append("\" data-part=\"").Append(Esc(c.Part)).Append('"');
            if (c.Counterpart.Length > 0) sb.Append(" data-counterpart=\"").Append(Esc(c.Counterpart)).Append('"');
            sb.Append(" data-status=\"").Append(Esc(c.Status))
              .Append("\" data-value=\"").Append(SvgCanvas.Num(c.Value)).Append("\"><td>").Append(Pill(c.Status)).Append("</td><td>").Append(Esc(c.Id))
              .Append("</td><td>").Append(Esc(c.Part)).Append("</td><td class=\"num\">").Append(Fmt(c.Value)).Append("</td><td class=\"num\">").Append(Fmt(c.Limit))
              .Append("</td><td class=\"num\">").Append(Fmt(c.Margin)).Append("</td><td>").Append(Esc(c.Unit)).Append("</td><td>").Append(Esc(c.Message));
            if (c.Basis.Length > 0) sb.Append("<br><span class=\"note\">Basis: ").Append(Esc(c.Basis)).Append("</span>");
            sb.Append("</td></tr>\n");
        }
        sb.Append("</tbody></table></section>\n");

        // Drawings
        sb.Append("<section id=\"drawings\"><h2>Part drawings</h2>\n<p class=\"note\">Top views to scale, dimensions in millimetres. Chain lines are pitch and bolt circles. Badges show which pole of each magnet faces the stator: filled N, open S.</p>\n");
        foreach (var d in r.Drawings)
            sb.Append("<figure id=\"drawing-").Append(Esc(d.PartName)).Append("\"><h3>").Append(Esc(d.Title)).Append("</h3>").Append(PartDrawing.Render(d)).Append("</figure>\n");
        sb.Append("</section>\n");

        // Half-section
        sb.Append("<section id=\"half-section\"><h2>Axial half-section</h2>\n<p class=\"note\">Through a magnet and a coil, to scale, nominal positions. The red dimensions are the running gaps: the drawn distance is the nominal gap; the value written is the worst case the checker found after tolerances, runout, play and deflection.</p>\n<figure>")
          .Append(HalfSection.Render("Axial half-section", r.SectionBodies, r.SectionDimensions)).Append("</figure></section>\n");

        if (r.SceneJson.Length > 0) Viewer3d.Append(sb, r.SceneJson);

        // Previews
        if (r.Previews.Count > 0)
        {
            sb.Append("<section id=\"previews\"><h2>Previews</h2><div class=\"grid2\">\n");
            foreach (var (n, png) in r.Previews)
                sb.Append("<figure><img class=\"preview\" alt=\"").Append(Esc(n)).Append("\" src=\"data:image/png;base64,").Append(Convert.ToBase64String(png))
                  .Append("\"><figcaption>").Append(Esc(n)).Append("</figcaption></figure>\n");
            sb.Append("</div></section>\n");
        }

        // BOM
        sb.Append("<section id=\"bom\"><h2>Bill of materials</h2>\n<table id=\"bom-table\"><thead><tr><th>category</th><th>item</th><th>specification</th><th>quantity</th><th>unit</th><th>notes</th></tr></thead><tbody>\n");
        foreach (var l in r.Bom.Lines)
            sb.Append("<tr><td>").Append(Esc(l.Category)).Append("</td><td>").Append(Esc(l.Item)).Append("</td><td>").Append(Esc(l.Specification))
              .Append("</td><td class=\"num\">").Append(Bom.BomCsv.Number(l.Quantity)).Append("</td><td>").Append(Esc(l.Unit)).Append("</td><td>").Append(Esc(l.Notes)).Append("</td></tr>\n");
        sb.Append("</tbody></table></section>\n");

        if (r.Fabrication.Count > 0)
        {
            sb.Append("<section id=\"fabrication\"><h2>Making the parts</h2>\n");
            foreach (var t in r.Fabrication) Table(sb, t);
            sb.Append("</section>\n");
        }

        if (r.Assembly.Count > 0)
        {
            sb.Append("<section id=\"assembly\"><h2>Assembly steps</h2>\n<table id=\"assembly-table\"><thead><tr><th>step</th><th>action</th><th>pull (N)</th><th>caution</th></tr></thead><tbody>\n");
            foreach (var s in r.Assembly)
                sb.Append("<tr><td class=\"num\">").Append(s.Order.ToString(System.Globalization.CultureInfo.InvariantCulture)).Append("</td><td>").Append(Esc(s.Action))
                  .Append("</td><td class=\"num\">").Append(Bom.BomCsv.Number(Math.Round(s.PullN, 1))).Append(s.PullNote.Length > 0 ? " (" + Esc(s.PullNote) + ")" : "")
                  .Append("</td><td>").Append(Esc(s.Caution ?? "")).Append("</td></tr>\n");
            sb.Append("</tbody></table></section>\n");
        }

        if (r.Notes.Count > 0)
        {
            sb.Append("<section id=\"notes\"><h2>Notes and approximations</h2><ul>\n");
            foreach (var n in r.Notes) sb.Append("<li>").Append(Esc(n)).Append("</li>\n");
            sb.Append("</ul></section>\n");
        }
        sb.Append("</main>\n<footer>Generated by PartForge from the design file ").Append(name).Append(". Check every dimension against your own magnets, wire and calipers before cutting or printing.</footer>\n</body>\n</html>\n");
        return sb.ToString();
    }

    private static void RowsTable(StringBuilder sb, string id, IReadOnlyList<ReportRow> rows)
    {
        sb.Append("<table id=\"").Append(id).Append("\"><tbody>\n");
        foreach (var row in rows)
        {
            sb.Append("<tr");
            if (row.Key.Length > 0) sb.Append(" data-key=\"").Append(Esc(row.Key)).Append('"');
            sb.Append("><th>").Append(Esc(row.Label)).Append("</th><td class=\"num\">").Append(Esc(row.Value)).Append("</td><td>").Append(Esc(row.Unit)).Append("</td></tr>\n");
        }
        sb.Append("</tbody></table>\n");
    }

    private static void Table(StringBuilder sb, ReportTable t)
    {
        sb.Append("<h3>").Append(Esc(t.Title)).Append("</h3>\n<table><thead><tr>");
        foreach (var h in t.Headers) sb.Append("<th>").Append(Esc(h)).Append("</th>");
        sb.Append("</tr></thead><tbody>\n");
        foreach (var row in t.Rows)
        {
            sb.Append("<tr>");
            foreach (var cell in row) sb.Append("<td>").Append(Esc(cell)).Append("</td>");
            sb.Append("</tr>\n");
        }
        sb.Append("</tbody></table>\n");
    }

    private static string Plural(int n, string word) => n.ToString(System.Globalization.CultureInfo.InvariantCulture) + " " + word + (n == 1 ? "" : "s");

    private static string Pill(string status) => $"<span class=\"pill {Esc(status)}\">{Esc(status)}</span>";

    private static string Fmt(double v) => double.IsFinite(v) ? v.ToString(Math.Abs(v) >= 100 ? "0.#" : "0.###", CultureInfo.InvariantCulture) : "-";

    private static string Esc(string s) => SvgCanvas.Escape(s);
}
