namespace PartForge.Export.Pipeline;

/// <summary>
/// File names of the outputs (the pinned part names and output files, README "Outputs"), derived from the design name and
/// sanitised so that no name can leave the output folder or surprise a shell: lowercase letters, digits and
/// '-' only, at most 64 characters, never empty, never "." or "..".
/// </summary>
public static class OutputNames
{
    public static string Sanitize(string? name)
    {
        var sb = new System.Text.StringBuilder();
        foreach (char ch in name ?? "")
        {
            if (sb.Length >= 64) break;
            char c = char.ToLowerInvariant(ch);
            bool ok = c is >= 'a' and <= 'z' or >= '0' and <= '9';
            if (ok) sb.Append(c);
            else if (sb.Length > 0 && sb[^1] != '-') sb.Append('-');
        }
        string s = sb.ToString().Trim('-');
        return s.Length == 0 ? "design" : s;
    }

    public static string PartFile(string design, string part, string extension) => $"{Sanitize(design)}-{Sanitize(part)}.{extension}";
    public static string ThreeMf(string design) => $"{Sanitize(design)}.3mf";
    public static string PlateThreeMf(string design, int plate) => $"{Sanitize(design)}-plate-{plate.ToString(System.Globalization.CultureInfo.InvariantCulture)}.3mf";
    public static string AssemblyThreeMf(string design) => $"{Sanitize(design)}-assembly.3mf";
    public static string Results(string design) => $"{Sanitize(design)}-results.json";
    public static string Report(string design) => $"{Sanitize(design)}-report.html";
    public static string Bom(string design) => $"{Sanitize(design)}-bom.csv";

    /// <summary>The output set's manifest (<see cref="Formats.Io.OutputManifest"/>), written last.</summary>
    public static string Manifest(string design) => Formats.Io.OutputManifest.FileNameFor(Sanitize(design));
}
