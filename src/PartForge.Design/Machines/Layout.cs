using PartForge.Design.Parts;

namespace PartForge.Design.Machines;

/// <summary>
/// How rotors and stators are stacked along the shaft. A closed set of three; every stage asks a layout for
/// its parts and properties, never for its name.
/// </summary>
public sealed class Layout
{
    private Layout(string word, PartId[] rotors, PartId[] stators, PartRole spacer, string description)
    {
        Word = word;
        Rotors = rotors;
        Stators = stators;
        SpacerRole = spacer;
        Description = description;
    }

    /// <summary>One rotor facing one stator.</summary>
    public static readonly Layout SingleRotor = new("single-rotor", [PartId.Rotor], [PartId.Stator], PartRole.GapGauge,
        "one rotor facing one stator");

    /// <summary>A stator between two rotors whose facing magnets attract across it.</summary>
    public static readonly Layout DualRotor = new("dual-rotor", [PartId.RotorFront, PartId.RotorBack], [PartId.Stator], PartRole.HubSpacer,
        "a stator between two rotors");

    /// <summary>A rotor between two stators; its magnets face both.</summary>
    public static readonly Layout DualStator = new("dual-stator", [PartId.Rotor], [PartId.StatorFront, PartId.StatorBack], PartRole.RimSpacer,
        "a rotor between two stators");

    /// <summary>Every layout, in the design file's order.</summary>
    public static IReadOnlyList<Layout> All { get; } = [SingleRotor, DualRotor, DualStator];

    /// <summary>The design file's word (single-rotor, dual-rotor, dual-stator).</summary>
    public string Word { get; }

    /// <summary>A few words for the report.</summary>
    public string Description { get; }

    /// <summary>The rotor discs, front (+z) first.</summary>
    public IReadOnlyList<PartId> Rotors { get; }

    /// <summary>The stator rings, front (+z) first.</summary>
    public IReadOnlyList<PartId> Stators { get; }

    /// <summary>The spacer this layout uses (hub spacer, gap gauge or rim spacer).</summary>
    public PartRole SpacerRole { get; }

    /// <summary>The rotor sits between two stators: its pockets go through and its magnets face both; no back iron.</summary>
    public bool RotorBetweenStators => Stators.Count == 2;

    /// <summary>The stator sits between two rotors, whose magnets pull the rotors toward each other across it.</summary>
    public bool StatorBetweenRotors => Rotors.Count == 2;

    /// <summary>A steel disc can back the magnets (not when both rotor faces face a stator).</summary>
    public bool AllowsBackIron => !RotorBetweenStators;

    /// <summary>The layout of a design-file word, or null.</summary>
    public static Layout? Parse(string? word) => All.FirstOrDefault(l => l.Word == word);

    public override string ToString() => Word;
}
