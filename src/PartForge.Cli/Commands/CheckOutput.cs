using System.Globalization;
using PartForge.Cli.Hosting;
using PartForge.Export.Results;
using Spectre.Console;

namespace PartForge.Cli.Commands;

/// <summary>The human summary of a results document: a table on a terminal, aligned plain text otherwise.</summary>
public static class CheckOutput
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static void Print(CliSession s, ResultsDocument doc)
    {
        if (s.Quiet) return;
        var e = doc.Electrical;
        var figures = new (string Name, string Value)[]
        {
            ("pole pairs", e.PolePairs.ToString(Inv)),
            ("electrical frequency", N(e.ElectricalHz) + " Hz"),
            ("magnetic gap", N(e.MagneticGap) + " mm"),
            ("winding factor", N(e.WindingFactor)),
            ("turns per coil", e.Coil.Turns.ToString(Inv)),
            ("coil resistance (20 C)", N(e.Coil.Resistance20cOhm) + " ohm"),
            ("phase EMF", N(e.Phase.EmfRmsV) + " V rms"),
            ("line EMF", N(e.LineEmfRmsV) + " V rms"),
            ("Ke", N(e.KeVPerKrpm) + " V per 1000 rpm"),
        };
        if (s.IsTerminal)
        {
            var c = s.Console();
            var ft = new Table().Border(TableBorder.Rounded).Title($"[bold]{Markup.Escape(doc.Design)}[/] electrical results").AddColumn("quantity").AddColumn(new TableColumn("value").RightAligned());
            foreach (var (n, v) in figures) ft.AddRow(Markup.Escape(n), Markup.Escape(v));
            c.Write(ft);
            // Values in the table; the messages (with the fixes) below it for what did not pass, so rows stay one line.
            var t = new Table().Border(TableBorder.Rounded).Title("checks")
                .AddColumn(new TableColumn("status").NoWrap()).AddColumn(new TableColumn("check").NoWrap()).AddColumn(new TableColumn("part").NoWrap())
                .AddColumn(new TableColumn("value").RightAligned().NoWrap()).AddColumn(new TableColumn("limit").RightAligned().NoWrap())
                .AddColumn(new TableColumn("margin").RightAligned().NoWrap());
            foreach (var k in doc.Checks)
                t.AddRow(Status(s, k.Status), Markup.Escape(k.Id), Markup.Escape(k.Part), Markup.Escape(k.Measured ? V(k.Value, k.Unit) : "-"), Markup.Escape(k.Measured ? N(k.Limit) : "-"), Markup.Escape(k.Measured ? N(k.Margin) : "-"));
            c.Write(t);
            foreach (var k in doc.Checks.Where(k => k.Status != "pass"))
                c.MarkupLine($"{Status(s, k.Status)} {Markup.Escape(k.Id)} ({Markup.Escape(k.Part)}): {Markup.Escape(k.Message)}");
        }
        else
        {
            int w = figures.Max(f => f.Name.Length);
            foreach (var (n, v) in figures) s.Out.WriteLine(n.PadRight(w) + "  " + v);
            s.Out.WriteLine();
            var rows = doc.Checks.Select(k => new[] { k.Status, k.Id, k.Part, k.Measured ? V(k.Value, k.Unit) : "-", k.Measured ? N(k.Limit) : "-", k.Measured ? N(k.Margin) : "-", k.Message }).ToList();
            rows.Insert(0, ["status", "check", "part", "value", "limit", "margin", "message"]);
            var widths = Enumerable.Range(0, 6).Select(i => rows.Max(r => r[i].Length)).ToArray();
            foreach (var r in rows)
                s.Out.WriteLine(string.Join("  ", r.Take(6).Select((x, i) => x.PadRight(widths[i]))) + "  " + r[6]);
        }
        s.Out.WriteLine(Summary(doc));
    }

    private static string Status(CliSession s, string status)
    {
        string colour = status switch { "pass" => "green", "warn" => "yellow", _ => "red" };
        return s.Colour ? $"[{colour}]{status}[/]" : status;
    }

    public static string Summary(ResultsDocument doc) =>
        $"{doc.Design}: {doc.Summary.Status} ({doc.Checks.Count} checks, {doc.Summary.Fail} failed, {doc.Summary.Warn} warning{(doc.Summary.Warn == 1 ? "" : "s")})";

    private static string N(double v) => Math.Abs(v) >= 100 ? v.ToString("0.#", Inv) : v.ToString("0.###", Inv);

    /// <summary>A value with its unit; ratios (unit "1") and unitless values stand alone.</summary>
    private static string V(double v, string unit) => unit is "" or "1" ? N(v) : N(v) + " " + unit;
}
