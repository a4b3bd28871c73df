namespace PartForge.Design.Keys;

/// <summary>
/// What the keys of one model class are made from, as written at compile time by the model's source generator:
/// the class, a factory for an instance with its defaults, and its key properties in declaration order.
/// </summary>
internal sealed record SectionShape(Type Type, Func<object> Create, IReadOnlyList<PropertyShape> Properties);
