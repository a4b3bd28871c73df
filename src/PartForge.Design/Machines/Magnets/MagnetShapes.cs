namespace PartForge.Design.Machines.Magnets;

/// <summary>The registered magnet shapes: the only list of them. The loader, the JSON Schema and the
/// <c>magnets.shape</c> word list read it.</summary>
public static class MagnetShapes
{
    public static IReadOnlyList<MagnetShapeKind> Kinds { get; } =
    [
        DiscMagnet.Registration,
        BlockMagnet.Registration,
        ArcMagnet.Registration,
        SectorMagnet.Registration,
    ];

    /// <summary>The shape registered under a design-file word, or null.</summary>
    public static MagnetShapeKind? Find(string? word) => Kinds.FirstOrDefault(k => k.Word == word);

    /// <summary>Every size key of every shape (without the <c>magnets.</c> prefix), each once.</summary>
    public static IReadOnlyList<string> AllKeys { get; } = Kinds.SelectMany(k => k.Keys).Distinct().ToArray();
}
