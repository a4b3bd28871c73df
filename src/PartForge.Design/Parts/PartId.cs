namespace PartForge.Design.Parts;

/// <summary>
/// Which part: a role and a side. Compared as a value; its <see cref="Name"/> is the contract's part name
/// (used in file names, the results document and <c>--parts</c>), written only through <see cref="PartNames"/>.
/// </summary>
public readonly record struct PartId(PartRole Role, PartSide Side = PartSide.Only)
{
    public static PartId Rotor => new(PartRole.Rotor);
    public static PartId RotorFront => new(PartRole.Rotor, PartSide.Front);
    public static PartId RotorBack => new(PartRole.Rotor, PartSide.Back);
    public static PartId BackIron => new(PartRole.BackIron);
    public static PartId Former => new(PartRole.Former);
    public static PartId Stator => new(PartRole.Stator);
    public static PartId StatorFront => new(PartRole.Stator, PartSide.Front);
    public static PartId StatorBack => new(PartRole.Stator, PartSide.Back);
    public static PartId HubSpacer => new(PartRole.HubSpacer);
    public static PartId GapGauge => new(PartRole.GapGauge);
    public static PartId RimSpacer => new(PartRole.RimSpacer);

    /// <summary>The contract part name (rotor-front, back-iron, gap-gauge, ...).</summary>
    public string Name => PartNames.Of(this);

    public bool IsRotor => Role == PartRole.Rotor;
    public bool IsStator => Role == PartRole.Stator;
    public bool IsSpacer => Role is PartRole.HubSpacer or PartRole.GapGauge or PartRole.RimSpacer;

    /// <summary>The role's facts (turns with the shaft, in the rotation sweep, design-file override key, ...).</summary>
    public PartRoleFacts Facts => PartRoleFacts.Of(Role);

    public override string ToString() => Name;
}
