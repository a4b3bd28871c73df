namespace PartForge.Fuzz.Mutations;

/// <summary>
/// One fuzz case: the bytes of a design file, the preset it was made from, and the mutations applied, in order
/// (a readable recipe, so a failing case can be understood without a diff).
/// </summary>
public sealed record FuzzInput(int Index, int Seed, string BasePreset, IReadOnlyList<string> Mutations, byte[] Bytes)
{
    public string Recipe => BasePreset + ": " + (Mutations.Count == 0 ? "(unchanged)" : string.Join(" | ", Mutations));
}
