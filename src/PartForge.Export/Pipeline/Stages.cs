using PartForge.Checks;
using PartForge.Design.Machines;
using PartForge.Electrical;
using PartForge.Geometry;
using PartForge.Parts;

namespace PartForge.Export.Pipeline;

/// <summary>
/// The stage orchestrator: machine model -> electrical results -> parts -> checks, the same way for
/// <c>check</c>, <c>build</c> and <c>sweep</c>. Pure and thread-safe (sweeps run it in parallel). No part is
/// meshed here: checks work on the exact primitives, and a build meshes only what its files need.
/// </summary>
public static class Stages
{
    /// <summary>Every computing stage of one machine. <paramref name="lap"/> is told when each stage ends (for timings);
    /// <paramref name="partsPrecision"/> replaces the machine's own for the parts' polygons (sweeps: the checks measure
    /// exact primitives, so their results do not depend on it).</summary>
    public static Evaluation Evaluate(MachineModel machine, CheckOptions? options = null, Action<string>? lap = null, Precision? partsPrecision = null)
    {
        ArgumentNullException.ThrowIfNull(machine);
        var electrical = ElectricalEngine.Evaluate(machine);
        lap?.Invoke("electrical");
        // Without a resolved coil there is nothing to build or measure: the checks then report the electrical errors.
        var parts = electrical.Coil?.Outline is null ? null : PartsBuilder.Build(machine, electrical, partsPrecision);
        lap?.Invoke("parts");
        var checks = CheckRunner.Run(machine, electrical, parts, options);
        lap?.Invoke("checks");
        return new Evaluation(machine, electrical, parts, checks);
    }
}
