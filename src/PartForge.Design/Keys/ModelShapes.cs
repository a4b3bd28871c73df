namespace PartForge.Design.Keys;

/// <summary>
/// The sections of the design model, from <see cref="Model.Design"/> down. The table is written at compile
/// time from the model's classes by the source generator in src/PartForge.Design.Generators, so the keys need
/// no run-time reflection over types (property order, nullable annotations, constructors), which a trimmed
/// native executable does not keep.
/// </summary>
[ModelShapes(typeof(Model.Design))]
internal static partial class ModelShapes
{
    /// <summary>The shape of a model section class, or null when the class is not one.</summary>
    public static SectionShape? Find(Type type) => Lookup(type);

    private static partial SectionShape? Lookup(Type type);
}
