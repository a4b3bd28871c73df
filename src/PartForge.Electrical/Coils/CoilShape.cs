namespace PartForge.Electrical.Coils;

/// <summary>Plan shape of a coil.</summary>
public enum CoilShape
{
    /// <summary>Circular winding around a round core hole of `coils.core.diameter`.</summary>
    Round,

    /// <summary>Sector-following winding around a keystone window (see <see cref="CoilOutline"/>).</summary>
    Keystone,
}
