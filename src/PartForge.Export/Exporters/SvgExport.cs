using PartForge.Formats.Svg;

namespace PartForge.Export.Exporters;

/// <summary>SVG cut sheets from the exact profiles: one per cut part, and one per nested sheet (<see cref="CutSheets"/>).</summary>
public sealed class SvgExport : ExportFormat
{
    public override string Name => "svg";
    public override ExportInput Input => ExportInput.ExactProfile;

    public override IEnumerable<PlannedFile> Plan(ExportScope scope) => CutSheets.Plan(scope, this, "svg");

    public override void Write(Stream stream, PlannedFile file, ExportContext context) =>
        SvgWriter.Write(stream, CutSheets.For(file, context));
}
