namespace PartForge.Design.Parts;

/// <summary>Which of a pair a part is: the front one is on the +z side of the machine (the side the report draws on top).</summary>
public enum PartSide
{
    /// <summary>The only part of its role.</summary>
    Only,

    /// <summary>The one on the +z side.</summary>
    Front,

    /// <summary>The one on the -z side.</summary>
    Back,
}
