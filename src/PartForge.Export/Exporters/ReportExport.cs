using System.Text;
using PartForge.Design.Machines;
using PartForge.Export.Pipeline;
using PartForge.Export.Report;

namespace PartForge.Export.Exporters;

/// <summary>The self-contained HTML report, with the previews of the printed parts.</summary>
public sealed class ReportExport : ExportFormat
{
    public override string Name => "html";
    public override ExportInput Input => ExportInput.Results;

    public override IEnumerable<PlannedFile> Plan(ExportScope scope) =>
        [new PlannedFile(OutputNames.Report(scope.Machine.Name), this, [], scope.All.Parts)];

    public override IEnumerable<PreviewKey> Previews(PlannedFile file, ExportScope scope) =>
        scope.All.Parts.Where(p => p.Process == PartProcess.Print).Select(p => PreviewKey.Of(p.Id));

    public override void Write(Stream stream, PlannedFile file, ExportContext context)
    {
        var ev = context.Evaluation;
        var e = ElectricalView.From(ev.Machine, ev.Electrical);
        var shown = ev.Parts!.Parts.Where(p => p.Process == PartProcess.Print).Select(p => (p.Name, context.Preview(PreviewKey.Of(p.Id)))).ToArray();
        string html = HtmlReport.Render(ReportBuilder.Build(ev.Machine, e, ev.Parts, ev.Checks, context.Forced, shown));
        stream.Write(new UTF8Encoding(encoderShouldEmitUTF8Identifier: false).GetBytes(html));
    }
}
