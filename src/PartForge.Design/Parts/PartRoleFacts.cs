namespace PartForge.Design.Parts;

/// <summary>
/// What follows from a part's role, in one table.
/// </summary>
/// <param name="Rotates">Turns with the shaft (rotors, their back iron, the dual-rotor hub spacer).</param>
/// <param name="RunsInMachine">Stays in the running machine (false for the gap gauge, pulled out before the rotor turns),
/// so it takes part in the rotation sweep.</param>
/// <param name="OverrideKey">Its key under the design file's <c>parts:</c> section.</param>
/// <param name="DefaultMaterial">Its material when neither <c>parts.&lt;key&gt;.material</c> nor its own section names one.</param>
public sealed record PartRoleFacts(bool Rotates, bool RunsInMachine, string OverrideKey, string DefaultMaterial)
{
    private static readonly Dictionary<PartRole, PartRoleFacts> Table = new()
    {
        [PartRole.Rotor] = new(Rotates: true, RunsInMachine: true, "rotor", "PLA"),
        [PartRole.BackIron] = new(Rotates: true, RunsInMachine: true, "back_iron", "steel"),
        [PartRole.Former] = new(Rotates: false, RunsInMachine: true, "former", "PLA"),
        [PartRole.Stator] = new(Rotates: false, RunsInMachine: true, "stator", "PLA"),
        [PartRole.HubSpacer] = new(Rotates: true, RunsInMachine: true, "spacer", "acrylic"),
        [PartRole.GapGauge] = new(Rotates: false, RunsInMachine: false, "spacer", "acrylic"),
        [PartRole.RimSpacer] = new(Rotates: false, RunsInMachine: true, "spacer", "acrylic"),
    };

    public static PartRoleFacts Of(PartRole role) => Table[role];
}
