using PartForge.Design.Materials;

namespace PartForge.Design.Machines;

/// <summary>How the design asks a part to be made: the process it names (null: by material) and its material.</summary>
public sealed record PartChoice(PartProcess? Process, Material Material);
