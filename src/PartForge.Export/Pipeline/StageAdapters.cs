using PartForge.Electrical;
using PartForge.Parts;

namespace PartForge.Export.Pipeline;

/// <summary>Hand-over helpers between the stages that the stages themselves do not offer.</summary>
public static class StageAdapters
{
    /// <summary>The coil and sensor geometry the part builders need (<see cref="PartsBuilder.CoilFrom"/>), or null
    /// when the electrical engine could not resolve the coil.</summary>
    public static CoilGeometry? CoilGeometryOf(ElectricalResult e) =>
        e.Coil?.Outline == null ? null : PartsBuilder.CoilFrom(e);
}
