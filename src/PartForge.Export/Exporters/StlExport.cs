using PartForge.Formats.Stl;

namespace PartForge.Export.Exporters;

/// <summary>Binary STL, one file per printed part (part-local millimetres, as printed).</summary>
public sealed class StlExport : ExportFormat
{
    public override string Name => "stl";
    public override ExportInput Input => ExportInput.Mesh;

    public override IEnumerable<PlannedFile> Plan(ExportScope scope) =>
        scope.Printed.Select(p => new PlannedFile(scope.PartFile(p, "stl"), this, [p], [p]));

    public override void Write(Stream stream, PlannedFile file, ExportContext context)
    {
        var p = file.Part!;
        StlWriter.WriteBinary(stream, p.Mesh, StlWriter.SafeName(context.Evaluation.Machine.Name + "-" + p.Name));
    }
}
