using PartForge.Design.Parts;

namespace PartForge.Export.Exporters;

/// <summary>A shaded preview: of one part, or (<see cref="Part"/> null) of the exploded assembly.</summary>
public readonly record struct PreviewKey(PartId? Part)
{
    public static PreviewKey Assembly => new(null);
    public static PreviewKey Of(PartId part) => new(part);

    /// <summary>A stable order: parts by name, the assembly last.</summary>
    public string SortKey => Part?.Name ?? "\uffff";
}
