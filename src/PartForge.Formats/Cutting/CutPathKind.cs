namespace PartForge.Formats.Cutting;

/// <summary>The role of one path on a cut sheet; also the order in which they are written.</summary>
public enum CutPathKind
{
    /// <summary>Marking or engraving, not compensated; written first while the part is still held by the sheet.</summary>
    Mark = 0,

    /// <summary>An inner through cut (hole), shrunk by half the kerf; written before the outlines.</summary>
    Hole = 1,

    /// <summary>An outer through cut, grown by half the kerf; written last.</summary>
    Outline = 2,
}
