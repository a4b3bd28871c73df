using PartForge.Design.Machines;
using PartForge.Formats.Dxf;

namespace PartForge.Export.Exporters;

/// <summary>DXF R12 cut sheet, one per cut part, from its exact profile (kerf-compensated; arcs stay arcs).</summary>
public sealed class DxfExport : ExportFormat
{
    public override string Name => "dxf";
    public override ExportInput Input => ExportInput.ExactProfile;

    public override IEnumerable<PlannedFile> Plan(ExportScope scope) =>
        scope.Cut.Select(p => new PlannedFile(scope.PartFile(p, "dxf"), this, [p], []));

    public override void Write(Stream stream, PlannedFile file, ExportContext context)
    {
        var m = context.Evaluation.Machine;
        var style = m.Process.DxfContours == CutContourStyle.Entities ? DxfContours.Entities : DxfContours.Polyline;
        DxfWriter.Write(stream, CutSheets.Of(m, file.Part!), style);
    }
}
