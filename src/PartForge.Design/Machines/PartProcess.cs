namespace PartForge.Design.Machines;

/// <summary>How a part is made.</summary>
public enum PartProcess
{
    /// <summary>3D-printed from the layered solid (STL/3MF).</summary>
    Print,

    /// <summary>Cut from sheet along an exact profile (DXF/SVG); the part must be a single-thickness prism.</summary>
    Cut,
}
