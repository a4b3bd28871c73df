using PartForge.Design.Parts;
using PartForge.Geometry.Meshes;
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
    public static IReadOnlyList<PlacedPart> Build(PartSet set, bool exploded = true, IReadOnlyCollection<PartId>? onlyParts = null) =>
        Places(set, exploded, onlyParts).Select(p => new PlacedPart(p.Name, p.Instance, p.Part, p.PlacedMesh())).ToList();

    /// <summary>Where every copy goes, without moving any mesh yet (<see cref="PartPlace.PlacedMesh"/> does that
    /// for one copy): a writer can then hold one placed copy at a time.</summary>
    public static IReadOnlyList<PartPlace> Places(PartSet set, bool exploded = true, IReadOnlyCollection<PartId>? onlyParts = null)
    {
        ArgumentNullException.ThrowIfNull(set);
        var result = new List<PartPlace>();
        foreach (var part in set.Parts)
        {
            if (onlyParts is not null && !onlyParts.Contains(part.Id)) continue;
            foreach (var inst in part.Instances)
                result.Add(new PartPlace(part.Name, inst.Index, part, inst, exploded ? inst.ExplodeRank * set.ExplodeMm : 0));
        }
        return result;
    }
}

/// <summary>Where one copy of a part goes in the machine frame.</summary>
/// <param name="Name">Contract part name.</param>
/// <param name="Instance">Copy index (<see cref="PartInstance.Index"/>).</param>
/// <param name="Part">The part model.</param>
/// <param name="Copy">The copy's placement.</param>
/// <param name="ExplodeDzMm">Extra z shift of the exploded view, mm.</param>
public sealed record PartPlace(string Name, int Instance, PartModel Part, PartInstance Copy, double ExplodeDzMm)
{
    /// <summary>"former-3" for copies, the bare name for single parts; unique within an assembly.</summary>
    public string ObjectName => Part.Quantity > 1 ? $"{Name}-{Instance}" : Name;

    /// <summary>The part's mesh moved into the machine frame (a new mesh each call).</summary>
    public Mesh PlacedMesh() => Part.Mesh.Transformed(p =>
    {
        var q = Copy.ToMachine(new Vec2(p.X, p.Y));
        return new Vec3(q.X, q.Y, Copy.ToMachineZ(p.Z) + ExplodeDzMm);
    });
}
