namespace PartForge.Geometry.Layout;

/// <summary>Why a copy of a part was not placed.</summary>
public enum LayoutMissReason
{
    /// <summary>It does not fit on an empty sheet (or bed) of any size given, in any allowed rotation, with the spacing.</summary>
    LargerThanEveryBin,

    /// <summary>It would fit on an empty sheet of a size whose sheets are all used up.</summary>
    NoBinLeft,
}
