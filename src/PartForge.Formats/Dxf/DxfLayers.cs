namespace PartForge.Formats.Dxf;

/// <summary>Layer names and colours (AutoCAD Color Index) written to every DXF cut sheet.</summary>
public static class DxfLayers
{
    /// <summary>Through cuts: holes and outlines, kerf-compensated. Colour 1 (red).</summary>
    public const string Cut = "CUT";
    public const int CutColor = 1;

    /// <summary>Marking and engraving, not compensated. Colour 5 (blue).</summary>
    public const string Mark = "MARK";
    public const int MarkColor = 5;

    /// <summary>Information only (the kerf statement); not to be cut. Colour 8 (grey).</summary>
    public const string Notes = "NOTES";
    public const int NotesColor = 8;
}
