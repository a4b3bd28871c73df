using PartForge.Formats.Stl;

namespace PartForge.Export.Exporters;

/// <summary>Binary STL, one file per printed part (part-local millimetres), and one per print piece of a part printed in
/// pieces (<c>&lt;name&gt;-former-base.stl</c>, <c>&lt;name&gt;-former-cap.stl</c>: what goes on the printer).</summary>
public sealed class StlExport : ExportFormat
{
    public override string Name => "stl";
    public override ExportInput Input => ExportInput.Mesh;

    public override IEnumerable<PlannedFile> Plan(ExportScope scope) =>
        scope.Printed.SelectMany(p => p.PrintPieces.Prepend(p)).Select(p => new PlannedFile(scope.PartFile(p, "stl"), this, [p], [p]));

    public override void Write(Stream stream, PlannedFile file, ExportContext context)
    {
        var p = file.Part!;
        StlWriter.WriteBinary(stream, p.Mesh, StlWriter.SafeName(context.Evaluation.Machine.Name + "-" + p.Name));
    }
}
