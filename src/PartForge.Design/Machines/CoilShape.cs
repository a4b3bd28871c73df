namespace PartForge.Design.Machines;

/// <summary>Plan shape of a coil.</summary>
public enum CoilShape
{
    /// <summary>Circular winding around a round core hole of <c>coils.core.diameter</c>.</summary>
    Round,

    /// <summary>Sector-following winding around a keystone window of <c>coils.core.width</c>.</summary>
    Keystone,
}
