using PartForge.Design.Machines;
using PartForge.Design.Materials;
using PartForge.Design.Parts;
using PartForge.Geometry.Solids;
using PartForge.Parts;

namespace PartForge.Checks.Inputs;

/// <summary>
/// One part as the checks see it: exact layers and named features in part-local coordinates, and where each
/// copy sits in the machine (the part builders' placement rule, <see cref="PartInstance"/>); whether it turns
/// with the shaft.
/// </summary>
public sealed record PartView(
    PartId Id,
    PartProcess Process,
    Material Material,
    IReadOnlyList<ExactLayer> Layers,
    IReadOnlyList<PartFeature> Features,
    IReadOnlyList<PartInstance> Instances,
    bool Rotating)
{
    public string Name => Id.Name;

    public IEnumerable<PartFeature> OfKind(FeatureKind kind) => Features.Where(f => f.Kind == kind);
}
