namespace PartForge.Parts;

/// <summary>How a part is made.</summary>
public enum PartProcess
{
    /// <summary>3D-printed from the layered solid (STL/3MF).</summary>
    Print,

    /// <summary>Cut from sheet along an exact profile (DXF/SVG); the part must be a single-thickness prism.</summary>
    Cut,
}

/// <summary>The contract words for <see cref="PartProcess"/>.</summary>
public static class PartProcessNames
{
    /// <summary>"print" or "cut", as in the results document.</summary>
    public static string ToContractName(this PartProcess p) => p == PartProcess.Cut ? "cut" : "print";

    /// <summary>Parses "print" / "cut" (as the design's <c>parts:</c> section spells them).</summary>
    public static PartProcess? Parse(string? word) => word switch
    {
        "print" => PartProcess.Print,
        "cut" => PartProcess.Cut,
        _ => null,
    };
}
