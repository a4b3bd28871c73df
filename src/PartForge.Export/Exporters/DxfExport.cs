using PartForge.Design.Machines;
using PartForge.Formats.Dxf;

namespace PartForge.Export.Exporters;

/// <summary>DXF R12 cut sheets from the exact profiles (kerf-compensated; arcs stay arcs): one per cut part, and one
/// per nested sheet of every copy of the cut parts of one material and thickness (<see cref="CutSheets"/>).</summary>
public sealed class DxfExport : ExportFormat
{
    public override string Name => "dxf";
    public override ExportInput Input => ExportInput.ExactProfile;

    public override IEnumerable<PlannedFile> Plan(ExportScope scope) => CutSheets.Plan(scope, this, "dxf");

    public override void Write(Stream stream, PlannedFile file, ExportContext context)
    {
        var m = context.Evaluation.Machine;
        var style = m.Process.DxfContours == CutContourStyle.Entities ? DxfContours.Entities : DxfContours.Polyline;
        DxfWriter.Write(stream, CutSheets.For(file, context), style);
    }
}
