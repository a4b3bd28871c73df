namespace PartForge.Export.Exporters;

/// <summary>Shaded PNG previews: one per printed part, and one of the exploded assembly.</summary>
public sealed class PngExport : ExportFormat
{
    public const string AssemblyVariant = "assembly";

    public override string Name => "png";
    public override ExportInput Input => ExportInput.Mesh;

    public override IEnumerable<PlannedFile> Plan(ExportScope scope)
    {
        foreach (var p in scope.Printed) yield return new PlannedFile(scope.PartFile(p, "png"), this, [p], [p]);
        yield return new PlannedFile(Pipeline.OutputNames.PartFile(scope.Machine.Name, "assembly", "png"), this, [], scope.All.Parts, AssemblyVariant);
    }

    public override IEnumerable<PreviewKey> Previews(PlannedFile file, ExportScope scope) =>
        [file.Part is { } p ? PreviewKey.Of(p.Id) : PreviewKey.Assembly];

    public override void Write(Stream stream, PlannedFile file, ExportContext context)
    {
        var bytes = context.Preview(file.Part is { } p ? PreviewKey.Of(p.Id) : PreviewKey.Assembly);
        stream.Write(bytes);
    }
}
