using PartForge.Parts;

namespace PartForge.Export.Pipeline;

/// <summary>
/// Which files a build writes, decided before anything is written: per printed part an STL and a PNG
/// preview, one 3MF of all printed parts and one 3MF of the exploded assembly (every copy of every part), per
/// cut part a DXF and an SVG, then the results, report, BOM and an assembly preview. Filtered by --formats and
/// --parts; in a fixed order. The assembly 3MF belongs to the format "3mf" and is written only when the build
/// covers the whole machine (no --parts, or --parts naming every part of the design): an assembly with parts
/// missing would mislead the visual check it is for.
/// </summary>
public sealed class ExportPlan
{
    public sealed record FileSpec(string Name, string Format, PartModel? Part, IReadOnlyList<PartModel> Parts)
    {
        /// <summary>The exploded assembly 3MF (<see cref="AssemblyThreeMf"/>) of <see cref="Parts"/>, rather than one
        /// object per part.</summary>
        public bool Assembly { get; init; }
    }

    private ExportPlan(IReadOnlyList<FileSpec> files, IReadOnlyDictionary<string, IReadOnlyList<string>> byPart)
    {
        Files = files;
        FilesByPart = byPart;
    }

    public IReadOnlyList<FileSpec> Files { get; }

    /// <summary>Whether the results document is written (it then carries every part's triangle count).</summary>
    public bool WritesResults => Files.Any(f => f.Format == "json");

    /// <summary>The parts whose meshes the planned files need, in the machine's part order: the STL, 3MF and
    /// preview parts, and every part for the assembly 3MF, the assembly preview, the results document (volumes
    /// and triangle counts), the BOM and the report (masses and sizes). DXF and SVG alone need no mesh.</summary>
    public IReadOnlyList<PartModel> MeshedParts(PartSet all)
    {
        var need = new HashSet<string>(StringComparer.Ordinal);
        foreach (var f in Files)
        {
            switch (f.Format)
            {
                case "stl": case "png" when f.Part != null: need.Add(f.Part!.Name); break;
                case "3mf": foreach (var p in f.Parts) need.Add(p.Name); break;
                case "png": case "json": case "csv": case "html": foreach (var p in all.Parts) need.Add(p.Name); break;
            }
        }
        return all.Parts.Where(p => need.Contains(p.Name)).ToArray();
    }

    /// <summary>File names per part name (for the results document's parts list).</summary>
    public IReadOnlyDictionary<string, IReadOnlyList<string>> FilesByPart { get; }

    public static ExportPlan For(Evaluation ev, IReadOnlySet<string> formats, IReadOnlySet<string>? partFilter)
    {
        string name = ev.Design.Name;
        var parts = ev.Parts!.Parts.Where(p => partFilter == null || partFilter.Contains(p.Name)).ToArray();
        var files = new List<FileSpec>();
        var byPart = parts.ToDictionary(p => p.Name, _ => new List<string>(), StringComparer.Ordinal);
        void Add(string file, string format, PartModel? part, IReadOnlyList<PartModel>? many = null, bool assembly = false)
        {
            files.Add(new FileSpec(file, format, part, many ?? []) { Assembly = assembly });
            if (part != null) byPart[part.Name].Add(file);
            foreach (var p in many ?? []) byPart[p.Name].Add(file);
        }
        var printed = parts.Where(p => p.Process == PartProcess.Print).ToArray();
        var cut = parts.Where(p => p.Process == PartProcess.Cut).ToArray();
        if (formats.Contains("stl")) foreach (var p in printed) Add(OutputNames.PartFile(name, p.Name, "stl"), "stl", p);
        if (formats.Contains("3mf") && printed.Length > 0) Add(OutputNames.ThreeMf(name), "3mf", null, printed);
        bool wholeMachine = parts.Length == ev.Parts.Parts.Count;
        if (formats.Contains("3mf") && wholeMachine) Add(OutputNames.AssemblyThreeMf(name), "3mf", null, parts, assembly: true);
        if (formats.Contains("dxf")) foreach (var p in cut) Add(OutputNames.PartFile(name, p.Name, "dxf"), "dxf", p);
        if (formats.Contains("svg")) foreach (var p in cut) Add(OutputNames.PartFile(name, p.Name, "svg"), "svg", p);
        if (formats.Contains("png")) foreach (var p in printed) Add(OutputNames.PartFile(name, p.Name, "png"), "png", p);
        if (formats.Contains("png")) Add(OutputNames.PartFile(name, "assembly", "png"), "png", null);
        if (formats.Contains("csv")) Add(OutputNames.Bom(name), "csv", null);
        if (formats.Contains("html")) Add(OutputNames.Report(name), "html", null);
        if (formats.Contains("json")) Add(OutputNames.Results(name), "json", null);
        return new ExportPlan(files, byPart.ToDictionary(kv => kv.Key, kv => (IReadOnlyList<string>)kv.Value, StringComparer.Ordinal));
    }
}
