namespace PartForge.Design.Parts;

/// <summary>What a part is for. A closed set: every stage asks the role, never the part's name.</summary>
public enum PartRole
{
    /// <summary>A rotor disc holding the magnets.</summary>
    Rotor,

    /// <summary>The steel disc behind a rotor's magnets.</summary>
    BackIron,

    /// <summary>The bobbin a coil is wound on.</summary>
    Former,

    /// <summary>A stator ring holding the formers.</summary>
    Stator,

    /// <summary>Dual-rotor: the ring clamped between the two rotors' inner faces; it turns with them and sets both gaps.</summary>
    HubSpacer,

    /// <summary>Single-rotor: a removable shim that sets the air gap while the rotor is fixed, pulled out before it turns.</summary>
    GapGauge,

    /// <summary>Dual-stator: the ring between the two stator rings outside the rotor; it stays with the stators.</summary>
    RimSpacer,
}
