using PartForge.Parts;

namespace PartForge.Export.Exporters;

/// <summary>One output file a build will write.</summary>
/// <param name="Name">File name inside the output folder.</param>
/// <param name="Format">The format that writes it.</param>
/// <param name="Parts">The parts it carries (listed under each part in the results document).</param>
/// <param name="MeshedParts">The parts whose meshes it needs.</param>
/// <param name="Variant">A format's own distinction between its files (e.g. "assembly"); empty when there is one kind.</param>
public sealed record PlannedFile(string Name, ExportFormat Format, IReadOnlyList<PartModel> Parts, IReadOnlyList<PartModel> MeshedParts, string Variant = "")
{
    /// <summary>For one sheet of a nest: every part the nest was made of (the build's cut parts); empty otherwise.</summary>
    public IReadOnlyList<PartModel> LaidOut { get; init; } = [];

    /// <summary>The one part of a per-part file, or null.</summary>
    public PartModel? Part => Parts.Count == 1 && Variant.Length == 0 ? Parts[0] : null;
}
