using PartForge.Export.Pipeline;
using PartForge.Export.Results;

namespace PartForge.Export.Exporters;

/// <summary>The results document (JSON).</summary>
public sealed class ResultsExport : ExportFormat
{
    public override string Name => "json";
    public override ExportInput Input => ExportInput.Results;

    public override IEnumerable<PlannedFile> Plan(ExportScope scope) =>
        [new PlannedFile(OutputNames.Results(scope.Machine.Name), this, [], scope.All.Parts)];

    public override void Write(Stream stream, PlannedFile file, ExportContext context) => stream.Write(ResultsJson.ToUtf8(context.Results));
}
