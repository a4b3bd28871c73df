using D = PartForge.Design.Model;

namespace PartForge.Parts.Shapes;

/// <summary>
/// Which process and material a part gets. Material: the design's <c>parts.&lt;part&gt;.material</c>, else the
/// part section's own material key (rotor.material, stator.material), else the part's default. Process:
/// <c>parts.&lt;part&gt;.process</c>, else by material: filament plastics are printed, metals and sheet goods
/// (steel, aluminium, acrylic, plywood) are cut. A part that is not a single-thickness sheet cannot be
/// cut: asked for explicitly that is an error; implied by the material it falls back to print with a note.
/// </summary>
internal static class ProcessChoice
{
    public static (PartProcess Process, string Material) Resolve(string partName, D.PartOverride? over,
        string? sectionMaterial, string defaultMaterial, bool canBeSheet, string whyNotSheet, List<PartDiagnostic> diags)
    {
        string material = over?.Material ?? sectionMaterial ?? defaultMaterial;
        var asked = PartProcessNames.Parse(over?.Process);
        var process = asked ?? (Materials.IsFilament(material) ? PartProcess.Print : PartProcess.Cut);
        if (process == PartProcess.Cut && !canBeSheet)
        {
            if (asked == PartProcess.Cut)
                diags.Add(new PartDiagnostic(DiagnosticSeverity.Error, partName, "cut-not-prismatic",
                    $"{partName}: parts.{Key(partName)}.process is cut, but {whyNotSheet}; use print or change the design"));
            else
                diags.Add(new PartDiagnostic(DiagnosticSeverity.Note, partName, "cut-not-prismatic",
                    $"{partName}: {material} would be cut from sheet, but {whyNotSheet}; written as a solid (STL/3MF) for machining instead"));
            process = PartProcess.Print;
        }
        return (process, material);
    }

    /// <summary>The <c>parts:</c> key of a contract part name (rotor-front -> rotor, back-iron -> back_iron).</summary>
    public static string Key(string partName) => partName switch
    {
        "back-iron" => "back_iron",
        _ when partName.StartsWith("rotor", StringComparison.Ordinal) => "rotor",
        _ when partName.StartsWith("stator", StringComparison.Ordinal) => "stator",
        _ => partName,
    };
}
