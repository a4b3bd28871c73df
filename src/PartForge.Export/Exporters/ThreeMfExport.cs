using PartForge.Export.Pipeline;
using PartForge.Formats.ThreeMf;

namespace PartForge.Export.Exporters;

/// <summary>
/// 3MF: one package of every printed part (one object each, part-local), and, when the build covers the whole
/// machine, the exploded assembly of every copy of every part (<see cref="AssemblyThreeMf"/>): an assembly with
/// parts missing would mislead the visual check it is for.
/// </summary>
public sealed class ThreeMfExport : ExportFormat
{
    public const string AssemblyVariant = "assembly";

    public override string Name => "3mf";
    public override ExportInput Input => ExportInput.Mesh;

    public override IEnumerable<PlannedFile> Plan(ExportScope scope)
    {
        var printed = scope.Printed.ToArray();
        if (printed.Length > 0) yield return new PlannedFile(OutputNames.ThreeMf(scope.Machine.Name), this, printed, printed, "parts");
        if (scope.WholeMachine) yield return new PlannedFile(OutputNames.AssemblyThreeMf(scope.Machine.Name), this, scope.Parts, scope.Parts, AssemblyVariant);
    }

    public override void Write(Stream stream, PlannedFile file, ExportContext context)
    {
        string name = context.Evaluation.Machine.Name;
        if (file.Variant == AssemblyVariant)
            ThreeMfWriter.Write(stream, AssemblyThreeMf.Title(name), AssemblyThreeMf.Objects(context.Evaluation.Parts!));
        else
            ThreeMfWriter.Write(stream, name, file.Parts.Select(p => ThreeMfObject.At(p.Name, p.Mesh)).ToArray());
    }
}
