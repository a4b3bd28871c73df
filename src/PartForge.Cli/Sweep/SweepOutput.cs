using System.Globalization;
using System.Text;
using System.Text.Json;

namespace PartForge.Cli.Sweep;

/// <summary>The sweep's results as a plain text table, as RFC 4180 CSV and as a JSON document.</summary>
public static class SweepOutput
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static string Cell(SweepRow r, string key, string format) =>
        r.Outcome.Metrics.TryGetValue(key, out double v) && double.IsFinite(v) ? v.ToString(format, Inv) : "-";

    public static string Value(SweepAxis a, double v) => a.WholeNumbers ? v.ToString("0", Inv) : v.ToString("0.####", Inv);

    /// <summary>Headings and cells of the key-results table (no colour), shared by the plain and the terminal table.</summary>
    public static (string[] Headings, List<string[]> Cells) TableCells(SweepPlan plan, IReadOnlyList<SweepRow> rows, SweepTarget? target) =>
        (Headings(plan, target), rows.Select(r => CellsOf(plan, r, target)).ToList());

    private static bool TargetColumn(SweepTarget? target) => target != null && SweepMetrics.TableColumns.All(c => c.Key != target.Key);

    private static string[] Headings(SweepPlan plan, SweepTarget? target)
    {
        var head = new List<string> { "#" };
        head.AddRange(plan.Axes.Select(a => a.Key));
        head.AddRange(SweepMetrics.TableColumns.Select(c => c.Heading));
        if (TargetColumn(target)) head.Add(target!.Key);
        head.Add("status");
        head.Add("reason");
        return head.ToArray();
    }

    private static string[] CellsOf(SweepPlan plan, SweepRow r, SweepTarget? target)
    {
        var c = new List<string> { (r.Index + 1).ToString(Inv) };
        c.AddRange(plan.Axes.Select((a, k) => Value(a, r.Values[k])));
        c.AddRange(SweepMetrics.TableColumns.Select(col => Cell(r, col.Key, col.Format)));
        if (TargetColumn(target)) c.Add(Cell(r, target!.Key, "0.####"));
        c.Add(r.Outcome.Status);
        c.Add(r.Outcome.Reason);
        return c.ToArray();
    }

    public static string PlainTable(SweepPlan plan, IReadOnlyList<SweepRow> rows, SweepTarget? target)
    {
        var w = new StringWriter { NewLine = "\n" };
        PlainTable(w, plan, rows, target);
        return w.ToString();
    }

    /// <summary>
    /// The plain table written line by line: one pass for the column widths, one to write, so nothing the size of
    /// the table is held (a 100,000-row sweep prints without a copy of its text in memory).
    /// </summary>
    /// <summary>
    /// The plain table written while the sweep runs, for a sweep that keeps no rows: the column widths cannot wait
    /// for the last row, so each column is as wide as its heading, its axis values and <see cref="StreamedCellWidth"/>
    /// (a wider cell pushes its line out rather than being cut). Call <see cref="StreamedTable.Row"/> per row.
    /// </summary>
    public sealed class StreamedTable
    {
        private readonly TextWriter _out;
        private readonly SweepPlan _plan;
        private readonly int[] _width;
        private readonly StringBuilder _sb = new();

        public StreamedTable(TextWriter output, SweepPlan plan)
        {
            _out = output;
            _plan = plan;
            var head = Headings(plan, null);
            _width = head.Select(h => h.Length).ToArray();
            _width[0] = Math.Max(_width[0], plan.Count.ToString(Inv).Length);
            for (int k = 0; k < plan.Axes.Count; k++)
            {
                var a = plan.Axes[k];
                for (int i = 0; i < a.Count; i++) _width[1 + k] = Math.Max(_width[1 + k], Value(a, a.Value(i)).Length);
            }
            for (int i = 1 + plan.Axes.Count; i < head.Length - 2; i++) _width[i] = Math.Max(_width[i], StreamedCellWidth);
            _width[head.Length - 2] = Math.Max(_width[head.Length - 2], "invalid".Length);
            Line(head);
        }

        public void Row(SweepRow r) => Line(CellsOf(_plan, r, null));

        private void Line(string[] c) => _out.Write(FormatLine(_sb, c, _width));
    }

    /// <summary>Width of a result column of the streamed table: room for 9999.999.</summary>
    public const int StreamedCellWidth = 8;

    private static string FormatLine(StringBuilder sb, string[] c, int[] width)
    {
        sb.Clear();
        for (int i = 0; i < c.Length; i++)
        {
            if (i > 0) sb.Append("  ");
            sb.Append(i == c.Length - 1 ? c[i] : c[i].PadLeft(width[i]));
        }
        // No trailing blanks (an empty reason).
        int end = sb.Length;
        while (end > 0 && sb[end - 1] == ' ') end--;
        sb.Length = end;
        sb.Append('\n');
        return sb.ToString();
    }

    public static void PlainTable(TextWriter output, SweepPlan plan, IReadOnlyList<SweepRow> rows, SweepTarget? target)
    {
        var head = Headings(plan, target);
        var width = head.Select(h => h.Length).ToArray();
        foreach (var r in rows)
        {
            var c = CellsOf(plan, r, target);
            for (int i = 0; i < c.Length - 1; i++) width[i] = Math.Max(width[i], c[i].Length);
        }
        var sb = new StringBuilder();
        void Line(string[] c) => output.Write(FormatLine(sb, c, width));
        Line(head);
        foreach (var r in rows) Line(CellsOf(plan, r, target));
    }

    public static string Csv(SweepPlan plan, IReadOnlyList<SweepRow> rows)
    {
        var sb = new StringBuilder(CsvHeader(plan));
        foreach (var r in rows) sb.Append(CsvLine(plan, r));
        return sb.ToString();
    }

    /// <summary>The CSV's heading line (with its line end).</summary>
    public static string CsvHeader(SweepPlan plan)
    {
        var sb = new StringBuilder();
        var head = new List<string> { "variant" };
        head.AddRange(plan.Axes.Select(a => a.Key));
        head.AddRange(SweepMetrics.All);
        head.Add("status");
        head.Add("reason");
        CsvRow(sb, head);
        return sb.ToString();
    }

    /// <summary>One variant's CSV line (with its line end): written as the sweep runs.</summary>
    public static string CsvLine(SweepPlan plan, SweepRow r)
    {
        var sb = new StringBuilder();
        var c = new List<string> { (r.Index + 1).ToString(Inv) };
        c.AddRange(plan.Axes.Select((a, k) => r.Values[k].ToString("R", Inv)));
        // 12 significant digits, as the results document: far below any tolerance, free of binary noise (1.7999999999999998).
        c.AddRange(SweepMetrics.All.Select(k => r.Outcome.Metrics.TryGetValue(k, out double v) && double.IsFinite(v)
            ? double.Parse(v.ToString("G12", Inv), Inv).ToString("R", Inv) : ""));
        c.Add(r.Outcome.Status);
        c.Add(r.Outcome.Reason);
        CsvRow(sb, c);
        return sb.ToString();
    }

    private static void CsvRow(StringBuilder sb, IReadOnlyList<string> fields) => PartForge.Export.Bom.BomCsv.Row(sb, fields);

    public static string Json(string designName, SweepPlan plan, IReadOnlyList<SweepRow> rows, SweepTarget? target)
    {
        var sw = new StringWriter { NewLine = "\n" };
        Json(sw, designName, plan, rows, target);
        return sw.ToString();
    }

    /// <summary>The JSON document written to <paramref name="output"/> as it is made (flushed every few hundred rows).</summary>
    public static void Json(TextWriter output, string designName, SweepPlan plan, IReadOnlyList<SweepRow> rows, SweepTarget? target)
    {
        using var ms = new MemoryStream();
        void Drain()
        {
            if (ms.Length == 0) return;
            output.Write(Encoding.UTF8.GetString(ms.GetBuffer(), 0, (int)ms.Length));
            ms.SetLength(0);
        }
        using (var w = new Utf8JsonWriter(ms, new JsonWriterOptions { Indented = true }))
        {
            w.WriteStartObject();
            w.WriteString("format", "partforge-sweep/1");
            w.WriteString("design", designName);
            w.WriteStartArray("vary");
            foreach (var a in plan.Axes)
            {
                w.WriteStartObject();
                w.WriteString("key", a.Key);
                w.WriteNumber("from", a.From);
                w.WriteNumber("to", a.To);
                w.WriteNumber("step", a.Step);
                w.WriteNumber("count", a.Count);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            if (target != null)
            {
                w.WriteStartObject("target");
                w.WriteString("key", target.Key);
                w.WriteNumber("value", target.Value);
                w.WriteEndObject();
            }
            w.WriteStartObject("summary");
            w.WriteNumber("variants", rows.Count);
            foreach (var s in new[] { "pass", "warn", "fail", "invalid" }) w.WriteNumber(s, rows.Count(r => r.Outcome.Status == s));
            w.WriteEndObject();
            w.WriteStartArray("variants");
            foreach (var r in rows)
            {
                w.WriteStartObject();
                w.WriteNumber("variant", r.Index + 1);
                w.WriteStartObject("values");
                for (int k = 0; k < plan.Axes.Count; k++) w.WriteNumber(plan.Axes[k].Key, r.Values[k]);
                w.WriteEndObject();
                w.WriteString("status", r.Outcome.Status);
                if (r.Outcome.Reason.Length > 0) w.WriteString("reason", r.Outcome.Reason);
                w.WriteStartObject("results");
                foreach (var k in SweepMetrics.All)
                    if (r.Outcome.Metrics.TryGetValue(k, out double v) && double.IsFinite(v)) w.WriteNumber(k, double.Parse(v.ToString("G12", Inv), Inv));
                w.WriteEndObject();
                w.WriteEndObject();
                if (ms.Length > 1 << 16) { w.Flush(); Drain(); }
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        Drain();
        output.Write("\n");
    }
}
