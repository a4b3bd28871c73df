using System.Globalization;
using System.Text;

namespace PartForge.Export.Bom;

/// <summary>
/// The BOM as CSV per RFC 4180: a header row, CRLF line ends, fields quoted when they hold a comma, quote,
/// CR or LF (quotes doubled), invariant numbers with at most 3 decimals. UTF-8 without a byte-order mark.
/// </summary>
public static class BomCsv
{
    public static readonly string[] Header = ["category", "item", "specification", "quantity", "unit", "notes"];

    public static string Write(BillOfMaterials bom)
    {
        var sb = new StringBuilder();
        Row(sb, Header);
        foreach (var l in bom.Lines)
            Row(sb, [l.Category, l.Item, l.Specification, Number(l.Quantity), l.Unit, l.Notes]);
        return sb.ToString();
    }

    public static byte[] WriteUtf8(BillOfMaterials bom) => new UTF8Encoding(false).GetBytes(Write(bom));

    public static string Number(double v)
    {
        double r = Math.Round(v, 3);
        if (r == 0) r = 0;
        return r.ToString("0.###", CultureInfo.InvariantCulture);
    }

    /// <summary>Appends one RFC 4180 record (fields quoted when they hold a comma, quote or line break; CRLF).</summary>
    public static void Row(StringBuilder sb, IReadOnlyList<string> fields)
    {
        for (int i = 0; i < fields.Count; i++)
        {
            if (i > 0) sb.Append(',');
            string f = fields[i];
            if (f.IndexOfAny([',', '"', '\r', '\n']) >= 0) sb.Append('"').Append(f.Replace("\"", "\"\"")).Append('"');
            else sb.Append(f);
        }
        sb.Append("\r\n");
    }
}
