namespace PartForge.Design.Model;

/// <summary>
/// A validated design file. Every section has documented defaults; the loader fills what the file leaves
/// out. Instances are immutable once loaded (init-only properties); variants are made with `with`-style
/// copies by the loader's override mechanism, never by mutation.
/// </summary>
public sealed class Design
{
    [RequiredKey, Range(1, 1), Doc("Design file format version; must be 1.")]
    public int Partforge { get; init; } = 1;

    [RequiredKey, Pattern("^[a-z0-9]+(-[a-z0-9]+)*$"), OutputName,
     Doc("Lowercase letters, digits and '-', at most 64 characters, not a device name (con, prn, aux, nul, com0-com9, lpt0-lpt9); used in output file names.")]
    public string Name { get; init; } = "design";

    public Machine Machine { get; init; } = new();
    public Magnets Magnets { get; init; } = new();
    public Rotor Rotor { get; init; } = new();
    public Coils Coils { get; init; } = new();
    public Former Former { get; init; } = new();
    public Stator Stator { get; init; } = new();
    public Sensor Sensor { get; init; } = new();
    public Gap Gap { get; init; } = new();
    public Tolerances Tolerances { get; init; } = new();
    public Process Process { get; init; } = new();
    public MeshSettings Mesh { get; init; } = new();

    [Doc("Operating points for the electrical results (generator load, motor supply).")]
    public Operation Operation { get; init; } = new();

    [Doc("How the coils are switched from the supply (motor roles).")]
    public Drive Drive { get; init; } = new();

    [Doc("The energy store: the motor's supply and the generator's load.")]
    public Storage Storage { get; init; } = new();

    [Doc("How the generator's coils feed the store (rectifier).")]
    public Load Load { get; init; } = new();

    [Doc("Extra inertia and drag of the rotating assembly.")]
    public Mechanics Mechanics { get; init; } = new();

    [Doc("The 3D printer the printed parts are laid out for and checked against.")]
    public Printer Printer { get; init; } = new();

    [Doc("The laser cutter and sheets the cut parts are nested on and checked against.")]
    public Cutter Cutter { get; init; } = new();

    [Doc("Placement of the parts in the assembly view.")]
    public AssemblyLayout Assembly { get; init; } = new();

    [Doc("Per-part overrides of how a part is made (print or cut) and of what.")]
    public PartOverrides Parts { get; init; } = new();
}
