using PartForge.Design.Parts;
using PartForge.Export.Exporters;
using PartForge.Parts;

namespace PartForge.Export.Pipeline;

/// <summary>
/// Which files a build writes, decided before anything is written: each chosen format's files
/// (<see cref="ExportFormat.Plan"/>) for the parts in scope, in the registry's order. Filtered by --formats and
/// --parts.
/// </summary>
public sealed class ExportPlan
{
    private ExportPlan(IReadOnlyList<PlannedFile> files, IReadOnlyDictionary<string, IReadOnlyList<string>> byPart, ExportScope scope)
    {
        Files = files;
        FilesByPart = byPart;
        Scope = scope;
    }

    public IReadOnlyList<PlannedFile> Files { get; }

    /// <summary>What the plan covers.</summary>
    public ExportScope Scope { get; }

    /// <summary>Whether the results document is written (it then carries every part's triangle count).</summary>
    public bool WritesResults => Files.Any(f => f.Format is ResultsExport);

    /// <summary>The parts (and print pieces) whose meshes the planned files need, in the machine's part order, each
    /// part followed by its pieces. Formats made from exact profiles (DXF, SVG) need none.</summary>
    public IReadOnlyList<PartModel> MeshedParts(PartSet all)
    {
        var need = new HashSet<string>(StringComparer.Ordinal);
        foreach (var f in Files) foreach (var p in f.MeshedParts) need.Add(p.Name);
        return all.Parts.SelectMany(p => p.PrintPieces.Prepend(p)).Where(p => need.Contains(p.Name)).ToArray();
    }

    /// <summary>Every preview the planned files show, each once, in a stable order.</summary>
    public IReadOnlyList<PreviewKey> Previews() =>
        Files.SelectMany(f => f.Format.Previews(f, Scope)).Distinct().OrderBy(k => k.SortKey, StringComparer.Ordinal).ToArray();

    /// <summary>File names per part name (for the results document's parts list).</summary>
    public IReadOnlyDictionary<string, IReadOnlyList<string>> FilesByPart { get; }

    public static ExportPlan For(Evaluation ev, IReadOnlyCollection<ExportFormat> formats, IReadOnlySet<PartId>? partFilter)
    {
        var all = ev.Parts!;
        var parts = all.Parts.Where(p => partFilter == null || partFilter.Contains(p.Id)).ToArray();
        var scope = new ExportScope(ev.Machine, parts, all);
        var files = new List<PlannedFile>();
        var byPart = parts.ToDictionary(p => p.Name, _ => new List<string>(), StringComparer.Ordinal);
        foreach (var format in ExportRegistry.All.Where(formats.Contains))
        {
            foreach (var f in format.Plan(scope))
            {
                files.Add(f);
                // A print piece's files are listed under its part.
                foreach (var name in f.Parts.Select(p => p.Id.Name).Distinct()) byPart[name].Add(f.Name);
            }
        }
        return new ExportPlan(files, byPart.ToDictionary(kv => kv.Key, kv => (IReadOnlyList<string>)kv.Value, StringComparer.Ordinal), scope);
    }
}
