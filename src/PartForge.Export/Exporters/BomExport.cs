using PartForge.Export.Bom;
using PartForge.Export.Pipeline;
using PartForge.Export.Report;

namespace PartForge.Export.Exporters;

/// <summary>The bill of materials as CSV.</summary>
public sealed class BomExport : ExportFormat
{
    public override string Name => "csv";
    public override ExportInput Input => ExportInput.Results;

    public override IEnumerable<PlannedFile> Plan(ExportScope scope) =>
        [new PlannedFile(OutputNames.Bom(scope.Machine.Name), this, [], scope.All.Parts)];

    public override void Write(Stream stream, PlannedFile file, ExportContext context)
    {
        var ev = context.Evaluation;
        var e = ElectricalView.From(ev.Machine, ev.Electrical);
        stream.Write(BomCsv.WriteUtf8(BomBuilder.Build(ev.Machine, e.TotalWireM, e.WireGramsPerMetre, ReportBuilder.BomParts(ev.Parts!), ev.Checks.Joints, ev.Checks.Jacks)));
    }
}
