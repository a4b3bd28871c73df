using PartForge.Electrical;
using PartForge.Geometry;
using PartForge.Design.Machines;

namespace PartForge.Parts;

public static partial class PartsBuilder
{
    /// <summary>Builds the parts from the design and the electrical engine's results (coil outline, turns, wire, sensors).</summary>
    public static PartSet Build(MachineModel design, ElectricalResult electrical, Precision? precision = null) =>
        Build(design, CoilFrom(electrical), precision);

    /// <summary>What the part builders take from the electrical results.</summary>
    public static CoilGeometry CoilFrom(ElectricalResult e)
    {
        ArgumentNullException.ThrowIfNull(e);
        var coil = e.Coil ?? throw new PartsException("former: the coil could not be sized (see the electrical errors)");
        var outline = coil.Outline ?? throw new PartsException("former: the coil has no outline (see the electrical errors)");
        var sensors = e.Sensors?.Sensors ?? Array.Empty<PartForge.Electrical.Sensors.SensorPlacement>();
        return new CoilGeometry(outline.PitchRadiusMm, outline.Outer, outline.Window, outline.HeightMm, coil.Turns, coil.WireOverallMm,
            sensors.Select(s => s.AngleDeg).ToArray(), sensors.Count > 0 ? sensors[0].RadiusMm : outline.PitchRadiusMm);
    }
}
