using PartForge.Formats.Svg;

namespace PartForge.Export.Exporters;

/// <summary>SVG cut sheet, one per cut part, from its exact profile.</summary>
public sealed class SvgExport : ExportFormat
{
    public override string Name => "svg";
    public override ExportInput Input => ExportInput.ExactProfile;

    public override IEnumerable<PlannedFile> Plan(ExportScope scope) =>
        scope.Cut.Select(p => new PlannedFile(scope.PartFile(p, "svg"), this, [p], []));

    public override void Write(Stream stream, PlannedFile file, ExportContext context) =>
        SvgWriter.Write(stream, CutSheets.Of(context.Evaluation.Machine, file.Part!));
}
