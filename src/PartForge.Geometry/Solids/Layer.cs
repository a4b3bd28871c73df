using PartForge.Geometry.Regions;

namespace PartForge.Geometry.Solids;

/// <summary>One slab of a layered solid: the region extruded from z = Z0 to z = Z1 (mm, Z1 &gt; Z0).</summary>
public sealed record Layer(double Z0, double Z1, Region Region)
{
    /// <summary>Thickness in mm.</summary>
    public double HeightMm => Z1 - Z0;

    /// <summary>Area x height, mm^3.</summary>
    public double Volume => Region.Area * (Z1 - Z0);
}
