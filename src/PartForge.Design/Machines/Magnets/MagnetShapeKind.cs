namespace PartForge.Design.Machines.Magnets;

/// <summary>
/// One registered magnet shape: its design-file word, the <c>magnets.*</c> size keys it needs (and no other
/// shape's), the keys the loader's fit rules point at, and how to make it from the section.
/// </summary>
/// <param name="Word">The value of <c>magnets.shape</c>.</param>
/// <param name="Keys">The size keys it needs (without the <c>magnets.</c> prefix).</param>
/// <param name="SizeKey">The key named when neighbouring pockets overlap.</param>
/// <param name="InnerKey">The key named when the pockets reach the bore.</param>
/// <param name="OuterKey">The key named when the pockets reach the rim.</param>
/// <param name="Validate">Rules among its own keys: (section) -> problems as (key, message, value, allowed); empty when fine.</param>
/// <param name="Make">The shape from a section that has every key and passes <paramref name="Validate"/>.</param>
public sealed record MagnetShapeKind(
    string Word,
    IReadOnlyList<string> Keys,
    string SizeKey,
    string InnerKey,
    string OuterKey,
    Func<Model.Magnets, IReadOnlyList<ShapeProblem>> Validate,
    Func<Model.Magnets, MagnetShape> Make);

/// <summary>A rule broken among a shape's own keys, located at <see cref="Key"/> (without the <c>magnets.</c> prefix).</summary>
public sealed record ShapeProblem(string Key, string Message, string? Value = null, string? Allowed = null);
