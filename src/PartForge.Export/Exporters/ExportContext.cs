using PartForge.Export.Pipeline;
using PartForge.Export.Results;

namespace PartForge.Export.Exporters;

/// <summary>What a writer may read: the evaluation, the results document, whether the build is forced past a
/// failed check, and the rendered previews.</summary>
public sealed class ExportContext(Evaluation evaluation, ResultsDocument results, bool forced, IReadOnlyDictionary<PreviewKey, byte[]> previews)
{
    public Evaluation Evaluation { get; } = evaluation;
    public ResultsDocument Results { get; } = results;
    public bool Forced { get; } = forced;

    /// <summary>A rendered preview (PNG bytes).</summary>
    public byte[] Preview(PreviewKey key) => previews[key];
}
