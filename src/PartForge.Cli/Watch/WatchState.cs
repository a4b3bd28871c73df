namespace PartForge.Cli.Watch;

/// <summary>What the live page is told after each save: the number of the last good build, whether the last save
/// built, and its problems (design errors with line and column) when it did not.</summary>
/// <param name="Build">Count of good builds so far (the page reloads when it grows).</param>
/// <param name="Ok">The last save built (checks may still fail: the report then says so).</param>
/// <param name="Problems">One line per problem of the last save; empty when it built.</param>
/// <param name="Ms">Wall time of the last build, milliseconds.</param>
public sealed record WatchState(int Build, bool Ok, IReadOnlyList<string> Problems, double Ms)
{
    /// <summary>The state as the JSON text of one server-sent event.</summary>
    public string Json()
    {
        var sb = new System.Text.StringBuilder();
        sb.Append("{\"build\":").Append(Build).Append(",\"ok\":").Append(Ok ? "true" : "false")
          .Append(",\"ms\":").Append(Ms.ToString("0.0", System.Globalization.CultureInfo.InvariantCulture)).Append(",\"problems\":[");
        for (int i = 0; i < Problems.Count; i++)
        {
            if (i > 0) sb.Append(',');
            sb.Append('"');
            foreach (char ch in Problems[i])
            {
                if (ch == '"' || ch == '\\') sb.Append('\\').Append(ch);
                else if (ch < 0x20 || ch == '<' || ch == '>' || ch == '&') sb.Append("\\u").Append(((int)ch).ToString("x4", System.Globalization.CultureInfo.InvariantCulture));
                else sb.Append(ch);
            }
            sb.Append('"');
        }
        return sb.Append("]}").ToString();
    }
}
