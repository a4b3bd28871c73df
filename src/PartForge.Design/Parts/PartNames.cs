namespace PartForge.Design.Parts;

/// <summary>
/// The contract's part names, both ways, in one table: the only place a part name is written or read. The
/// name <c>spacer</c> is kept as an alias on the command line (<c>--parts spacer</c>) for every spacer role.
/// </summary>
public static class PartNames
{
    private static readonly (PartId Id, string Name)[] Table =
    [
        (PartId.Rotor, "rotor"),
        (PartId.RotorFront, "rotor-front"),
        (PartId.RotorBack, "rotor-back"),
        (PartId.BackIron, "back-iron"),
        (PartId.Former, "former"),
        (PartId.Stator, "stator"),
        (PartId.StatorFront, "stator-front"),
        (PartId.StatorBack, "stator-back"),
        (PartId.HubSpacer, "hub-spacer"),
        (PartId.GapGauge, "gap-gauge"),
        (PartId.RimSpacer, "rim-spacer"),
    ];

    /// <summary>The word that selects every spacer role on the command line.</summary>
    public const string SpacerAlias = "spacer";

    /// <summary>The contract name of a part.</summary>
    public static string Of(PartId id)
    {
        foreach (var (i, n) in Table) if (i == id) return n;
        throw new ArgumentOutOfRangeException(nameof(id), id.Role + "/" + id.Side, "no contract name for this part");
    }

    /// <summary>Every name a user may give to <c>--parts</c> (the part names and the spacer alias), in table order.</summary>
    public static IReadOnlyList<string> All { get; } = Table.Select(t => t.Name).Append(SpacerAlias).Distinct().ToArray();

    /// <summary>The parts a name selects (the alias selects every spacer role); empty for an unknown name.</summary>
    public static IReadOnlyList<PartId> Select(string name) =>
        name == SpacerAlias
            ? Table.Where(t => t.Id.IsSpacer).Select(t => t.Id).ToArray()
            : Table.Where(t => t.Name == name).Select(t => t.Id).ToArray();
}
