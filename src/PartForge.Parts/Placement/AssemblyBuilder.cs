using PartForge.Geometry.Primitives;

namespace PartForge.Parts.Placement;

/// <summary>
/// Places every copy of every part in the machine frame for the 3MF (one object each) and the previews.
/// Exploded view: each copy moves along z by <see cref="PartInstance.ExplodeRank"/> x <c>assembly.explode</c>:
/// the stationary pack stays at 0 (formers with their ring), rotors at +-1, back irons at +-2, the single-rotor
/// gap gauge at +0.5; in dual-stator the rotor stays and the rings go to +-1.
/// </summary>
public static class AssemblyBuilder
{
    /// <summary>Every copy placed; <paramref name="exploded"/> false gives the nominal (assembled) positions.</summary>
    public static IReadOnlyList<PlacedPart> Build(PartSet set, bool exploded = true, IReadOnlyCollection<string>? onlyParts = null)
    {
        ArgumentNullException.ThrowIfNull(set);
        var result = new List<PlacedPart>();
        foreach (var part in set.Parts)
        {
            if (onlyParts is not null && !onlyParts.Contains(part.Name)) continue;
            foreach (var inst in part.Instances)
            {
                double dz = exploded ? inst.ExplodeRank * set.ExplodeMm : 0;
                var mesh = part.Mesh.Transformed(p =>
                {
                    var q = inst.ToMachine(new Vec2(p.X, p.Y));
                    return new Vec3(q.X, q.Y, inst.ToMachineZ(p.Z) + dz);
                });
                result.Add(new PlacedPart(part.Name, inst.Index, part, mesh));
            }
        }
        return result;
    }
}
