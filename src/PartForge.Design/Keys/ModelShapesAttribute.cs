namespace PartForge.Design.Keys;

/// <summary>
/// Marks the partial class whose section table the model's source generator writes
/// (src/PartForge.Design.Generators): the root class and every class reachable through its properties.
/// </summary>
[AttributeUsage(AttributeTargets.Class, Inherited = false)]
internal sealed class ModelShapesAttribute(Type root) : Attribute
{
    public Type Root { get; } = root;
}
