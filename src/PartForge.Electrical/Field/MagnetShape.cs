namespace PartForge.Electrical.Field;

/// <summary>Shape of an axially magnetised rotor magnet.</summary>
public enum MagnetShape
{
    /// <summary>Cylinder (disc) of a diameter and thickness.</summary>
    Disc,

    /// <summary>Cuboid: radial length x tangential width x thickness.</summary>
    Block,

    /// <summary>Segment of an annulus: inner and outer radius, angular span.</summary>
    Arc,
}
