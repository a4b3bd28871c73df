using PartForge.Design.Machines;
using PartForge.Design.Materials;
using PartForge.Design.Parts;

namespace PartForge.Parts.Shapes;

/// <summary>
/// Which process a part gets: the one the design names (<c>parts.&lt;key&gt;.process</c>), else by material:
/// filament plastics are printed, metals and sheet goods (steel, aluminium, acrylic, plywood) are cut. A part
/// that is not a single-thickness sheet cannot be cut: asked for explicitly that is an error; implied by the
/// material it falls back to print with a note.
/// </summary>
internal static class ProcessChoice
{
    public static (PartProcess Process, Material Material) Resolve(PartId part, PartChoice choice, bool canBeSheet, string whyNotSheet, List<PartDiagnostic> diags)
    {
        var material = choice.Material;
        var process = choice.Process ?? (material.IsFilament ? PartProcess.Print : PartProcess.Cut);
        if (process == PartProcess.Cut && !canBeSheet)
        {
            string name = part.Name;
            if (choice.Process == PartProcess.Cut)
                diags.Add(new PartDiagnostic(DiagnosticSeverity.Error, part, "cut-not-prismatic",
                    $"{name}: parts.{part.Facts.OverrideKey}.process is cut, but {whyNotSheet}; use print or change the design"));
            else
                diags.Add(new PartDiagnostic(DiagnosticSeverity.Note, part, "cut-not-prismatic",
                    $"{name}: {material.Name} would be cut from sheet, but {whyNotSheet}; written as a solid (STL/3MF) for machining instead"));
            process = PartProcess.Print;
        }
        return (process, material);
    }
}
